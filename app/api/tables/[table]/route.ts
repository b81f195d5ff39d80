import { AccessError } from "@/lib/auth/guard";
import { can } from "@/lib/auth/permissions";
import { getEm } from "@/lib/db/orm";
import { AppError } from "@/lib/http/errors";
import { json, route } from "@/lib/http/route";
import { tableQueryOrThrow } from "@/lib/tables/http";
import { tableNamed } from "@/lib/tables/registry";

export const dynamic = "force-dynamic";

// GET /api/tables/{orders,customers,shafts,steps}?…the table's query… — one page of rows and the match count, as JSON
export const GET = route<{ table: string }>({ permission: null }, async ({ req, params, user }) => {
  const table = tableNamed(params.table);
  if (!table) throw new AppError("not_found", "No such table.");
  if (!can(user!.role, table.permission)) throw new AccessError(403);
  const query = tableQueryOrThrow(table.schema, req.nextUrl.searchParams);
  const page = await table.fetch(await getEm(), query);
  return json({ rows: page.rows, total: page.total, page: query.page, size: query.size });
});
