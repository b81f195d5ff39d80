import { expect, test, type Page } from "@playwright/test";
import { ACCOUNTS, signIn } from "./fixtures";

/**
 * Every screen of every role works under the content security policy: no violation reported by
 * the browser (securitypolicyviolation events and console errors), and the headers are there.
 */
async function watchPolicy(page: Page): Promise<() => Promise<string[]>> {
  const seen: string[] = [];
  page.on("console", (msg) => {
    if (/content security policy/i.test(msg.text())) seen.push(`console: ${msg.text()}`);
  });
  await page.addInitScript(() => {
    const w = window as unknown as { __csp: string[] };
    w.__csp = [];
    document.addEventListener("securitypolicyviolation", (e) => {
      w.__csp.push(
        `${e.violatedDirective} blocked ${e.blockedURI || "inline"} (${e.sourceFile}:${e.lineNumber})`,
      );
    });
  });
  return async () => {
    const inPage = await page.evaluate(() => (window as unknown as { __csp?: string[] }).__csp ?? []);
    return [...seen, ...inPage];
  };
}

async function visit(page: Page, path: string, violations: () => Promise<string[]>) {
  const response = await page.goto(path);
  await page.waitForLoadState("networkidle");
  expectPageHeaders(response?.headers() ?? {}, path);
  expect(await violations(), path).toEqual([]);
}

function expectPageHeaders(headers: Record<string, string>, path: string) {
  const csp = headers["content-security-policy"] ?? "";
  expect(csp, path).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]{20,}' 'strict-dynamic'/);
  expect(csp, path).toContain("frame-ancestors 'none'");
  expect(csp, path).toContain("object-src 'none'");
  expect(csp, path).not.toContain("unsafe-eval");
  expect(headers["x-content-type-options"], path).toBe("nosniff");
  expect(headers["referrer-policy"], path).toBe("strict-origin-when-cross-origin");
  // Served over plain http here: no HSTS.
  expect(headers["strict-transport-security"], path).toBeUndefined();
}

/** The first link on the page whose name looks like an order number (Y26-0001). */
async function openFirstOrder(page: Page) {
  await page
    .getByRole("link", { name: /^Y\d{2}-\d{4}/ })
    .first()
    .click();
  await page.waitForLoadState("networkidle");
}

test("signed out: home, sign-in, sign-up and a missing page", async ({ page }) => {
  const violations = await watchPolicy(page);
  for (const path of ["/", "/sign-in", "/sign-up"]) await visit(page, path, violations);
  const missing = await page.goto("/no-such-page");
  expect(missing?.status()).toBe(404);
  expect(await violations()).toEqual([]);
});

test("customer: orders and the builder working live", async ({ page }) => {
  const violations = await watchPolicy(page);
  await signIn(page, ACCOUNTS.customer);
  // The demo customer has no orders yet (the counter's order page is the same view, below).
  await visit(page, "/orders", violations);
  await visit(page, "/build", violations);
  // Typing re-runs the engineering core and redraws the plots in the browser.
  const length = page.getByLabel("Installed length", { exact: true });
  await length.fill("55");
  await length.blur();
  await expect(page.getByRole("img", { name: /Side view of the driveline/ })).toBeVisible();
  await expect(page.getByRole("img", { name: /Speed ratio over one turn/ })).toBeVisible();
  expect(await violations(), "/build after typing").toEqual([]);
});

test("counter: desk, a phone order, customers and an order page", async ({ page }) => {
  const violations = await watchPolicy(page);
  await signIn(page, ACCOUNTS.counter);
  for (const path of ["/desk", "/desk/new", "/desk/customers", "/desk"]) await visit(page, path, violations);
  await openFirstOrder(page);
  expect(await violations(), page.url()).toEqual([]);
});

test("floor: scan station and work queue", async ({ page }) => {
  const violations = await watchPolicy(page);
  await signIn(page, ACCOUNTS.floor);
  for (const path of ["/floor", "/floor/queue", "/floor/shafts"]) await visit(page, path, violations);
});

test("owner: overview, staff, catalogue, sent mail and one e-mail's preview", async ({ page }) => {
  const violations = await watchPolicy(page);
  await signIn(page, ACCOUNTS.owner);
  for (const path of ["/overview", "/overview/staff", "/overview/catalogue", "/overview/mail"]) {
    await visit(page, path, violations);
  }
  await page.locator('a[href^="/overview/mail/"]').first().click();
  await page.waitForLoadState("networkidle");
  // The e-mail renders inside its sandboxed frame, inline styles and all.
  const frame = page.frameLocator("iframe[title^='E-mail']");
  await expect(frame.locator("body")).not.toBeEmpty();
  expect(await violations(), page.url()).toEqual([]);
});

test("a fresh nonce on every page, on each of Next's scripts", async ({ request }) => {
  const nonceOf = (csp: string) => /'nonce-([^']+)'/.exec(csp)?.[1];
  const first = await request.get("/sign-in");
  const second = await request.get("/sign-in");
  const nonce = nonceOf(first.headers()["content-security-policy"] ?? "");
  expect(nonce).toBeTruthy();
  expect(nonceOf(second.headers()["content-security-policy"] ?? "")).not.toBe(nonce);
  const html = await first.text();
  const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
  expect(scripts.length).toBeGreaterThan(0);
  for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`);
});

test("route handlers answer with nosniff; a forwarded https is not trusted without TRUST_PROXY", async ({
  request,
}) => {
  const health = await request.get("/api/health");
  expect(health.headers()["x-content-type-options"]).toBe("nosniff");
  expect(health.headers()["referrer-policy"]).toBe("strict-origin-when-cross-origin");
  const page = await request.get("/sign-in", { headers: { "x-forwarded-proto": "https" } });
  expect(page.headers()["strict-transport-security"]).toBeUndefined();
});
