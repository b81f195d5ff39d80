import { concedeHoldBodySchema } from "@/lib/floor/schemas";
import { concedeHold } from "@/lib/floor/work-orders";
import { AppError } from "@/lib/http/errors";
import { json, parseJson, route } from "@/lib/http/route";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

// POST /api/floor/work-orders/:id/concession — the owner accepts a held step as it is, with a reason (audited)
export const POST = route<{ id: string }>({ permission: "shop.manage" }, async ({ req, params, user }) => {
  if (!UUID.test(params.id)) throw new AppError("not_found", "No such work order.");
  const { reason } = await parseJson(req, concedeHoldBodySchema);
  return json(await concedeHold(params.id, user!, reason), 201);
});
