import { json, parseJson, route } from "@/lib/http/route";
import { saveRepairBodySchema } from "@/lib/retube/intake";
import { saveRepairIntake } from "@/lib/retube/intake-service";

type Params = { id: string };

// PUT /api/designs/[id]/repair — the counter records a draft as a new shaft or a re-tube (with its intake)
export const PUT = route<Params>({ permission: "orders.desk" }, async ({ req, params, user }) => {
  const body = await parseJson(req, saveRepairBodySchema);
  return json(await saveRepairIntake(user!, params.id, body));
});
