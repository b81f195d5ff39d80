/** The orders table: its query (URL), its row and its columns. Pure: server and browser import it. */
import { z } from "zod";
import type { OrderStatus, PaymentState, Fulfilment, OrderChannel } from "@/lib/orders/states";
import { ORDER_STATUS_LABEL, PAYMENT_STATE_LABEL } from "@/lib/orders/labels";
import { csvMoney, hideableIds, shortTimestamp, type ColumnSpec } from "./columns";
import {
  dateRangeRefine,
  flagParam,
  hideParam,
  isoDateParam,
  pagingShape,
  searchParam,
  sortParam,
} from "./params";

export const ORDER_STATUS_VALUES = Object.keys(ORDER_STATUS_LABEL) as [OrderStatus, ...OrderStatus[]];
export const PAYMENT_STATE_VALUES = Object.keys(PAYMENT_STATE_LABEL) as [PaymentState, ...PaymentState[]];

/** One order as the table and its file show it (plain data). */
export interface OrderTableRow {
  id: string;
  number: string;
  customerId: string;
  customerName: string;
  customerEmail: string;
  customerCompany: string | null;
  createdAt: string;
  promisedDate: string;
  status: OrderStatus;
  /** e.g. "In the shop — step 3 of 6", "On hold — step 2 of 6" (lib/orders/labels.ts, staff wording). */
  statusLabel: string;
  paymentState: PaymentState;
  channel: OrderChannel;
  fulfilment: Fulfilment;
  totalCents: number;
  paidCents: number;
  /** What is still owed: total − paid. */
  balanceCents: number;
  currency: string;
  shafts: string;
  shaftCount: number;
  late: boolean;
  onHold: boolean;
}

export const ORDER_SORTS = [
  "number",
  "customer",
  "created",
  "promised",
  "status",
  "payment",
  "channel",
  "total",
  "balance",
] as const;

export const ORDER_COLUMNS: readonly ColumnSpec<OrderTableRow>[] = [
  { id: "number", label: "Order", sortable: true, hideable: false, csv: (r) => r.number },
  { id: "customer", label: "Customer", sortable: true, hideable: true, csv: (r) => r.customerName },
  { id: "company", label: "Company", sortable: false, hideable: true, csv: (r) => r.customerCompany },
  { id: "email", label: "E-mail", sortable: false, hideable: true, csv: (r) => r.customerEmail },
  { id: "shafts", label: "Shafts", sortable: false, hideable: true, csv: (r) => r.shafts },
  { id: "status", label: "Status", sortable: true, hideable: true, csv: (r) => r.statusLabel },
  {
    id: "payment",
    label: "Payment",
    sortable: true,
    hideable: true,
    csv: (r) => PAYMENT_STATE_LABEL[r.paymentState],
  },
  {
    id: "channel",
    label: "Channel",
    sortable: true,
    hideable: true,
    csv: (r) => (r.channel === "online" ? "Online" : "Counter"),
  },
  {
    id: "total",
    label: "Total",
    sortable: true,
    hideable: true,
    align: "right",
    csv: (r) => csvMoney(r.totalCents),
  },
  {
    id: "balance",
    label: "Balance due",
    sortable: true,
    hideable: true,
    align: "right",
    csv: (r) => csvMoney(r.balanceCents),
  },
  { id: "currency", label: "Currency", sortable: false, hideable: true, csv: (r) => r.currency },
  {
    id: "created",
    label: "Placed",
    sortable: true,
    hideable: true,
    csv: (r, { timeZone }) => shortTimestamp(r.createdAt, timeZone),
  },
  { id: "promised", label: "Promised", sortable: true, hideable: true, csv: (r) => r.promisedDate },
  { id: "late", label: "Late", sortable: false, hideable: true, csv: (r) => (r.late ? "late" : "") },
];

/** `?status=` also takes "open": everything not shipped or cancelled. */
export const ORDER_STATUS_FILTERS = ["open", ...ORDER_STATUS_VALUES] as const;

/** GET /desk/orders, /api/tables/orders and /api/exports/orders read the same query. */
export const listOrdersQuerySchema = z
  .object({
    sort: sortParam(ORDER_SORTS, "created"),
    ...pagingShape("desc"),
    q: searchParam.optional(),
    status: z
      .enum(ORDER_STATUS_FILTERS, { message: `must be one of ${ORDER_STATUS_FILTERS.join(", ")}` })
      .optional(),
    payment: z
      .enum(PAYMENT_STATE_VALUES, { message: `must be one of ${PAYMENT_STATE_VALUES.join(", ")}` })
      .optional(),
    channel: z.enum(["online", "counter"], { message: 'must be "online" or "counter"' }).optional(),
    late: flagParam.optional(),
    hold: flagParam.optional(),
    from: isoDateParam.optional(),
    to: isoDateParam.optional(),
    hide: hideParam(hideableIds(ORDER_COLUMNS)),
  })
  .superRefine(dateRangeRefine);

export type ListOrdersQuery = z.infer<typeof listOrdersQuerySchema>;
