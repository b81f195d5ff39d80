import { beforeAll, describe, expect, vi } from "vitest";
import { readFileSync } from "node:fs";
import { randomUUID } from "node:crypto";
import { NextRequest } from "next/server";
import { GET as listDesigns, POST as saveDesign } from "@/app/api/designs/route";
import { DELETE as deleteDesign, GET as getDesign, PUT as putDesign } from "@/app/api/designs/[id]/route";
import { POST as evaluate } from "@/app/api/designs/evaluate/route";
import { POST as quote } from "@/app/api/designs/quote/route";
import { POST as placeOrder } from "@/app/api/orders/route";
import { POST as checkout } from "@/app/api/orders/[id]/checkout/route";
import { GET as listFiles, POST as postFile } from "@/app/api/orders/[id]/files/route";
import { GET as getFile } from "@/app/api/files/[id]/route";
import { POST as signIn } from "@/app/api/sign-in/route";
import { POST as authPost } from "@/app/api/auth/[...all]/route";
import { requestBalanceAction } from "@/lib/actions/request-balance";
import { refundPaymentAction } from "@/lib/actions/refund-payment";
import { addOrderNoteAction } from "@/lib/actions/add-order-note";
import { getEm } from "@/lib/db/orm";
import { createStaffUser } from "@/lib/users/staff";
import { authRequest, sessionCookie, signUpVerified, uniqueEmail } from "../setup/auth-requests";
import { dbTest, requireDatabase } from "../setup/db";
import { createTestOrder } from "../setup/test-orders";

// Server actions read the session from next/headers; outside a Next request we hand it the cookie.
const session = vi.hoisted(() => ({ cookie: "" }));
vi.mock("next/headers", () => ({ headers: async () => new Headers({ cookie: session.cookie }) }));
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

const BASE = "http://127.0.0.1:3999";
const PASSWORD = "a-long-password-1";
const street = JSON.parse(readFileSync("examples/street-truck.json", "utf8")) as Record<string, unknown>;

let customerCookie = "";
let counterCookie = "";
let ownerCookie = "";
let orderId = "";

beforeAll(async () => {
  requireDatabase();
  const email = uniqueEmail("odd");
  await signUpVerified({ name: "Odd Customer", email, password: PASSWORD });
  const res = await authRequest("/sign-in/email", { email, password: PASSWORD });
  customerCookie = sessionCookie(res);
  const userId = ((await res.json()) as { user: { id: string } }).user.id;
  orderId = (await createTestOrder(await getEm(), { userId })).id;
  for (const role of ["counter", "owner"] as const) {
    const staff = uniqueEmail(role);
    await createStaffUser({ name: `An ${role}`, email: staff, role, password: PASSWORD }, null);
    const cookie = sessionCookie(await authRequest("/sign-in/email", { email: staff, password: PASSWORD }));
    if (role === "counter") counterCookie = cookie;
    else ownerCookie = cookie;
  }
});

/** Any of the route handlers (each narrows its own params). */
type Handler = (req: NextRequest, ctx: { params: Promise<never> }) => Promise<Response>;
type Body =
  { json: string } | { form: Record<string, string> } | { multipart: Record<string, string> } | null;

function request(method: string, path: string, body: Body, cookie: string): NextRequest {
  const headers = new Headers({ cookie, origin: BASE });
  let payload: BodyInit | undefined;
  if (body && "json" in body) {
    headers.set("content-type", "application/json");
    payload = body.json;
  } else if (body && "form" in body) {
    headers.set("content-type", "application/x-www-form-urlencoded");
    payload = new URLSearchParams(body.form).toString();
  } else if (body && "multipart" in body) {
    const form = new FormData();
    for (const [k, v] of Object.entries(body.multipart)) form.set(k, v);
    payload = form;
  }
  return new NextRequest(`${BASE}${path}`, { method, headers, body: payload });
}

const deep = "[".repeat(100_000) + "]".repeat(100_000);
const withLength = (lengthMm: string) =>
  JSON.stringify(street).replace('"lengthMm":1320.8', `"lengthMm":${lengthMm}`);

interface Case {
  name: string;
  handler: Handler;
  method?: string;
  path: string;
  params?: Record<string, string>;
  body: Body;
  who?: "customer" | "counter" | "anyone";
  status: number;
  code: string;
  /** The field the error must name. */
  field?: string;
  fieldMessage?: RegExp;
}

const cases = (): Case[] => [
  // A form where JSON is expected, and JSON that is not an object.
  {
    name: "evaluate: a form",
    handler: evaluate,
    path: "/api/designs/evaluate",
    body: { form: { lengthMm: "1" } },
    status: 422,
    code: "invalid",
    field: "body",
  },
  {
    name: "quote: a form",
    handler: quote,
    path: "/api/designs/quote",
    body: { form: { design: "x" } },
    status: 422,
    code: "invalid",
    field: "body",
  },
  {
    name: "quote: JSON null",
    handler: quote,
    path: "/api/designs/quote",
    body: { json: "null" },
    status: 422,
    code: "invalid",
    field: "body",
  },
  {
    name: "save design: a multipart form",
    handler: saveDesign,
    path: "/api/designs",
    body: { multipart: { name: "x" } },
    status: 422,
    code: "invalid",
    field: "body",
  },
  {
    name: "place order: a form",
    handler: placeOrder,
    path: "/api/orders",
    body: { form: { designIds: "x" } },
    status: 422,
    code: "invalid",
    field: "body",
  },
  {
    name: "place order: JSON that is a number",
    handler: placeOrder,
    path: "/api/orders",
    body: { json: "42" },
    status: 422,
    code: "invalid",
    field: "body",
  },
  // Deeply nested JSON.
  {
    name: "evaluate: 100k nested arrays",
    handler: evaluate,
    path: "/api/designs/evaluate",
    body: { json: deep },
    status: 422,
    code: "invalid",
    field: "body",
  },
  {
    name: "save design: 100k nested arrays",
    handler: saveDesign,
    path: "/api/designs",
    body: { json: deep },
    status: 422,
    code: "invalid",
    field: "body",
  },
  {
    name: "place order: 100k nested arrays",
    handler: placeOrder,
    path: "/api/orders",
    body: { json: deep },
    status: 422,
    code: "invalid",
    field: "body",
  },
  // Numbers far outside the physical range.
  {
    name: "evaluate: lengthMm 1e308",
    handler: evaluate,
    path: "/api/designs/evaluate",
    body: { json: withLength("1e308") },
    status: 422,
    code: "invalid",
    field: "lengthMm",
    fieldMessage: /at most 10000 mm/,
  },
  {
    name: "evaluate: lengthMm 1e309 (Infinity)",
    handler: evaluate,
    path: "/api/designs/evaluate",
    body: { json: withLength("1e309") },
    status: 422,
    code: "invalid",
    field: "lengthMm",
  },
  {
    name: "quote: lengthMm 1e308",
    handler: quote,
    path: "/api/designs/quote",
    body: { json: `{"design":${withLength("1e308")}}` },
    status: 422,
    code: "invalid",
    field: "design.lengthMm",
    fieldMessage: /at most 10000 mm/,
  },
  {
    name: "quote: torque 1e308",
    handler: quote,
    path: "/api/designs/quote",
    body: { json: JSON.stringify({ design: { ...street, torque: { engineTorqueNm: 1e308 } } }) },
    status: 422,
    code: "invalid",
    field: "design.torque.engineTorqueNm",
    fieldMessage: /at most 100000 N·m/,
  },
  {
    name: "save design: lengthMm 1e308",
    handler: saveDesign,
    path: "/api/designs",
    body: {
      json: `{"name":"Huge","application":{"description":"","use":"street"},"design":${withLength("1e308")}}`,
    },
    status: 422,
    code: "invalid",
    field: "design.lengthMm",
  },
  // Malformed ids in routes and queries.
  {
    name: "get design: not a uuid",
    handler: getDesign,
    path: "/api/designs/not-a-uuid",
    params: { id: "not-a-uuid" },
    body: null,
    status: 404,
    code: "not_found",
  },
  {
    name: "get design: a NUL byte",
    handler: getDesign,
    path: "/api/designs/%00",
    params: { id: "\u0000" },
    body: null,
    status: 404,
    code: "not_found",
  },
  {
    name: "put design: 36 dashes",
    handler: putDesign,
    method: "PUT",
    path: "/api/designs/x",
    params: { id: "-".repeat(36) },
    body: {
      json: `{"name":"x","application":{"description":"","use":"street"},"design":${JSON.stringify(street)}}`,
    },
    status: 404,
    code: "not_found",
  },
  {
    name: "delete design: unknown uuid",
    handler: deleteDesign,
    method: "DELETE",
    path: "/api/designs/x",
    params: { id: randomUUID() },
    body: null,
    status: 404,
    code: "not_found",
  },
  {
    name: "list designs: ?customerId=…",
    handler: listDesigns,
    method: "GET",
    path: "/api/designs?customerId=%27%3B--",
    body: null,
    who: "counter",
    status: 422,
    code: "invalid",
    field: "customerId",
  },
  {
    name: "place order: design ids not uuids",
    handler: placeOrder,
    path: "/api/orders",
    body: { json: '{"designIds":["../x"],"fulfilment":"pickup"}' },
    status: 422,
    code: "invalid",
    field: "designIds[0]",
  },
  {
    name: "place order: unknown design",
    handler: placeOrder,
    path: "/api/orders",
    body: { json: JSON.stringify({ designIds: [randomUUID()], fulfilment: "pickup" }) },
    status: 404,
    code: "not_found",
  },
  {
    name: "checkout: order id %00",
    handler: checkout,
    path: "/api/orders/%00/checkout",
    params: { id: "\u0000" },
    body: null,
    status: 404,
    code: "not_found",
  },
  {
    name: "files: order id not a uuid",
    handler: listFiles,
    method: "GET",
    path: "/api/orders/x/files",
    params: { id: "not-a-uuid" },
    body: null,
    status: 404,
    code: "not_found",
  },
  {
    name: "file: id with a NUL byte",
    handler: getFile,
    method: "GET",
    path: "/api/files/x",
    params: { id: "\u0000" },
    body: null,
    status: 404,
    code: "not_found",
  },
  // JSON where a form is expected.
  {
    name: "attach file: JSON instead of multipart",
    handler: postFile,
    path: "/api/orders/x/files",
    params: { id: "ORDER" },
    body: { json: '{"file":"x"}' },
    status: 422,
    code: "invalid",
    field: "file",
  },
  {
    name: "sign-in form: JSON instead of a form",
    handler: signIn,
    path: "/api/sign-in",
    body: { json: '{"email":"a@b.example"}' },
    who: "anyone",
    status: 422,
    code: "invalid",
    field: "body",
  },
  // A NUL character (PostgreSQL stores none in text) is refused naming its field, also where a
  // form or the auth library's JSON carries it.
  {
    name: "sign-in form: a NUL in the e-mail",
    handler: signIn,
    path: "/api/sign-in",
    body: { form: { email: "a\u0000@b.example", password: PASSWORD } },
    who: "anyone",
    status: 422,
    code: "invalid",
    field: "email",
    fieldMessage: /NUL/,
  },
  {
    name: "auth library sign-in: a NUL in the e-mail",
    handler: authPost,
    path: "/api/auth/sign-in/email",
    body: { json: JSON.stringify({ email: "a\u0000@b.example", password: PASSWORD }) },
    who: "anyone",
    status: 422,
    code: "invalid",
    field: "email",
    fieldMessage: /NUL/,
  },
  {
    name: "auth library sign-up: a NUL in the name, sent raw in a form",
    handler: authPost,
    path: "/api/auth/sign-up/email",
    body: { form: { name: "A\u0000B", email: "nul@b.example", password: PASSWORD } },
    who: "anyone",
    status: 422,
    code: "invalid",
    field: "name",
    fieldMessage: /NUL/,
  },
];

describe("odd requests answer 4xx with the usual error shape, never 500", () => {
  for (const c of cases()) {
    dbTest(`${c.name} → ${c.status} ${c.code}${c.field ? ` on ${c.field}` : ""}`, async () => {
      const cookie = c.who === "counter" ? counterCookie : c.who === "anyone" ? "" : customerCookie;
      const params = Object.fromEntries(
        Object.entries(c.params ?? {}).map(([k, v]) => [k, v === "ORDER" ? orderId : v]),
      );
      const res = await c.handler(request(c.method ?? "POST", c.path, c.body, cookie), {
        params: Promise.resolve(params) as Promise<never>,
      });
      expect(res.status).toBe(c.status);
      const body = (await res.json()) as {
        error: { code: string; message: string; fields?: Record<string, string> };
      };
      expect(body.error.code).toBe(c.code);
      expect(typeof body.error.message).toBe("string");
      expect(body.error.message.length).toBeGreaterThan(0);
      if (c.field) {
        expect(body.error.fields?.[c.field], JSON.stringify(body.error)).toEqual(expect.any(String));
        if (c.fieldMessage) expect(body.error.fields?.[c.field]).toMatch(c.fieldMessage);
      }
    });
  }
});

describe("server actions: an unknown id is not_found, odd text a field error, never internal", () => {
  dbTest("asking the balance of an order that does not exist", async () => {
    session.cookie = counterCookie;
    const result = await requestBalanceAction({ orderId: randomUUID() });
    expect(result).toMatchObject({ ok: false, error: { code: "not_found" } });
  });

  dbTest("an order id that is not an id is a field error", async () => {
    session.cookie = counterCookie;
    const result = await requestBalanceAction({ orderId: "'; drop table shop_order; --" });
    expect(result).toMatchObject({
      ok: false,
      error: { code: "invalid", fields: { orderId: expect.any(String) } },
    });
  });

  dbTest("a NUL character in an action's text is a field error, and nothing is saved", async () => {
    session.cookie = counterCookie;
    const result = await addOrderNoteAction({ orderId, body: "Call\u0000back", visibility: "staff" });
    expect(result).toMatchObject({
      ok: false,
      error: { code: "invalid", fields: { body: expect.stringMatching(/NUL/) } },
    });
    const em = (await getEm()).fork();
    const [notes] = await em
      .getConnection()
      .execute<{ n: number }[]>("select count(*)::int as n from order_note where order_id = ?", [orderId]);
    expect(notes?.n).toBe(0);
  });

  dbTest("refunding a payment that does not exist", async () => {
    session.cookie = ownerCookie;
    const result = await refundPaymentAction({
      paymentId: randomUUID(),
      amountCents: 100,
      reason: "Test refund",
    });
    expect(result).toMatchObject({ ok: false, error: { code: "not_found" } });
  });
});
