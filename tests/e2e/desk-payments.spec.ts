import { expect, test } from "@playwright/test";
import { ACCOUNTS, customerOrder, mailTo, payOnCheckoutPage, signIn } from "./fixtures";

// The counter's money on the desk order page, against the local Stripe and mail fakes.
test("the counter e-mails a payment link that the customer pays; records a terminal payment on another order; the owner cancels it with a refund", async ({
  page,
  browser,
}) => {
  test.setTimeout(150_000);
  const customer = page;
  await signIn(customer, ACCOUNTS.customer);
  const first = await customerOrder(customer, `Link order ${Date.now()}`);
  const second = await customerOrder(customer, `Counter order ${Date.now()}`);

  // The counter e-mails the payment link (confirmed in a dialog).
  const counter = await browser.newPage();
  await signIn(counter, ACCOUNTS.counter);
  await counter.goto(`/desk/orders/${first.id}`);
  const take = counter.getByRole("region", { name: "Take payment" });
  await take.getByRole("button", { name: "E-mail a payment link" }).click();
  const linkDialog = counter.getByRole("dialog", { name: "E-mail a payment link?" });
  await expect(linkDialog).toContainText(ACCOUNTS.customer);
  await linkDialog.getByRole("button", { name: "Send the link" }).click();
  await expect(take.getByRole("status")).toContainText(`e-mailed to ${ACCOUNTS.customer}`);

  // The customer opens it from the mail fake and pays on the fake's page.
  const mail = await mailTo(ACCOUNTS.customer, new RegExp(`payment link for order ${first.number}`, "i"));
  const link = mail.text.match(/https?:\/\/[^\s\])]+\/pay\/cs_[A-Za-z0-9_]+/)?.[0];
  expect(link).toBeTruthy();
  await customer.goto(link!);
  await payOnCheckoutPage(customer);
  await expect(customer).toHaveURL(new RegExp(`/orders/${first.id}\\?paid=cs_`));
  await expect(customer.getByText("Payment received")).toBeVisible({ timeout: 30_000 });
  await counter.reload();
  await expect(counter.getByText("Deposit paid").first()).toBeVisible();

  // Another order: the counter records a card-terminal payment of the deposit.
  await counter.goto(`/desk/orders/${second.id}`);
  const take2 = counter.getByRole("region", { name: "Take payment" });
  await take2.getByRole("radio", { name: "Card terminal" }).check();
  const deposit = await take2.getByLabel("Amount taken (USD)").inputValue();
  expect(Number(deposit)).toBeGreaterThan(0);
  await take2.getByRole("button", { name: "Record payment" }).click();
  await expect(take2.getByText("Terminal receipt reference is required.")).toBeVisible();
  await take2.getByLabel("Terminal receipt reference").fill("TRM-2207-0419");
  await take2.getByRole("button", { name: "Record payment" }).click();
  const recordDialog = counter.getByRole("dialog", { name: "Record this payment?" });
  await expect(recordDialog).toContainText("TRM-2207-0419");
  await recordDialog.getByRole("button", { name: /^Record \$/ }).click();
  await expect(counter.getByText("Deposit paid").first()).toBeVisible();
  await expect(counter.getByText("card at the shop · TRM-2207-0419")).toBeVisible();
  // The deposit met the policy: released to the shop, so only an owner may cancel now.
  await expect(counter.getByRole("link", { name: "Print traveller" })).toBeVisible();
  await expect(counter.getByText("only an owner can cancel it now")).toBeVisible();
  await counter.close();

  // The owner cancels it; the confirmation shows the refund.
  const owner = await browser.newPage();
  await signIn(owner, ACCOUNTS.owner);
  await owner.goto(`/desk/orders/${second.id}`);
  const cancel = owner.getByRole("region", { name: "Cancel order" });
  await cancel
    .getByLabel("Reason (the customer reads it)")
    .fill("The customer's truck was sold before the build");
  await cancel.getByRole("button", { name: "Cancel order…" }).click();
  const cancelDialog = owner.getByRole("dialog", { name: `Cancel order ${second.number}?` });
  await expect(cancelDialog.getByTestId("cancel-refund")).toHaveText(`$${deposit}`);
  await cancelDialog.getByRole("button", { name: `Cancel and refund $${deposit}` }).click();
  await expect(owner.getByText("The customer's truck was sold before the build").first()).toBeVisible();
  await expect(owner.getByRole("list", { name: "Order timeline" })).toContainText(`Refund of $${deposit}`);
  await expect(owner.getByRole("region", { name: "Take payment" })).toContainText("it takes no payment");
  await owner.close();

  // The customer sees it cancelled, with the cancellation e-mail.
  await customer.goto(`/orders/${second.id}`);
  await expect(customer.getByText("This order is cancelled")).toBeVisible();
  await mailTo(ACCOUNTS.customer, new RegExp(`Order ${second.number} is cancelled`));
});
