import { expect, test } from "@playwright/test";
import { ACCOUNTS, customerOrder, signIn } from "./fixtures";

// A failed network call never leaves a button stuck busy (lib/browser/mutation.ts): the customer's
// pay button (a fetch through sendJson) and the desk's note form (a server action), each with its
// request aborted as a dropped connection would, then sent again once the network is back.
const UNREACHABLE = /could not be reached/i;

test("a dropped connection frees the button and says so; the retry goes through", async ({
  page,
  browser,
}) => {
  test.setTimeout(90_000);
  await signIn(page, ACCOUNTS.customer);
  const order = await customerOrder(page, `Dropped call ${Date.now()}`);

  // The customer's pay button: its POST to the checkout route is aborted.
  await page.goto(`/orders/${order.id}`);
  await page.route("**/api/orders/*/checkout", (route) => route.abort("connectionreset"));
  const pay = page.getByRole("button", { name: /^Pay deposit of/ });
  await pay.click();
  await expect(page.getByRole("alert").filter({ hasText: UNREACHABLE })).toBeVisible();
  await expect(pay).toBeEnabled();
  await page.unroute("**/api/orders/*/checkout");
  await pay.click();
  await expect(page).toHaveURL(/\/pay\/cs_/);

  // The desk's note form: the server action's POST to the page is aborted.
  const desk = await browser.newPage();
  await signIn(desk, ACCOUNTS.counter);
  const path = `/desk/orders/${order.id}`;
  await desk.goto(path);
  const dropActions = (on: boolean) =>
    desk.route(
      (url) => url.pathname === path,
      (route) =>
        on && route.request().method() === "POST" && route.request().headers()["next-action"]
          ? route.abort("connectionreset")
          : route.continue(),
    );
  await dropActions(true);
  const notes = desk.getByRole("region", { name: "Notes" });
  const text = `Customer rang about the pickup time ${Date.now()}`;
  await notes.getByLabel("Add a note").fill(text);
  const add = notes.getByRole("button", { name: "Add note" });
  await add.click();
  await expect(notes.getByRole("alert")).toContainText(UNREACHABLE);
  await expect(add).toBeEnabled();
  // What was typed is still there.
  await expect(notes.getByLabel("Add a note")).toHaveValue(text);

  await desk.unrouteAll();
  await add.click();
  await expect(notes.getByRole("status")).toContainText("Note added.");
  await expect(notes.getByRole("listitem").filter({ hasText: text })).toBeVisible();
  await desk.close();
});
