import { readJson } from "@/lib/http/body";
import { json, route } from "@/lib/http/route";

export const dynamic = "force-dynamic";

// GET /api/bench/noop — does nothing: the floor `npm run bench` measures other routes beside (no session, no database)
export const GET = route("public", async () => json({ ok: true }));

// POST /api/bench/noop — reads its JSON body as the design routes do (capped, parsed) and does nothing
// with it: the floor of a POST, printed beside the GET's so the cost of the body itself shows.
export const POST = route("public", async ({ req }) => {
  await readJson(req);
  return json({ ok: true });
});
