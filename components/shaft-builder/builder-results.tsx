"use client";

import type { Catalogue, TubePreference } from "@/lib/driveline";
import type { BuilderForm, UnitSystem } from "./model";
import { PrintedInputs } from "./printed-inputs";
import { ResultsPanel, StatusWord, type TubeChoice } from "./results-panel";
import type { Evaluation } from "./use-live-evaluation";

/** The results column: the printed inputs, the results (greyed while stale) or what to fill in. */
export function BuilderResults({
  form,
  shown,
  stale,
  calculating = false,
  system,
  catalogue,
  tubeChosen,
  onUseTube,
  tubePreference,
  footer,
}: {
  form: BuilderForm;
  shown: Evaluation | null;
  stale: boolean;
  /** The form changed and the engineering is still loading: `shown` is the last result. */
  calculating?: boolean;
  system: UnitSystem;
  catalogue: Catalogue;
  tubeChosen: boolean;
  onUseTube: (t: TubeChoice) => void;
  tubePreference: TubePreference;
  footer?: React.ReactNode;
}) {
  return (
    <section id="results" aria-labelledby="results-h" className="min-w-0 scroll-mt-4 space-y-4">
      <h2 id="results-h" className="text-xl font-bold">
        Results
      </h2>
      <PrintedInputs form={form} system={system} catalogue={catalogue} />
      {shown ? (
        <ResultsPanel
          report={shown.report}
          design={shown.design}
          stale={stale}
          calculating={calculating}
          system={system}
          catalogue={catalogue}
          tubeChosen={tubeChosen}
          onUseTube={onUseTube}
          tubePreference={tubePreference}
          footer={footer}
        />
      ) : (
        <div className="card p-6 text-sm text-ink-soft" data-testid="stale-note">
          Fill in the highlighted fields and the results appear here as you type.
        </div>
      )}
    </section>
  );
}

/** On a phone: the overall result pinned to the bottom, linking to the results. */
export function ResultBar({
  shown,
  stale,
  calculating = false,
}: {
  shown: Evaluation | null;
  stale: boolean;
  calculating?: boolean;
}) {
  if (!shown) return null;
  return (
    <a
      href="#results"
      className="no-print fixed inset-x-3 bottom-3 z-30 flex items-center justify-between rounded-card border border-line bg-paper-raised px-4 py-2 text-sm no-underline shadow-card lg:hidden"
    >
      <span className="text-ink">
        {calculating ? "Calculating… last: " : stale ? "Last valid: " : "Result: "}
        <StatusWord status={shown.report.overall} />
      </span>
      <span className="font-medium text-steel-700">See results ↓</span>
    </a>
  );
}
