import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import { DEMO_PHONE_CUSTOMERS } from "../../lib/demo";
import { ACCOUNTS, signIn } from "./fixtures";

// A design that whirls near its top speed (examples/long-van-critical-speed-fail.json): the counter
// may order it for a phone customer; the order waits until an owner accepts the failed check for it.
const failingVan = JSON.parse(readFileSync("examples/long-van-critical-speed-fail.json", "utf8")) as unknown;

test("the counter orders a failing design; it takes no payment until the owner accepts the failed check for this order", async ({
  page,
  browser,
}) => {
  test.setTimeout(120_000);
  await signIn(page, ACCOUNTS.counter);
  const origin = new URL(page.url()).origin;
  const found = await page.request.get(
    `/api/customers/search?q=${encodeURIComponent(DEMO_PHONE_CUSTOMERS[0].name)}`,
  );
  const { customers } = (await found.json()) as { customers: { id: string }[] };
  const customerId = customers[0]!.id;

  const design = await page.request.post("/api/designs", {
    headers: { origin },
    data: {
      name: "Long van (fails)",
      design: failingVan,
      customerId,
      application: { description: "Parts van, long wheelbase", use: "street" },
    },
  });
  expect(design.status()).toBe(201);
  const { id: designId } = (await design.json()) as { id: string };
  const report = (await (await page.request.post("/api/designs/evaluate", { data: failingVan })).json()) as {
    checks: { id: string; status: string }[];
  };
  const failed = [...new Set(report.checks.filter((c) => c.status === "fail").map((c) => c.id))];
  expect(failed.length).toBeGreaterThan(0);
  const toAcknowledge = [...new Set(report.checks.filter((c) => c.status !== "pass").map((c) => c.id))];
  const placed = await page.request.post("/api/orders", {
    headers: { origin },
    data: {
      designIds: [designId],
      fulfilment: "pickup",
      customerId,
      shafts: [{ acknowledgements: toAcknowledge }],
    },
  });
  expect(placed.status()).toBe(201);
  const order = (await placed.json()) as { id: string; checkoutUrl: string | null };
  expect(order.checkoutUrl).toBeNull();

  // The counter sees the hold and cannot accept it.
  await page.goto(`/desk/orders/${order.id}`);
  const signoff = page.getByRole("region", { name: "Engineering sign-off" });
  await expect(signoff.getByText("Needs an owner's review")).toBeVisible();
  await expect(signoff.getByText("Waiting for an owner to review this check.").first()).toBeVisible();
  await expect(signoff.getByRole("button", { name: /Accept for this order/ })).toHaveCount(0);

  // The owner accepts each failed check with a written reason.
  const ownerContext = await browser.newContext();
  const owner = await ownerContext.newPage();
  await signIn(owner, ACCOUNTS.owner);
  await owner.goto(`/desk/orders/${order.id}`);
  const ownerSignoff = owner.getByRole("region", { name: "Engineering sign-off" });
  // A reason too short is refused beside the field.
  await ownerSignoff.getByLabel("Why this check does not apply to this order").first().fill("slow");
  await ownerSignoff.getByRole("button", { name: "Accept for this order…" }).first().click();
  await expect(ownerSignoff.getByText(/at least \d+ characters/)).toBeVisible();
  for (let i = 0; i < failed.length; i++) {
    const reason = `Industrial drive limited to 1200 rpm by its gearbox; checked by the owner (${i + 1}).`;
    await ownerSignoff.getByLabel("Why this check does not apply to this order").first().fill(reason);
    await ownerSignoff.getByRole("button", { name: "Accept for this order…" }).first().click();
    const dialog = owner.getByRole("dialog", { name: "Accept this failed check?" });
    await expect(dialog).toBeVisible();
    await dialog.getByRole("button", { name: "Accept for this order" }).click();
    await expect(ownerSignoff.getByText(`: ${reason}`)).toBeVisible();
  }
  await expect(ownerSignoff.getByText("Needs an owner's review")).toHaveCount(0);
  // The check still reads as failed: an accepted exception, never a pass.
  await expect(ownerSignoff.getByText("FAILED").first()).toBeVisible();
  await expect(ownerSignoff.getByText("Accepted exception").first()).toBeVisible();
  await ownerContext.close();
});
