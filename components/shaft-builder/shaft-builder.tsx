"use client";

import { useEffect, useMemo, useState, useSyncExternalStore } from "react";
import { useForm, type Resolver } from "react-hook-form";
import type { DraftSummary, DraftView } from "@/lib/designs/drafts";
import { BuilderResults, ResultBar } from "./builder-results";
import { DesignFileButtons, UploadNotice, useDesignFile } from "./design-file-controls";
import { DraftList } from "./draft-list";
import type { BuilderShop, BuilderStart } from "./builder-core";
import { tryLoadBuilderCore } from "./load-builder-core";
import type { BuilderForm, UnitSystem } from "./model";
import type { TubeChoice } from "./results-panel";
import { QuoteButton, SaveBar } from "./save-bar";
import { ShaftForm } from "./shaft-form";
import { UnitsSwitch } from "./units-switch";
import { useDrafts } from "./use-drafts";
import { useFieldKit } from "./use-field-kit";
import { useLiveEvaluation } from "./use-live-evaluation";

export interface ShaftBuilderProps {
  /**
   * The shop's catalogue, limits and how it picks a tube the customer leaves to Yokeline
   * (`builderShopOf(getShopEngineering())`, plain objects).
   */
  shop: BuilderShop;
  /** A saved draft to open, or null for a new design. */
  initialDraft?: DraftView | null;
  /**
   * Its form, that form's check and results, computed on the server with the same core
   * (`builderStart()` in builder-core.ts): the page shows results before the core has loaded.
   */
  start: BuilderStart;
  /** Drafts listed for loading (the customer's own; at the counter, the customer's). */
  drafts?: readonly DraftSummary[];
  /** Where "Get a quote" goes once the draft is saved. */
  quoteHref: (draftId: string) => string;
  /** Counter use: the customer the draft is saved for (sent as customerId). */
  customerId?: string;
  /** The page address of a draft, put in the location bar after saving or loading (default `?draft=<id>`). */
  draftHref?: (draftId: string) => string;
  /** Unit system to start in (default inches). */
  initialUnits?: UnitSystem;
  /**
   * The counter's compact, keyboard-first layout: the fields in the order of a paper measuring
   * sheet (use and vehicle, length, angles, torque, speed, tube; then the optional slip, layout
   * and vehicle-end groups, folded until wanted; then the order details with the quote button),
   * the first field focused, no measuring guides in the tab order, and Enter in a field never
   * submitting by surprise.
   */
  compact?: boolean;
  /** Counter: a design that fails a check may still be quoted (the order then needs the owner's sign-off). */
  allowFailing?: boolean;
}

const noSubscribe = () => () => {};

/**
 * The shaft builder: a guided form with measuring guides, live results from the engineering
 * core (in the browser, on every change), pictures, drafts, and design-file download/upload.
 * Used by the customer's /build page and by the counter for phone orders. It only composes:
 * the form (`shaft-form.tsx`), the drafts (`use-drafts.ts`, `draft-list.tsx`, `save-bar.tsx`),
 * the design-file controls (`design-file-controls.tsx`) and the tube picker (`tube-picker.tsx`).
 */
export function ShaftBuilder({
  shop,
  initialDraft,
  start,
  drafts: initialDrafts = [],
  quoteHref,
  customerId,
  draftHref = (id) => `?draft=${id}`,
  initialUnits = "imperial",
  compact = false,
  allowFailing = false,
}: ShaftBuilderProps) {
  const { catalogue, tubePreference } = shop;
  const [system, setSystem] = useState<UnitSystem>(initialUnits);
  // True once hydrated (tests wait for it); false in the server render.
  const ready = useSyncExternalStore(
    noSubscribe,
    () => true,
    () => false,
  );
  // The form's check is the core's parser, fetched with the core when it is first needed. When it
  // cannot be fetched (a dropped connection) the fields are left unmarked rather than the check
  // failing: saving and quoting fetch it again and say the shop could not be reached.
  const resolver = useMemo(
    (): Resolver<BuilderForm> => async (values, context, options) => {
      const core = await tryLoadBuilderCore();
      return core ? core.builderResolver(catalogue)(values, context, options) : { values, errors: {} };
    },
    [catalogue],
  );
  const methods = useForm<BuilderForm>({
    defaultValues: start.form,
    resolver,
    mode: "onTouched",
  });
  const { errors, isDirty } = methods.formState;
  const live = useLiveEvaluation(methods.control, start, shop);
  const drafts = useDrafts({ methods, catalogue, initialDraft, initialDrafts, customerId, draftHref });
  const designFile = useDesignFile({ methods, catalogue, markChanged: drafts.markChanged });
  const kit = useFieldKit({
    methods,
    values: live.values,
    errs: live.validation.fieldErrors,
    catalogue,
    system,
    compact,
    markChanged: drafts.markChanged,
  });

  // The counter starts typing straight away: focus the first field of the measuring sheet.
  useEffect(() => {
    if (compact) document.querySelector<HTMLElement>("[data-autofocus]")?.focus();
  }, [compact]);

  const takeTube = (t: TubeChoice) => {
    methods.setValue("tubeMode", "chosen", { shouldDirty: true });
    methods.setValue(
      "tube",
      { materialId: t.materialId, odMm: t.odMm, wallMm: t.wallMm },
      { shouldDirty: true },
    );
    drafts.markChanged();
  };
  const openDraft = async (id: string) => {
    if (await drafts.open(id)) designFile.clear();
  };
  const quoteButton = (
    <QuoteButton
      drafts={drafts}
      report={live.evaluation?.report ?? null}
      calculating={live.calculating}
      quoteHref={quoteHref}
      allowFailing={allowFailing}
    />
  );

  return (
    <div className="space-y-6 pb-16 lg:pb-0 print:pb-0" data-builder-ready={ready || undefined}>
      <div className="no-print flex flex-wrap items-center justify-between gap-4 card p-4">
        <UnitsSwitch system={system} onChange={setSystem} />
        <DesignFileButtons controls={designFile} design={live.validation.design} />
      </div>
      <UploadNotice controls={designFile} />

      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)] lg:items-start print:block">
        <ShaftForm
          kit={kit}
          errors={errors}
          validation={live.validation}
          report={live.shown?.report ?? null}
          onSubmit={methods.handleSubmit(() => void drafts.save())}
          saveBar={<SaveBar drafts={drafts} dirty={isDirty} />}
          quoteButton={quoteButton}
          drafts={<DraftList drafts={drafts} system={system} onOpen={(id) => void openDraft(id)} />}
        />
        <BuilderResults
          form={live.form}
          shown={live.shown}
          stale={live.stale}
          calculating={live.calculating}
          system={system}
          catalogue={catalogue}
          tubeChosen={live.values.tubeMode === "chosen"}
          onUseTube={takeTube}
          tubePreference={tubePreference}
          footer={
            compact ? undefined : (
              <div className="no-print flex flex-wrap items-center gap-3 card p-4">{quoteButton}</div>
            )
          }
        />
      </div>
      <ResultBar shown={live.shown} stale={live.stale} calculating={live.calculating} />
    </div>
  );
}
