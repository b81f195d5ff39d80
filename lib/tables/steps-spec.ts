/** The step records table (who signed which step of which shaft, when, with what result). Pure. */
import { z } from "zod";
import type { StepOutcome } from "@/lib/floor/states";
import { hideableIds, shortTimestamp, type ColumnSpec } from "./columns";
import { dateRangeRefine, hideParam, isoDateParam, pagingShape, sortParam } from "./params";
import { stepCodeParam } from "./shafts-spec";

export const STEP_OUTCOME_LABEL: Record<StepOutcome, string> = {
  pass: "Pass",
  hold: "Hold",
  rework: "Pass after rework",
  concession: "Concession",
};
export const STEP_OUTCOME_VALUES = Object.keys(STEP_OUTCOME_LABEL) as [StepOutcome, ...StepOutcome[]];

export interface StepTableRow {
  id: string;
  at: string;
  serial: string;
  revision: number;
  orderId: string;
  orderNumber: string;
  stepCode: string;
  stepName: string;
  position: number;
  outcome: StepOutcome;
  byName: string | null;
  /** What failed (holds), or the owner's reason (concessions). */
  notes: string;
}

export const STEP_SORTS = ["at", "serial", "step", "result", "user"] as const;

export const STEP_COLUMNS: readonly ColumnSpec<StepTableRow>[] = [
  {
    id: "at",
    label: "When",
    sortable: true,
    hideable: false,
    csv: (r, { timeZone }) => shortTimestamp(r.at, timeZone),
  },
  { id: "serial", label: "Serial", sortable: true, hideable: true, csv: (r) => r.serial },
  { id: "order", label: "Order", sortable: false, hideable: true, csv: (r) => r.orderNumber },
  {
    id: "step",
    label: "Step",
    sortable: true,
    hideable: true,
    csv: (r) => `${r.position} ${r.stepCode} ${r.stepName}`,
  },
  {
    id: "result",
    label: "Result",
    sortable: true,
    hideable: true,
    csv: (r) => STEP_OUTCOME_LABEL[r.outcome],
  },
  {
    id: "user",
    label: "Signed by",
    sortable: true,
    hideable: true,
    csv: (r) => r.byName ?? "(removed user)",
  },
  {
    id: "revision",
    label: "Traveller rev",
    sortable: false,
    hideable: true,
    align: "right",
    csv: (r) => r.revision,
  },
  { id: "notes", label: "Notes", sortable: false, hideable: true, csv: (r) => r.notes },
];

/** GET /overview/steps and /api/exports/steps read the same query; newest first. */
export const listStepsQuerySchema = z
  .object({
    sort: sortParam(STEP_SORTS, "at"),
    ...pagingShape("desc"),
    step: stepCodeParam
      .refine((s) => s !== "DONE", { message: "must be a step code of three letters (like CUT)" })
      .optional(),
    result: z
      .enum(STEP_OUTCOME_VALUES, { message: `must be one of ${STEP_OUTCOME_VALUES.join(", ")}` })
      .optional(),
    user: z
      .string()
      .regex(/^[A-Za-z0-9_-]{1,64}$/, "must be a user's id from the list")
      .optional(),
    from: isoDateParam.optional(),
    to: isoDateParam.optional(),
    hide: hideParam(hideableIds(STEP_COLUMNS)),
  })
  .superRefine(dateRangeRefine);

export type ListStepsQuery = z.infer<typeof listStepsQuerySchema>;
