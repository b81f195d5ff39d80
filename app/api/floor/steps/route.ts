import { submitStepBodySchema } from "@/lib/floor/schemas";
import { submitStep } from "@/lib/floor/work-orders";
import { json, parseJson, route } from "@/lib/http/route";

// POST /api/floor/steps — sign off a scanned step with what was measured: pass, or hold with each failed value
export const POST = route({ permission: "floor.scan" }, async ({ req, user }) => {
  const body = await parseJson(req, submitStepBodySchema);
  const result = await submitStep(body.code, body.values, user!, body.idempotencyKey);
  // A repeat of the same submission answers the first result, recording nothing new.
  return json(result, result.replayed ? 200 : 201);
});
