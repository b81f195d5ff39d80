import { readJson } from "@/lib/http/body";
import { json, route } from "@/lib/http/route";
import { currentShopConfig, saveShopConfig, versionHistory } from "@/lib/catalogue/versions";

// GET /api/catalogue/versions — the current configuration's version and the newest versions with their changes
export const GET = route({ permission: "shop.manage" }, async () => {
  const [{ version }, versions] = await Promise.all([currentShopConfig(), versionHistory()]);
  return json({ current: version, versions });
});

// POST /api/catalogue/versions — save the edited catalogue, limits, price book and floor settings as a new version
export const POST = route({ permission: "shop.manage" }, async ({ req, user }) => {
  const saved = await saveShopConfig(user!, await readJson(req));
  return json(saved, 201);
});
