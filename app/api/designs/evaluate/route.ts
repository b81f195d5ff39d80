import { designRouteResponse } from "@/lib/designs/pool";
import { route } from "@/lib/http/route";

// POST /api/designs/evaluate — evaluate a design file with the shop's catalogue and limits
// (lib/designs/answers.ts, in a worker thread).
export const POST = route("public", async ({ req }) => designRouteResponse("evaluate", req));
