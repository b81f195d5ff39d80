import { designRouteResponse } from "@/lib/designs/pool";
import { route } from "@/lib/http/route";

// POST /api/designs/quote — price one design file with the shop's catalogue and price book
// (lib/designs/answers.ts, in a worker thread).
export const POST = route("public", async ({ req }) => designRouteResponse("quote", req));
