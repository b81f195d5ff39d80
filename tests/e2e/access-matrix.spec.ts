import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { Client } from "pg";
import { expect, request as newRequest, test, type APIRequestContext } from "@playwright/test";
import { DEMO_CUSTOMERS, DEMO_PASSWORD } from "../../lib/demo";
import { ACCOUNTS } from "./fixtures";

/**
 * THE ACCESS MATRIX for pages (handlers and actions: tests/auth/access-matrix.test.ts). Every
 * app/**\/page.tsx found on disk is requested from the running production build as nobody, a
 * customer (Rosa), ANOTHER customer (Wendell, asking for Rosa's order and shaft), the counter, the
 * floor and the owner. The expected answers are written out by hand from the house rules, never
 * read from lib/auth/permissions.ts. A new page without a row fails "every page has a row".
 */

const WHO = ["anon", "customer", "other", "counter", "floor", "owner"] as const;
type Who = (typeof WHO)[number];
/** A status, "sign-in" (307 to sign-in, coming back after) or "→/path" (307 there). */
type Answer = number | "sign-in" | `→${string}`;
const S = "sign-in";

// One row per page: the path as on disk, the URL asked for ({tokens}: Rosa's records), and the answers:
//                                                          anon customer other counter floor owner
// prettier-ignore
const PAGES: [page: string, url: string, expected: [Answer, Answer, Answer, Answer, Answer, Answer]][] = [
  ["/", "/", [200, "→/orders", "→/orders", "→/desk", "→/floor", "→/overview"]],
  ["/check-email", "/check-email", [200, 200, 200, 200, 200, 200]],
  ["/set-password", "/set-password?token=no-such-token", [200, 200, 200, 200, 200, 200]],
  ["/sign-in", "/sign-in", [200, "→/orders", "→/orders", "→/desk", "→/floor", "→/overview"]],
  ["/sign-up", "/sign-up", [200, 200, 200, 200, 200, 200]],
  ["/build", "/build", [S, 200, 200, 403, 403, 403]],
  ["/orders", "/orders", [S, 200, 200, 403, 403, 403]],
  ["/orders/new", "/orders/new?design={design}", [S, 200, 404, 403, 403, 403]],
  ["/orders/[id]", "/orders/{order}", [S, 200, 404, "→/desk/orders/{order}", "→/desk/orders/{order}", "→/desk/orders/{order}"]],
  ["/shafts/[serial]", "/shafts/{serial}", [S, 200, 404, "→/floor/shafts/{serial}", "→/floor/shafts/{serial}", "→/floor/shafts/{serial}"]],
  ["/desk", "/desk", [S, 403, 403, 200, 403, 200]],
  ["/desk/customers", "/desk/customers", [S, 403, 403, 200, 403, 200]],
  ["/desk/new", "/desk/new", [S, 403, 403, 200, 403, 200]],
  ["/desk/new/quote", "/desk/new/quote", [S, 403, 403, 404, 403, 404]],
  ["/desk/orders", "/desk/orders", [S, 403, 403, 200, 403, 200]],
  ["/desk/orders/[id]", "/desk/orders/{order}", [S, 403, 403, 200, 403, 200]],
  ["/floor", "/floor", [S, 403, 403, 403, 200, 200]],
  ["/floor/queue", "/floor/queue", [S, 403, 403, 200, 200, 200]],
  ["/floor/shafts", "/floor/shafts", [S, 403, 403, 200, 200, 200]],
  ["/floor/shafts/[serial]", "/floor/shafts/{serial}", [S, 403, 403, 200, 200, 200]],
  ["/overview", "/overview", [S, 403, 403, 403, 403, 200]],
  ["/overview/catalogue", "/overview/catalogue", [S, 403, 403, 403, 403, 200]],
  ["/overview/mail", "/overview/mail", [S, 403, 403, 403, 403, 200]],
  ["/overview/mail/[id]", "/overview/mail/{mail}", [S, 403, 403, 403, 403, 200]],
  ["/overview/shafts", "/overview/shafts", [S, 403, 403, 403, 403, 200]],
  ["/overview/staff", "/overview/staff", [S, 403, 403, 403, 403, 200]],
  ["/overview/steps", "/overview/steps", [S, 403, 403, 403, 403, 200]],
];

function pagesOnDisk(dir = path.resolve("app")): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return entry.name.startsWith("_") ? [] : pagesOnDisk(full);
    if (!/^page\.(tsx|ts|jsx|js)$/.test(entry.name)) return [];
    const segments = path
      .relative(path.resolve("app"), dir)
      .split(path.sep)
      .filter((s) => s && !/^\(.*\)$/.test(s));
    return [`/${segments.join("/")}`];
  });
}

const ids: Record<string, string> = {};
const contexts = {} as Record<Who, APIRequestContext>;

const fill = (text: string) =>
  text.replace(/\{(\w+)\}/g, (_, name: string) => {
    if (!ids[name]) throw new Error(`no fixture {${name}}`);
    return ids[name]!;
  });

test.beforeAll(async ({ baseURL }) => {
  const accounts: Record<Exclude<Who, "anon">, string> = {
    customer: ACCOUNTS.customer,
    other: DEMO_CUSTOMERS[1].email,
    counter: ACCOUNTS.counter,
    floor: ACCOUNTS.floor,
    owner: ACCOUNTS.owner,
  };
  contexts.anon = await newRequest.newContext({ baseURL, maxRedirects: 0 });
  for (const [who, email] of Object.entries(accounts) as [Exclude<Who, "anon">, string][]) {
    const ctx = await newRequest.newContext({ baseURL, maxRedirects: 0 });
    const res = await ctx.post("/api/sign-in", {
      form: { email, password: DEMO_PASSWORD },
      headers: { origin: baseURL! },
      maxRedirects: 0,
    });
    expect(res.status(), `sign-in as ${email}`).toBe(303);
    contexts[who] = ctx;
  }
  // Rosa's records from the demo seed: an order released to the shop (so it has a serial), a design
  // of hers made here through the API, and a message from the outbox.
  const db = new Client({ connectionString: process.env.DATABASE_URL });
  await db.connect();
  try {
    const { rows } = await db.query<{ id: string; serial: string }>(
      `select o.id, w.serial from shop_order o join customer c on c.id = o.customer_id
         join work_order w on w.order_id = o.id where c.email = $1 order by o.created_at desc limit 1`,
      [ACCOUNTS.customer],
    );
    ids.order = rows[0]!.id;
    ids.serial = rows[0]!.serial;
    const mail = await db.query<{ id: string }>("select id from email_message order by created_at limit 1");
    ids.mail = mail.rows[0]!.id;
  } finally {
    await db.end();
  }
  const saved = await contexts.customer.post("/api/designs", {
    headers: { origin: baseURL! },
    data: {
      name: "Access matrix shaft",
      design: JSON.parse(readFileSync("examples/street-truck.json", "utf8")) as unknown,
      application: { description: "Access matrix", use: "street" },
    },
  });
  expect(saved.status()).toBe(201);
  ids.design = ((await saved.json()) as { id: string }).id;
});

test.afterAll(async () => {
  for (const ctx of Object.values(contexts)) await ctx.dispose();
});

test("every page on disk has a row, and every row a page", () => {
  const onDisk = pagesOnDisk().sort();
  const inTable = PAGES.map(([page]) => page).sort();
  expect(
    onDisk.filter((p) => !inTable.includes(p)),
    "pages without a row in PAGES",
  ).toEqual([]);
  expect(
    inTable.filter((p) => !onDisk.includes(p)),
    "rows for pages that are gone",
  ).toEqual([]);
});

test("every page answers each caller as written", async () => {
  test.setTimeout(180_000);
  const failures: string[] = [];
  for (const [, url, expected] of PAGES) {
    const target = fill(url);
    for (const [i, who] of WHO.entries()) {
      const res = await contexts[who].get(target);
      const raw = res.headers()["location"];
      const location = raw ? ((u) => u.pathname + u.search)(new URL(raw, "http://app.invalid")) : "";
      const want = expected[i]!;
      let got: Answer = res.status();
      if (res.status() >= 300 && res.status() < 400) {
        got = location.startsWith("/sign-in?next=") ? S : `→${location}`;
      }
      const wanted = typeof want === "string" && want.startsWith("→") ? fill(want) : want;
      if (got !== wanted) failures.push(`${target} as ${who}: expected ${wanted}, got ${got}`);
      await res.dispose();
    }
  }
  expect(failures).toEqual([]);
});
