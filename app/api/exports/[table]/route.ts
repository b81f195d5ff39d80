import { AccessError } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { getEm } from "@/lib/db/orm";
import { AppError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { csvResponse } from "@/lib/tables/csv";
import { tableQueryOrThrow } from "@/lib/tables/http";
import { exportColumns, tableNamed } from "@/lib/tables/registry";
import { getShopLocale } from "@/lib/shop/locale";
import { shopIsoDate } from "@/lib/dates";

export const dynamic = "force-dynamic";

// GET /api/exports/{orders,customers,shafts,steps}?…the table's query… — every matching row as CSV, streamed
export const GET = route<{ table: string }>({ permission: null }, async ({ req, params, user }) => {
  const table = tableNamed(params.table);
  if (!table) throw new AppError("not_found", "No such table.");
  // The table's own permission: the same as its page's.
  if (!can(user!.role, table.permission)) throw new AccessError(403);
  const query = tableQueryOrThrow(table.schema, req.nextUrl.searchParams);
  const [em, { timeZone }] = await Promise.all([getEm(), getShopLocale()]);
  return csvResponse(
    `${params.table}-${shopIsoDate(new Date(), timeZone)}.csv`,
    exportColumns(table, query),
    (limit, offset) => table.fetch(em, query, { limit, offset }),
    { timeZone },
  );
});
