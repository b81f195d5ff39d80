import { expect, test, type Page } from "@playwright/test";
import { ACCOUNTS, signIn } from "./fixtures";
import { fillStep, scan, traveller } from "./floor-helpers";

// Faults at the scan station (issue: "prove it holds"): a sign-off whose answer is lost on the way
// back, and one submitted while the station is offline, are kept in the browser and sent again
// when the server answers, with the same idempotency key — each is recorded exactly once.

async function stepRecordCount(owner: Page): Promise<number> {
  const res = await owner.request.get("/api/tables/steps?size=25");
  expect(res.status()).toBe(200);
  return ((await res.json()) as { total: number }).total;
}

test("sign-offs taken while the server is unreachable are kept and sent once when it is back", async ({
  browser,
}) => {
  test.setTimeout(120_000);
  const owner = await (await browser.newContext()).newPage();
  await signIn(owner, ACCOUNTS.owner);
  const floor = await (await browser.newContext()).newPage();
  await signIn(floor, ACCOUNTS.floor);

  // A shaft in the demo shop whose next step is open: from an in-shop order's traveller codes.
  const list = await owner.request.get("/api/tables/orders?status=in_shop&size=25");
  expect(list.status()).toBe(200);
  const { rows } = (await list.json()) as { rows: { id: string }[] };
  let next: string[] = [];
  for (const { id } of rows) {
    const codes = (await traveller(owner.request, id)).filter((c) => /-R\d+-/.test(c));
    const open: string[] = [];
    for (const code of codes) {
      const res = await floor.request.get(`/api/floor/scan?code=${encodeURIComponent(code)}`);
      const body = (await res.json()) as { status?: string; step?: { position: number } };
      if (body.status === "next") open.push(code);
    }
    // The next step and the one after it, on the same shaft.
    const serialOf = (c: string) => c.replace(/-[A-Z]{3}-R\d+-.$/, "");
    const first = open[0];
    if (first) {
      const after = codes.indexOf(first) + 1;
      if (codes[after] && serialOf(codes[after]) === serialOf(first)) {
        next = [first, codes[after]];
        break;
      }
    }
  }
  expect(next, "an in-shop demo shaft with two steps to go").toHaveLength(2);
  const before = await stepRecordCount(owner);
  await floor.goto("/floor");

  // 1. The server records the sign-off but its answer never reaches the station.
  let dropped = 0;
  await floor.route("**/api/floor/steps", async (route) => {
    if (dropped++ === 0) {
      await route.fetch(); // it reaches the server…
      await route.abort("connectionreset"); // …and the answer is lost
    } else await route.continue();
  });
  await scan(floor, next[0]!);
  await fillStep(floor, next[0]!);
  await floor.getByRole("button", { name: /^Submit/ }).click();
  await expect(floor.getByRole("status").filter({ hasText: "Kept on this station" })).toBeVisible();
  // Sent again by itself (same key): the server answers the first result, nothing recorded twice.
  await expect(floor.getByRole("heading", { name: /wait(s)? to be sent/ })).toBeHidden({ timeout: 20_000 });
  expect(dropped).toBeGreaterThanOrEqual(2);
  expect(await stepRecordCount(owner)).toBe(before + 1);

  // 2. The station goes offline with the next step's form filled in.
  await scan(floor, next[1]!);
  await fillStep(floor, next[1]!);
  await floor.context().setOffline(true);
  await floor.getByRole("button", { name: /^Submit/ }).click();
  await expect(floor.getByRole("heading", { name: "1 sign-off waits to be sent" })).toBeVisible();
  // It survives a reload of the station while still offline.
  await floor.context().setOffline(false);
  await floor.route("**/api/floor/steps", (route) => route.abort("internetdisconnected"));
  await floor.reload();
  await expect(floor.getByRole("heading", { name: "1 sign-off waits to be sent" })).toBeVisible();
  expect(await stepRecordCount(owner)).toBe(before + 1);
  // Back online: sent once.
  await floor.unrouteAll();
  await floor.getByRole("button", { name: "Send now" }).click();
  await expect(floor.getByRole("heading", { name: /wait(s)? to be sent/ })).toBeHidden({ timeout: 20_000 });
  expect(await stepRecordCount(owner)).toBe(before + 2);
  const after = await floor.request.get(`/api/floor/scan?code=${encodeURIComponent(next[1]!)}`);
  expect(((await after.json()) as { status: string }).status).toBe("done");
});
