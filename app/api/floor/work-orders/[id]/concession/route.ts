import { concedeHoldBodySchema } from "@/lib/floor/schemas";
import { concedeHold } from "@/lib/floor/work-orders";
import { AppError } from "@/lib/http/errors";
import { isUuid } from "@/lib/http/known-errors";
import { json, parseJson, route } from "@/lib/http/route";

// POST /api/floor/work-orders/:id/concession — the owner accepts a held step as it is, with a reason (audited)
export const POST = route<{ id: string }>({ permission: "shop.manage" }, async ({ req, params, user }) => {
  if (!isUuid(params.id)) throw new AppError("not_found", "No such work order.");
  const { reason } = await parseJson(req, concedeHoldBodySchema);
  return json(await concedeHold(params.id, user!, reason), 201);
});
