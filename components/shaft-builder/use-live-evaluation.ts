"use client";

import { useDeferredValue, useMemo, useState } from "react";
import { useWatch, type Control } from "react-hook-form";
import type { BuilderShop, BuilderStart } from "./builder-core";
import { useBuilderCore } from "./load-builder-core";
import type { BuilderForm, Evaluation, FormValidation } from "./model";

export type { Evaluation } from "./model";

const NAN = "\u0000NaN";
/** A stable text key of the form values (NaN kept, so an unparseable entry stays invalid). */
const keyOf = (v: unknown) =>
  JSON.stringify(v, (_k, x) => (typeof x === "number" && Number.isNaN(x) ? NAN : x));
const fromKey = (key: string) => JSON.parse(key, (_k, x) => (x === NAN ? NaN : x)) as BuilderForm;

/**
 * Live evaluation: the same engineering core as the server, run in the browser on every change
 * (deferred while typing, so no request can fail or hang). While the form has errors the last
 * valid results stay on screen, marked stale.
 *
 * The page brings the starting form's check and results (`start`, computed on the server with
 * the same core), so the core itself is fetched only at the first change; until it has arrived
 * (a moment), the last results stay on screen marked as being calculated.
 */
export function useLiveEvaluation(
  control: Control<BuilderForm>,
  start: BuilderStart,
  shop: BuilderShop,
): {
  /** The form as typed (this render). */
  values: BuilderForm;
  /** The form the results are computed from (deferred). */
  form: BuilderForm;
  validation: FormValidation;
  evaluation: Evaluation | null;
  /** What the results show: this evaluation, or the last valid one. */
  shown: Evaluation | null;
  stale: boolean;
  /** The form changed and the core is still on its way: `shown` is the last result. */
  calculating: boolean;
} {
  const values = useWatch({ control }) as BuilderForm;
  const startKey = useMemo(() => keyOf(start.form), [start.form]);
  const deferredKey = useDeferredValue(keyOf(values));
  const atStart = deferredKey === startKey;
  const core = useBuilderCore(!atStart);
  const form = useMemo(() => fromKey(deferredKey), [deferredKey]);
  const { catalogue, settings, tubePreference } = shop;
  const checked = useMemo(
    () => (core && !atStart ? core.validateBuilderForm(form, catalogue) : null),
    [core, atStart, form, catalogue],
  );
  const evaluation = useMemo(
    () =>
      core && checked ? core.evaluateBuilderForm(checked, { catalogue, settings, tubePreference }) : null,
    [core, checked, catalogue, settings, tubePreference],
  );
  const calculating = !atStart && !core;
  const validation: FormValidation = atStart
    ? start.validation
    : (checked ?? { design: null, fieldErrors: {}, issues: [] });
  const current = atStart ? start.evaluation : evaluation;
  const [lastGood, setLastGood] = useState(start.evaluation);
  if (current && current !== lastGood) setLastGood(current);
  return {
    values,
    form,
    validation,
    evaluation: current,
    shown: current ?? lastGood,
    stale: !calculating && current === null,
    calculating,
  };
}
