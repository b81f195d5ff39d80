/** The customers table: its query (URL), its row and its columns. Pure: server and browser import it. */
import { z } from "zod";
import { hideableIds, shortTimestamp, type ColumnSpec } from "./columns";
import { hideParam, pagingShape, searchParam, sortParam } from "./params";

export interface CustomerTableRow {
  id: string;
  name: string;
  company: string | null;
  email: string;
  phone: string | null;
  hasAccount: boolean;
  createdAt: string;
  orderCount: number;
  openOrderCount: number;
  /** The newest order's date (yyyy-mm-dd), if any. */
  lastOrderOn: string | null;
}

export const CUSTOMER_SORTS = ["name", "company", "email", "created", "orders", "last"] as const;

export const CUSTOMER_COLUMNS: readonly ColumnSpec<CustomerTableRow>[] = [
  { id: "name", label: "Name", sortable: true, hideable: false, csv: (r) => r.name },
  { id: "company", label: "Company", sortable: true, hideable: true, csv: (r) => r.company },
  { id: "email", label: "E-mail", sortable: true, hideable: true, csv: (r) => r.email },
  { id: "phone", label: "Phone", sortable: false, hideable: true, csv: (r) => r.phone },
  {
    id: "account",
    label: "Orders online",
    sortable: false,
    hideable: true,
    csv: (r) => (r.hasAccount ? "Yes" : "By phone"),
  },
  { id: "orders", label: "Orders", sortable: true, hideable: true, align: "right", csv: (r) => r.orderCount },
  {
    id: "open",
    label: "Open",
    sortable: false,
    hideable: true,
    align: "right",
    csv: (r) => r.openOrderCount,
  },
  { id: "last", label: "Last order", sortable: true, hideable: true, csv: (r) => r.lastOrderOn },
  {
    id: "created",
    label: "Customer since",
    sortable: true,
    hideable: true,
    csv: (r, { timeZone }) => shortTimestamp(r.createdAt, timeZone),
  },
];

/** GET /desk/customers, /api/exports/customers read the same query. Newest first: the one just entered is on top. */
export const listCustomersQuerySchema = z.object({
  sort: sortParam(CUSTOMER_SORTS, "created"),
  ...pagingShape("desc"),
  q: searchParam.optional(),
  account: z.enum(["yes", "no"], { message: 'must be "yes" or "no"' }).optional(),
  hide: hideParam(hideableIds(CUSTOMER_COLUMNS)),
});

export type ListCustomersQuery = z.infer<typeof listCustomersQuerySchema>;
