"use client";

import { useDeferredValue, useMemo, useState } from "react";
import { useWatch, type Control } from "react-hook-form";
import type { Catalogue, DesignFile, EvaluationReport, ShopSettings, TubePreference } from "@/lib/driveline";
import { DesignInputError, evaluateDesign } from "@/lib/driveline/evaluate";
import { validateBuilderForm, type BuilderForm, type FormValidation } from "./model";

export interface Evaluation {
  design: DesignFile;
  report: EvaluationReport;
}

const NAN = "\u0000NaN";
/** A stable text key of the form values (NaN kept, so an unparseable entry stays invalid). */
const keyOf = (v: unknown) =>
  JSON.stringify(v, (_k, x) => (typeof x === "number" && Number.isNaN(x) ? NAN : x));
const fromKey = (key: string) => JSON.parse(key, (_k, x) => (x === NAN ? NaN : x)) as BuilderForm;

/**
 * Live evaluation: the same engineering core as the server, run in the browser on every change
 * (deferred while typing, so no request can fail or hang). While the form has errors the last
 * valid results stay on screen, marked stale.
 */
export function useLiveEvaluation(
  control: Control<BuilderForm>,
  {
    catalogue,
    settings,
    tubePreference,
  }: {
    catalogue: Catalogue;
    settings: ShopSettings;
    tubePreference: TubePreference;
  },
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
} {
  const values = useWatch({ control }) as BuilderForm;
  const deferredKey = useDeferredValue(keyOf(values));
  const form = useMemo(() => fromKey(deferredKey), [deferredKey]);
  const validation = useMemo(() => validateBuilderForm(form, catalogue), [form, catalogue]);
  const evaluation = useMemo((): Evaluation | null => {
    if (!validation.design) return null;
    try {
      return {
        design: validation.design,
        report: evaluateDesign(validation.design, {
          catalogue,
          settings,
          tubePreference,
          curves: { points: 181 },
          alternatives: true,
        }),
      };
    } catch (error) {
      if (error instanceof DesignInputError) return null;
      throw error;
    }
  }, [validation.design, catalogue, settings, tubePreference]);
  const [lastGood, setLastGood] = useState(evaluation);
  if (evaluation && evaluation !== lastGood) setLastGood(evaluation);
  return { values, form, validation, evaluation, shown: evaluation ?? lastGood, stale: evaluation === null };
}
