import { getEm } from "@/lib/db/orm";
import { scanCode } from "@/lib/floor/scan";
import { scanFloorQuerySchema } from "@/lib/floor/schemas";
import { json, route } from "@/lib/http/route";

// GET /api/floor/scan?code= — what a scanned code means: a shaft's step (its sheet, limits, turn) or a serial
export const GET = route({ permission: "floor.scan" }, async ({ req }) => {
  const { code } = scanFloorQuerySchema.parse(Object.fromEntries(req.nextUrl.searchParams));
  return json(await scanCode(await getEm(), code));
});
