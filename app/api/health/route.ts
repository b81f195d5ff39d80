import { DATABASE_DOWN_MESSAGE, getOrm } from "@/lib/db/orm";
import { json } from "@/lib/http/route";
import { APP_VERSION } from "@/lib/version";

export const dynamic = "force-dynamic";

// GET /api/health — app version and a real round-trip to the database (503 while it is down)
export async function GET() {
  const started = performance.now();
  try {
    const orm = await getOrm();
    const rows = await orm.em.getConnection().execute<{ now: string }[]>("select now() as now");
    return json({
      status: "ok",
      version: APP_VERSION,
      database: {
        ok: true,
        roundTripMs: Math.round((performance.now() - started) * 100) / 100,
        now: rows[0]?.now,
      },
    });
  } catch {
    return json(
      { status: "degraded", version: APP_VERSION, database: { ok: false, message: DATABASE_DOWN_MESSAGE } },
      503,
    );
  }
}
