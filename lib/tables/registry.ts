import "server-only";
import type { EntityManager } from "@mikro-orm/postgresql";
import type { ZodType } from "zod";
import type { Permission } from "@/lib/auth/permissions";
import { visibleColumns, type ColumnSpec } from "./columns";
import { customerTablePage } from "./customers";
import { CUSTOMER_COLUMNS, listCustomersQuerySchema } from "./customers-spec";
import { orderTablePage } from "./orders";
import { listOrdersQuerySchema, ORDER_COLUMNS } from "./orders-spec";
import { shaftTablePage } from "./shafts";
import { listShaftsQuerySchema, SHAFT_COLUMNS } from "./shafts-spec";
import type { Page } from "./sql";
import { stepTablePage } from "./steps";
import { listStepsQuerySchema, STEP_COLUMNS } from "./steps-spec";

/** What the export and JSON handlers need to know of one table. */
export interface TableDefinition<Q extends { hide: string[]; page: number; size: number }, R> {
  /** Who may see it: the same permission as its page. */
  permission: Permission;
  schema: ZodType<Q>;
  columns: readonly ColumnSpec<R>[];
  fetch: (em: EntityManager, q: Q, range?: { limit: number; offset: number }) => Promise<Page<R>>;
}

function define<Q extends { hide: string[]; page: number; size: number }, R>(d: TableDefinition<Q, R>) {
  return d as unknown as TableDefinition<{ hide: string[]; page: number; size: number }, unknown>;
}

/** The four tables by their name in /api/exports/<name> and /api/tables/<name>. */
export const TABLES = {
  orders: define({
    permission: "orders.desk",
    schema: listOrdersQuerySchema,
    columns: ORDER_COLUMNS,
    fetch: (em, q, range) => orderTablePage(em, q, range),
  }),
  customers: define({
    permission: "orders.desk",
    schema: listCustomersQuerySchema,
    columns: CUSTOMER_COLUMNS,
    fetch: (em, q, range) => customerTablePage(em, q, range),
  }),
  shafts: define({
    permission: "shop.overview",
    schema: listShaftsQuerySchema,
    columns: SHAFT_COLUMNS,
    fetch: (em, q, range) => shaftTablePage(em, q, range),
  }),
  steps: define({
    permission: "shop.overview",
    schema: listStepsQuerySchema,
    columns: STEP_COLUMNS,
    fetch: (em, q, range) => stepTablePage(em, q, range),
  }),
} as const;

export type TableName = keyof typeof TABLES;

export function tableNamed(name: string): (typeof TABLES)[TableName] | null {
  return Object.hasOwn(TABLES, name) ? TABLES[name as TableName] : null;
}

/** The columns a table's file holds for a query (those shown on screen). */
export function exportColumns<Q extends { hide: string[] }, R>(
  d: { columns: readonly ColumnSpec<R>[] },
  q: Q,
) {
  return visibleColumns(d.columns, q.hide);
}
