import { afterAll, beforeAll } from "vitest";
import { NextRequest } from "next/server";
import { Client } from "pg";
import { POST } from "@/app/api/catalogue/versions/route";
import { invalidateShopEngineering } from "@/lib/shop/config";
import { requireDatabase } from "./db";

/**
 * For a file that changes the shop's configuration (catalogue, price book, limits): keeps the
 * configuration as it was before the file and puts it back after it, for the files that follow.
 */
export function keepShopConfig(): void {
  let original: Record<string, unknown>[] = [];
  beforeAll(async () => {
    const c = new Client({ connectionString: requireDatabase() });
    await c.connect();
    original = (await c.query("select * from shop_config")).rows;
    await c.end();
  });
  afterAll(async () => {
    const c = new Client({ connectionString: requireDatabase() });
    await c.connect();
    await c.query("delete from shop_config_version");
    await c.query("delete from shop_config");
    for (const r of original) {
      await c.query(
        "insert into shop_config (id, catalogue, settings, price_book, floor, version, updated_at) values ($1, $2, $3, $4, $5, $6, $7)",
        [r.id, r.catalogue, r.settings, r.price_book, r.floor, r.version, r.updated_at].map((v) =>
          typeof v === "object" && v !== null && !(v instanceof Date) ? JSON.stringify(v) : v,
        ),
      );
    }
    await c.end();
    invalidateShopEngineering();
  });
}

/** Saves a new configuration version through the route handler, as the editor does. */
export function postCatalogueVersion(body: unknown, cookie?: string) {
  return POST(
    new NextRequest("http://127.0.0.1/api/catalogue/versions", {
      method: "POST",
      headers: { "content-type": "application/json", ...(cookie ? { cookie } : {}) },
      body: JSON.stringify(body),
    }),
    { params: Promise.resolve({}) },
  );
}
