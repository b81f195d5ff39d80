import { afterAll, beforeAll, describe, expect, test, vi } from "vitest";
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { NextRequest } from "next/server";
import { Customer, Design, OrderShaft, User } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { releaseOrder } from "@/lib/floor/work-orders";
import { saveOrderUpload } from "@/lib/uploads";
import { formatStepCode } from "@/lib/traveller/codes";
import { createStaffUser } from "@/lib/users/staff";
import { authRequest, sessionCookie, signUpVerified, uniqueEmail } from "../setup/auth-requests";
import { createTestOrder } from "../setup/test-orders";
import { startPaymentsHarness, streetTruck } from "../setup/orders";
import { exampleReport } from "../traveller/fixtures";

/**
 * THE ACCESS MATRIX. Every route handler and every server action, found on the file system, is
 * called in-process (the real guard, real sessions, real PostgreSQL) as each of: nobody signed in,
 * a customer, ANOTHER customer (on the first customer's order, design, file or shaft), the
 * counter, the floor and an owner. The expected answers are written out below, by hand, from the
 * house rules (DEVELOPERS.md "Access") — never read from lib/auth/permissions.ts.
 *
 * A new route.ts or action without a row here fails "every handler/action has a row".
 * Pages are checked the same way through the running app: tests/e2e/access-matrix.spec.ts.
 */

// Server actions read the session from next/headers; outside a Next request we hand it the cookie.
const session = vi.hoisted(() => ({ cookie: "" }));
vi.mock("next/headers", () => ({ headers: async () => new Headers({ cookie: session.cookie }) }));
vi.mock("next/cache", () => ({ revalidatePath: () => undefined, revalidateTag: () => undefined }));

const BASE = process.env.BETTER_AUTH_URL ?? "http://127.0.0.1:3999";
const PASSWORD = "a-long-password-1";
const ROOT = path.resolve(import.meta.dirname, "../..");
const WHO = ["anon", "customer", "other", "counter", "floor", "owner"] as const;
type Who = (typeof WHO)[number];

// ── Route handlers ────────────────────────────────────────────────────────────────────────────
// One row per request: "METHOD /path as on disk", the URL asked for ({tokens} are the fixtures:
// order/design/file/wo/serial/code belong to `customer`), the body, and the status each caller gets:
//                                                                 anon customer other counter floor owner
// Public handlers answer everyone alike. `other` is the second customer; on rows that are not about
// one customer's records it simply repeats `customer`.
type Body = "none" | "empty" | "design" | "save" | "order" | "form";
type Row = [key: string, url: string, body: Body, expected: [number, number, number, number, number, number]];

// prettier-ignore
const HANDLERS: Row[] = [
  ["GET /api/auth/[...all]", "/api/auth/get-session", "none", [200, 200, 200, 200, 200, 200]],
  ["POST /api/auth/[...all]", "/api/auth/sign-in/email", "empty", [400, 400, 400, 400, 400, 400]],
  ["POST /api/auth/invite", "/api/auth/invite", "empty", [422, 422, 422, 422, 422, 422]],
  ["POST /api/auth/staff-invite", "/api/auth/staff-invite", "empty", [422, 422, 422, 422, 422, 422]],
  ["GET /api/bench/noop", "/api/bench/noop", "none", [200, 200, 200, 200, 200, 200]],
  ["POST /api/bench/noop", "/api/bench/noop", "design", [200, 200, 200, 200, 200, 200]],
  ["GET /api/catalogue/versions", "/api/catalogue/versions", "none", [401, 403, 403, 403, 403, 200]],
  ["POST /api/catalogue/versions", "/api/catalogue/versions", "empty", [401, 403, 403, 403, 403, 422]],
  ["GET /api/customers/search", "/api/customers/search?q=Buyer", "none", [401, 403, 403, 200, 403, 200]],
  ["GET /api/designs", "/api/designs", "none", [401, 200, 200, 200, 403, 200]],
  ["POST /api/designs", "/api/designs", "save", [401, 201, 201, 422, 403, 422]],
  ["GET /api/designs/[id]", "/api/designs/{design}", "none", [401, 200, 404, 200, 403, 200]],
  ["PUT /api/designs/[id]", "/api/designs/{design}", "save", [401, 200, 404, 200, 403, 200]],
  ["DELETE /api/designs/[id]", "/api/designs/{freshDesign}", "none", [401, 204, 404, 204, 403, 204]],
  ["PUT /api/designs/[id]/repair", "/api/designs/{design}/repair", "empty", [401, 403, 403, 422, 403, 422]],
  ["POST /api/designs/evaluate", "/api/designs/evaluate", "design", [200, 200, 200, 200, 200, 200]],
  ["POST /api/designs/quote", "/api/designs/quote", "design", [200, 200, 200, 200, 200, 200]],
  ["GET /api/exports/[table]", "/api/exports/orders", "none", [401, 403, 403, 200, 403, 200]],
  ["GET /api/exports/[table]", "/api/exports/customers", "none", [401, 403, 403, 200, 403, 200]],
  ["GET /api/exports/[table]", "/api/exports/shafts", "none", [401, 403, 403, 403, 403, 200]],
  ["GET /api/exports/[table]", "/api/exports/steps", "none", [401, 403, 403, 403, 403, 200]],
  ["GET /api/files/[id]", "/api/files/{file}", "none", [401, 200, 404, 200, 200, 200]],
  ["GET /api/floor/scan", "/api/floor/scan?code={code}", "none", [401, 403, 403, 403, 200, 200]],
  ["POST /api/floor/steps", "/api/floor/steps", "empty", [401, 403, 403, 403, 422, 422]],
  ["POST /api/floor/work-orders/[id]/concession", "/api/floor/work-orders/{wo}/concession", "empty", [401, 403, 403, 403, 403, 422]],
  ["GET /api/health", "/api/health", "none", [200, 200, 200, 200, 200, 200]],
  ["POST /api/orders", "/api/orders", "order", [401, 201, 404, 422, 403, 422]],
  ["POST /api/orders/[id]/checkout", "/api/orders/{order}/checkout", "none", [401, 200, 404, 200, 403, 200]],
  ["GET /api/orders/[id]/files", "/api/orders/{order}/files", "none", [401, 200, 404, 200, 200, 200]],
  ["POST /api/orders/[id]/files", "/api/orders/{order}/files", "empty", [401, 422, 404, 422, 403, 422]],
  ["GET /api/orders/[id]/papers/as-built", "/api/orders/{order}/papers/as-built", "none", [401, 409, 404, 409, 409, 409]],
  ["GET /api/orders/[id]/papers/install-sheet", "/api/orders/{order}/papers/install-sheet", "none", [401, 200, 404, 200, 200, 200]],
  ["POST /api/payments/webhook", "/api/payments/webhook", "empty", [400, 400, 400, 400, 400, 400]],
  ["POST /api/sign-in", "/api/sign-in", "form", [303, 303, 303, 303, 303, 303]],
  ["GET /api/tables/[table]", "/api/tables/orders", "none", [401, 403, 403, 200, 403, 200]],
  ["GET /api/tables/[table]", "/api/tables/customers", "none", [401, 403, 403, 200, 403, 200]],
  ["GET /api/tables/[table]", "/api/tables/shafts", "none", [401, 403, 403, 403, 403, 200]],
  ["GET /api/tables/[table]", "/api/tables/steps", "none", [401, 403, 403, 403, 403, 200]],
  ["GET /desk/orders/[id]/traveller", "/desk/orders/{order}/traveller", "none", [401, 403, 403, 200, 200, 200]],
];

// ── Server actions ────────────────────────────────────────────────────────────────────────────
// "file#export", the input ({tokens} as above; {} means the guard passes and the input is refused
// as "invalid", so nothing changes), and the result code each caller gets ("ok" = it ran).
type Outcome = "ok" | "unauthenticated" | "forbidden" | "not_found" | "invalid";
type ActionRow = [
  key: string,
  input: Record<string, string>,
  expected: [Outcome, Outcome, Outcome, Outcome, Outcome, Outcome],
];
const U = "unauthenticated";
const F = "forbidden";
const I = "invalid";

// prettier-ignore
const ACTIONS: ActionRow[] = [
  ["lib/actions/accept-failed-check.ts#acceptFailedCheckAction", {}, [U, F, F, F, F, I]],
  ["lib/actions/add-order-note.ts#addOrderNoteAction", {}, [U, F, F, I, F, I]],
  ["lib/actions/cancel-order.ts#cancelOrderAction", {}, [U, F, F, I, F, I]],
  ["lib/actions/change-staff-role.ts#changeStaffRoleAction", {}, [U, F, F, F, F, I]],
  ["lib/actions/create-customer.ts#createCustomerAction", {}, [U, F, F, I, F, I]],
  ["lib/actions/invite-customer.ts#inviteCustomerAction", {}, [U, F, F, I, F, I]],
  ["lib/actions/invite-staff.ts#inviteStaffAction", {}, [U, F, F, F, F, I]],
  ["lib/actions/invite-staff.ts#resendStaffInvitationAction", {}, [U, F, F, F, F, I]],
  ["lib/actions/invite-staff.ts#revokeStaffInvitationAction", {}, [U, F, F, F, F, I]],
  ["lib/actions/record-counter-payment.ts#recordCounterPaymentAction", {}, [U, F, F, I, F, I]],
  ["lib/actions/refund-payment.ts#refundPaymentAction", {}, [U, F, F, F, F, I]],
  ["lib/actions/reissue-traveller.ts#reissueTravellerAction", {}, [U, F, F, I, F, I]],
  ["lib/actions/release-order.ts#releaseOrderAction", {}, [U, F, F, I, F, I]],
  ["lib/actions/reorder-shaft.ts#reorderShaftAction", { serial: "{serial}" }, [U, F, F, "ok", F, "ok"]],
  ["lib/actions/reorder-shaft.ts#reorderMyShaftAction", { serial: "{serial}" }, [U, "ok", "not_found", F, F, F]],
  ["lib/actions/request-balance.ts#requestBalanceAction", {}, [U, F, F, I, F, I]],
  ["lib/actions/send-payment-link.ts#sendPaymentLinkAction", {}, [U, F, F, I, F, I]],
  ["lib/actions/set-staff-active.ts#setStaffActiveAction", {}, [U, F, F, F, F, I]],
  ["lib/actions/update-order-details.ts#updateOrderDetailsAction", {}, [U, F, F, I, F, I]],
];

// ── What is on disk ───────────────────────────────────────────────────────────────────────────
const HTTP_METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return entry.name === "node_modules" ? [] : walk(full);
    return [full];
  });
}

const relative = (file: string) => path.relative(ROOT, file).split(path.sep).join("/");

/** Every route.ts under app/, as its URL path (route groups dropped). */
const routeFiles = walk(path.join(ROOT, "app"))
  .filter((f) => /\/route\.tsx?$/.test(f))
  .map((file) => ({
    file,
    urlPath:
      "/" +
      relative(file)
        .replace(/^app\//, "")
        .replace(/\/?route\.tsx?$/, "")
        .split("/")
        .filter((s) => !/^\(.*\)$/.test(s))
        .join("/"),
  }));

/** Every module that holds server actions: a "use server" file, or one built with defineAction. */
const actionFiles = ["app", "lib", "components"]
  .flatMap((dir) => walk(path.join(ROOT, dir)))
  .filter((f) => /\.tsx?$/.test(f) && !f.endsWith("define-action.ts"))
  .filter((f) => {
    const text = readFileSync(f, "utf8");
    return /^\s*["']use server["']/m.test(text) || /\bdefineAction\(/.test(text);
  });

// ── Fixtures ──────────────────────────────────────────────────────────────────────────────────
const cookies = {} as Record<Who, string>;
const ids = {} as Record<"order" | "design" | "file" | "wo" | "serial" | "code" | "customerUser", string>;

async function signInCookie(email: string): Promise<string> {
  return sessionCookie(await authRequest("/sign-in/email", { email, password: PASSWORD }));
}

async function newDesignOfCustomer(): Promise<string> {
  const em = await getEm();
  const customer = await em.findOneOrFail(Customer, { user: ids.customerUser });
  const design = em.create(Design, {
    name: "Matrix shaft",
    design: streetTruck,
    application: { description: "Matrix truck", use: "street" },
    customer,
    createdBy: em.getReference(User, ids.customerUser),
  });
  await em.flush();
  return design.id;
}

async function fill(text: string): Promise<string> {
  let out = text;
  if (out.includes("{freshDesign}")) out = out.replace("{freshDesign}", await newDesignOfCustomer());
  return out.replace(/\{(\w+)\}/g, (_, name: keyof typeof ids) => {
    if (!ids[name]) throw new Error(`no fixture {${name}}`);
    return encodeURIComponent(ids[name]);
  });
}

const PNG = Buffer.from(
  "iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg==",
  "base64",
);

let harness: Awaited<ReturnType<typeof startPaymentsHarness>> | undefined;
afterAll(async () => harness?.close());

beforeAll(async () => {
  // Payments go to the local Stripe fake, as in development.
  harness = await startPaymentsHarness({ duplicateDelivery: false });
  cookies.anon = "";
  const customerEmail = uniqueEmail("matrix-a");
  const otherEmail = uniqueEmail("matrix-b");
  await signUpVerified({ name: "Matrix Buyer", email: customerEmail, password: PASSWORD });
  await signUpVerified({ name: "Other Buyer", email: otherEmail, password: PASSWORD });
  cookies.customer = await signInCookie(customerEmail);
  cookies.other = await signInCookie(otherEmail);
  const staff: Partial<Record<"counter" | "floor" | "owner", { id: string; name: string; email: string }>> =
    {};
  for (const role of ["counter", "floor", "owner"] as const) {
    const email = uniqueEmail(`matrix-${role}`);
    staff[role] = await createStaffUser({ name: `Matrix ${role}`, email, role, password: PASSWORD }, null);
    cookies[role] = await signInCookie(email);
  }

  // The customer's records: a design, an order with one shaft released to the shop, a photo on it.
  const em = await getEm();
  const user = await em.findOneOrFail(User, { email: customerEmail });
  ids.customerUser = user.id;
  ids.design = await newDesignOfCustomer();
  const order = await createTestOrder(em, { userId: user.id });
  order.status = "received";
  order.paymentState = "deposit_paid";
  const report = exampleReport();
  em.create(OrderShaft, {
    order,
    position: 1,
    name: "Shaft 1",
    application: { description: "Half-ton pickup", use: "street" },
    design: streetTruck,
    evaluation: JSON.parse(JSON.stringify(report)) as Record<string, unknown>,
    overall: report.overall,
    priceLines: [],
    priceCents: 50_000,
  });
  await em.flush();
  ids.order = order.id;
  const counter = staff.counter!;
  const released = await releaseOrder(order.id, {
    id: counter.id,
    name: counter.name,
    email: counter.email,
    role: "counter",
  });
  const wo = released.workOrders[0]!;
  ids.wo = wo.id;
  ids.serial = wo.serial;
  ids.code = formatStepCode({ serial: wo.serial, step: "CUT", revision: 1 });
  const upload = await saveOrderUpload(
    em,
    { id: user.id, name: user.name, email: user.email, role: "customer" },
    order,
    { filename: "matrix.png", bytes: new Uint8Array(PNG) },
  );
  ids.file = upload.id;
}, 120_000);

// ── The checks ────────────────────────────────────────────────────────────────────────────────
type Handler = (
  req: NextRequest,
  ctx: { params: Promise<Record<string, string | string[]>> },
) => Promise<Response>;

/** The dynamic segments of `pattern` ("/api/files/[id]") read from a concrete path. */
function paramsOf(pattern: string, urlPath: string): Record<string, string | string[]> {
  const want = pattern.split("/");
  const got = urlPath.split("/");
  const params: Record<string, string | string[]> = {};
  want.forEach((segment, i) => {
    const catchAll = segment.match(/^\[\.\.\.(\w+)\]$/);
    const one = segment.match(/^\[(\w+)\]$/);
    if (catchAll) params[catchAll[1]!] = got.slice(i).map(decodeURIComponent);
    else if (one) params[one[1]!] = decodeURIComponent(got[i]!);
  });
  return params;
}

async function bodyFor(kind: Body): Promise<{ body?: BodyInit; type?: string }> {
  switch (kind) {
    case "none":
      return {};
    case "empty":
      return { body: "{}", type: "application/json" };
    case "design":
      return { body: JSON.stringify({ design: streetTruck }), type: "application/json" };
    case "save":
      return {
        body: JSON.stringify({
          name: "Matrix shaft",
          design: streetTruck,
          application: { description: "Matrix truck", use: "street" },
        }),
        type: "application/json",
      };
    case "order":
      return {
        body: JSON.stringify({ designIds: [await newDesignOfCustomer()], fulfilment: "pickup" }),
        type: "application/json",
      };
    case "form":
      return {
        body: new URLSearchParams({ email: "", password: "" }).toString(),
        type: "application/x-www-form-urlencoded",
      };
  }
}

describe("the access matrix: route handlers", () => {
  test("every handler on disk has a row, and every row a handler", async () => {
    const onDisk: string[] = [];
    for (const { file, urlPath } of routeFiles) {
      const mod = (await import(file)) as Record<string, unknown>;
      for (const method of HTTP_METHODS)
        if (typeof mod[method] === "function") onDisk.push(`${method} ${urlPath}`);
    }
    const inTable = [...new Set(HANDLERS.map(([key]) => key))];
    expect(
      onDisk.filter((k) => !inTable.includes(k)),
      "handlers without a row in HANDLERS",
    ).toEqual([]);
    expect(
      inTable.filter((k) => !onDisk.includes(k)),
      "rows for handlers that are gone",
    ).toEqual([]);
  });

  test.each(HANDLERS)("%s (%s)", { timeout: 60_000 }, async (key, url, bodyKind, expected) => {
    const [method, pattern] = key.split(" ") as [string, string];
    const entry = routeFiles.find((r) => r.urlPath === pattern);
    if (!entry) throw new Error(`no route.ts for ${pattern}`);
    const handler = ((await import(entry.file)) as Record<string, Handler>)[method]!;
    const got: Record<string, number> = {};
    for (const who of WHO) {
      const target = await fill(url);
      const { body, type } = await bodyFor(bodyKind);
      const headers = new Headers({ origin: BASE });
      if (cookies[who]) headers.set("cookie", cookies[who]);
      if (type) headers.set("content-type", type);
      const req = new NextRequest(`${BASE}${target}`, { method, headers, body });
      const res = await handler(req, {
        params: Promise.resolve(paramsOf(pattern, new URL(req.url).pathname)),
      });
      got[who] = res.status;
      await res.body?.cancel();
    }
    expect(got).toEqual(Object.fromEntries(WHO.map((who, i) => [who, expected[i]])));
  });
});

describe("the access matrix: server actions", () => {
  test("every action on disk has a row, and every row an action", async () => {
    const onDisk: string[] = [];
    for (const file of actionFiles) {
      const mod = (await import(file)) as Record<string, unknown>;
      for (const [name, value] of Object.entries(mod))
        if (typeof value === "function") onDisk.push(`${relative(file)}#${name}`);
    }
    const inTable = ACTIONS.map(([key]) => key);
    expect(
      onDisk.filter((k) => !inTable.includes(k)),
      "actions without a row in ACTIONS",
    ).toEqual([]);
    expect(
      inTable.filter((k) => !onDisk.includes(k)),
      "rows for actions that are gone",
    ).toEqual([]);
  });

  test.each(ACTIONS)("%s", { timeout: 60_000 }, async (key, input, expected) => {
    const [file, name] = key.split("#") as [string, string];
    const action = (
      (await import(path.join(ROOT, file))) as Record<string, (input: unknown) => Promise<unknown>>
    )[name]!;
    const got: Record<string, string> = {};
    for (const who of WHO) {
      session.cookie = cookies[who];
      const filled = Object.fromEntries(
        await Promise.all(
          Object.entries(input).map(async ([k, v]) => [k, decodeURIComponent(await fill(v))]),
        ),
      );
      const result = (await action(filled)) as { ok: boolean; error?: { code: string } };
      got[who] = result.ok ? "ok" : result.error!.code;
    }
    expect(got).toEqual(Object.fromEntries(WHO.map((who, i) => [who, expected[i]])));
  });
});
