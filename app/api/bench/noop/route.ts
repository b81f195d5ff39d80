import { json, route } from "@/lib/http/route";

export const dynamic = "force-dynamic";

// GET /api/bench/noop — does nothing: the floor `npm run bench` measures other routes beside (no session, no database)
export const GET = route("public", async () => json({ ok: true }));
