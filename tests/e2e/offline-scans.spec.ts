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
  test.setTimeout(240_000);
  const owner = await (await browser.newContext()).newPage();
  await signIn(owner, ACCOUNTS.owner);
  const floor = await (await browser.newContext()).newPage();
  await signIn(floor, ACCOUNTS.floor);

  // A shaft in the demo shop whose next step is open: from an in-shop order's traveller codes.
  const list = await owner.request.get("/api/tables/orders?status=in_shop&size=25");
  expect(list.status()).toBe(200);
  const { rows } = (await list.json()) as { rows: { id: string }[] };
  const statusOf = async (code: string) => {
    const res = await floor.request.get(`/api/floor/scan?code=${encodeURIComponent(code)}`);
    return ((await res.json()) as { status?: string }).status;
  };
  /** The code among `codes` whose step is the shaft's next one. */
  const nextOf = async (codes: string[]) => {
    for (const code of codes) if ((await statusOf(code)) === "next") return code;
    return null;
  };
  let shaftCodes: string[] = [];
  let first: string | null = null;
  for (const { id } of rows) {
    const codes = (await traveller(owner.request, id)).filter((c) => /-R\d+-/.test(c));
    // One shaft's codes (an order may hold several), with two or more steps to go.
    for (const serial of new Set(codes.map((c) => c.replace(/-[A-Z0-9]{3,4}-R\d+-.$/, "")))) {
      const mine = codes.filter((c) => c.startsWith(`${serial}-`));
      const open = await nextOf(mine);
      const done = (await Promise.all(mine.map(statusOf))).filter((st) => st === "done").length;
      if (open && mine.length - done >= 3) {
        shaftCodes = mine;
        first = open;
        break;
      }
    }
    if (first) break;
  }
  expect(first, "an in-shop demo shaft with steps to go").toBeTruthy();
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
  await scan(floor, first!);
  await fillStep(floor, first!);
  await floor.getByRole("button", { name: /^Submit/ }).click();
  await expect(floor.getByRole("status").filter({ hasText: "Kept on this station" })).toBeVisible();
  // Sent again by itself (same key): the server answers the first result, nothing recorded twice.
  await expect(floor.getByRole("heading", { name: /wait(s)? to be sent/ })).toBeHidden({ timeout: 20_000 });
  expect(dropped).toBeGreaterThanOrEqual(2);
  expect(await stepRecordCount(owner)).toBe(before + 1);

  // 2. The station goes offline with the next step's form filled in.
  const second = await nextOf(shaftCodes);
  expect(second, "the step after the one just signed off").toBeTruthy();
  await scan(floor, second!);
  await fillStep(floor, second!);
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
  expect(await statusOf(second!)).toBe("done");
});
