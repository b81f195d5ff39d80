/** The shafts table (one row per work order): its query, row and columns. Pure. */
import { z } from "zod";
import type { WorkOrderState } from "@/lib/floor/states";
import { hideableIds, shortTimestamp, type ColumnSpec } from "./columns";
import { flagParam, hideParam, pagingShape, searchParam, sortParam } from "./params";

export const WORK_ORDER_STATE_LABEL: Record<WorkOrderState, string> = {
  released: "Released",
  in_shop: "In the shop",
  on_hold: "On hold",
  ready: "Ready",
  shipped: "Shipped",
  picked_up: "Picked up",
};
export const WORK_ORDER_STATE_VALUES = Object.keys(WORK_ORDER_STATE_LABEL) as [
  WorkOrderState,
  ...WorkOrderState[],
];

export interface ShaftTableRow {
  workOrderId: string;
  serial: string;
  revision: number;
  orderId: string;
  orderNumber: string;
  customerName: string;
  shaftName: string;
  state: WorkOrderState;
  /** The step it waits for (code and name), null once every step is done. */
  stepCode: string | null;
  stepName: string | null;
  position: number;
  stepCount: number;
  onHold: boolean;
  /** The held step's name and when it was held. */
  holdStep: string | null;
  holdSince: string | null;
  /** The tube it is built from, e.g. "YL-T-DOM-3500-083 (88.9 × 2.11 mm)". */
  tube: string;
  promisedDate: string;
  late: boolean;
  releasedAt: string;
}

export const SHAFT_SORTS = ["serial", "order", "customer", "promised", "state", "step", "released"] as const;

const stepText = (r: ShaftTableRow) =>
  r.stepCode ? `${r.position} of ${r.stepCount} ${r.stepCode} ${r.stepName ?? ""}`.trim() : "All steps done";

export const SHAFT_COLUMNS: readonly ColumnSpec<ShaftTableRow>[] = [
  { id: "serial", label: "Serial", sortable: true, hideable: false, csv: (r) => r.serial },
  { id: "order", label: "Order", sortable: true, hideable: true, csv: (r) => r.orderNumber },
  { id: "customer", label: "Customer", sortable: true, hideable: true, csv: (r) => r.customerName },
  { id: "shaft", label: "Shaft", sortable: false, hideable: true, csv: (r) => r.shaftName },
  { id: "step", label: "Current step", sortable: true, hideable: true, csv: stepText },
  {
    id: "state",
    label: "State",
    sortable: true,
    hideable: true,
    csv: (r) => WORK_ORDER_STATE_LABEL[r.state],
  },
  {
    id: "hold",
    label: "Hold",
    sortable: false,
    hideable: true,
    csv: (r, { timeZone }) =>
      r.onHold
        ? `On hold at ${r.holdStep ?? "a step"}${r.holdSince ? ` since ${shortTimestamp(r.holdSince, timeZone)}` : ""}`
        : "",
  },
  { id: "tube", label: "Tube", sortable: false, hideable: true, csv: (r) => r.tube },
  { id: "promised", label: "Promised", sortable: true, hideable: true, csv: (r) => r.promisedDate },
  {
    id: "released",
    label: "Released",
    sortable: true,
    hideable: true,
    csv: (r, { timeZone }) => shortTimestamp(r.releasedAt, timeZone),
  },
];

/** `?step=CUT` (the step a shaft waits for) or `?step=done` (every step signed). */
export const stepCodeParam = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^([A-Z]{3}|DONE)$/, 'must be a step code of three letters (like CUT) or "done"');

/** GET /overview/shafts and /api/exports/shafts read the same query. */
export const listShaftsQuerySchema = z.object({
  sort: sortParam(SHAFT_SORTS, "promised"),
  ...pagingShape("asc"),
  q: searchParam.optional(),
  step: stepCodeParam.optional(),
  hold: flagParam.optional(),
  state: z
    .enum(["open", ...WORK_ORDER_STATE_VALUES], {
      message: `must be one of open, ${WORK_ORDER_STATE_VALUES.join(", ")}`,
    })
    .optional(),
  hide: hideParam(hideableIds(SHAFT_COLUMNS)),
});

export type ListShaftsQuery = z.infer<typeof listShaftsQuerySchema>;
