import { readFileSync } from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, test, vi } from "vitest";
import fc from "fast-check";
import { NextRequest } from "next/server";
import { POST as benchNoopPost } from "@/app/api/bench/noop/route";
import { POST as evaluatePost } from "@/app/api/designs/evaluate/route";
import { POST as quotePost } from "@/app/api/designs/quote/route";
import { POST as saveDesignPost } from "@/app/api/designs/route";
import { POST as placeOrderPost } from "@/app/api/orders/route";
import { POST as stepsPost } from "@/app/api/floor/steps/route";
import { POST as invitePost } from "@/app/api/auth/invite/route";
import { createStaffUser } from "@/lib/users/staff";
import { authRequest, sessionCookie, signUpVerified, uniqueEmail } from "../setup/auth-requests";

/**
 * Property-based fuzzing of route bodies and action inputs (issue 11), in-process through the
 * real handlers and actions (guard, body reader, schemas, services, PostgreSQL): whatever is sent,
 * the answer is never a 5xx (an action never "internal"), and every 422 names its fields.
 */

const session = vi.hoisted(() => ({ cookie: "" }));
vi.mock("next/headers", () => ({ headers: async () => new Headers({ cookie: session.cookie }) }));
vi.mock("next/cache", () => ({ revalidatePath: () => undefined, revalidateTag: () => undefined }));

const BASE = process.env.BETTER_AUTH_URL ?? "http://127.0.0.1:3999";
const PASSWORD = "a-long-password-1";
const RUNS = Number(process.env.FUZZ_RUNS ?? 60);
const street = JSON.parse(readFileSync("examples/street-truck.json", "utf8")) as Record<string, unknown>;
const cookies: Record<"customer" | "floor" | "owner", string> = { customer: "", floor: "", owner: "" };

beforeAll(async () => {
  const email = uniqueEmail("fuzz");
  await signUpVerified({ name: "Fuzz Customer", email, password: PASSWORD });
  cookies.customer = sessionCookie(await authRequest("/sign-in/email", { email, password: PASSWORD }));
  for (const role of ["floor", "owner"] as const) {
    const staff = uniqueEmail(`fuzz-${role}`);
    await createStaffUser({ name: `Fuzz ${role}`, email: staff, role, password: PASSWORD }, null);
    cookies[role] = sessionCookie(await authRequest("/sign-in/email", { email: staff, password: PASSWORD }));
  }
}, 60_000);

/** Bodies: arbitrary JSON, the street truck with one field replaced, or text that is not JSON. */
const anyValue = fc.oneof(
  fc.jsonValue({ maxDepth: 2 }),
  fc.constantFrom(null, "", 0, -1, 1e308, "not-a-uuid", [], {}, "00000000-0000-4000-8000-000000000000"),
);
const designLike = fc
  .tuple(fc.constantFrom(...Object.keys(street)), anyValue)
  .map(([key, value]) => ({ ...street, [key]: value }));
const body = fc.oneof(
  { weight: 3, arbitrary: fc.jsonValue({ maxDepth: 3 }).map((v) => JSON.stringify(v)) },
  {
    weight: 3,
    arbitrary: designLike.map((d) =>
      JSON.stringify({ design: d, name: "Fuzz", application: { description: "x", use: "street" } }),
    ),
  },
  {
    weight: 2,
    arbitrary: fc
      .dictionary(
        fc.constantFrom(
          "design",
          "designIds",
          "fulfilment",
          "customerId",
          "code",
          "values",
          "token",
          "password",
          "name",
          "application",
          "idempotencyKey",
        ),
        anyValue,
      )
      .map((o) => JSON.stringify(o)),
  },
  { weight: 1, arbitrary: fc.string({ maxLength: 40 }) },
);

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;
const HANDLERS: [name: string, handler: Handler, as: keyof typeof cookies | null][] = [
  ["POST /api/designs/evaluate", evaluatePost as Handler, null],
  ["POST /api/designs/quote", quotePost as Handler, null],
  ["POST /api/designs", saveDesignPost as Handler, "customer"],
  ["POST /api/orders", placeOrderPost as Handler, "customer"],
  ["POST /api/floor/steps", stepsPost as Handler, "floor"],
  ["POST /api/auth/invite", invitePost as Handler, null],
  ["POST /api/bench/noop", benchNoopPost as Handler, null],
];

describe("route bodies under fuzzing", () => {
  test.each(HANDLERS)(
    "%s: never a 5xx, every 422 names its fields",
    { timeout: 120_000 },
    async (_, handler, as) => {
      await fc.assert(
        fc.asyncProperty(body, async (text) => {
          const headers = new Headers({ "content-type": "application/json", origin: BASE });
          if (as) headers.set("cookie", cookies[as]);
          const res = await handler(
            new NextRequest(`${BASE}/api/fuzz`, { method: "POST", headers, body: text }),
            {
              params: Promise.resolve({}),
            },
          );
          const answer = (await res.json().catch(() => null)) as {
            error?: { fields?: Record<string, string> };
          } | null;
          expect(res.status, `${text.slice(0, 200)} → ${JSON.stringify(answer).slice(0, 300)}`).toBeLessThan(
            500,
          );
          if (res.status === 422) {
            const fields = Object.entries(answer?.error?.fields ?? {});
            expect(fields.length, text.slice(0, 200)).toBeGreaterThan(0);
            for (const [field, message] of fields) {
              expect(field).not.toBe("");
              expect(message).not.toBe("");
            }
          }
        }),
        { numRuns: RUNS, seed: Number(process.env.FUZZ_SEED ?? 20261205) },
      );
    },
  );
});

// Every server action, as the owner (who may call every staff action), with arbitrary input.
const actionFiles =
  readFileSync("tests/auth/access-matrix.test.ts", "utf8").match(/lib\/actions\/[\w-]+\.ts#\w+/g) ?? [];

describe("action inputs under fuzzing", () => {
  test("never internal; every invalid input names its fields", { timeout: 120_000 }, async () => {
    expect(actionFiles.length).toBeGreaterThan(10);
    const actions: [string, (input: unknown) => Promise<unknown>][] = [];
    for (const key of new Set(actionFiles)) {
      const [file, name] = key.split("#") as [string, string];
      const mod = (await import(path.resolve(file))) as Record<string, (input: unknown) => Promise<unknown>>;
      actions.push([key, mod[name]!]);
    }
    session.cookie = cookies.owner;
    const input = fc.oneof(
      fc.jsonValue({ maxDepth: 2 }),
      fc.dictionary(
        fc.constantFrom(
          "orderId",
          "serial",
          "reason",
          "amountCents",
          "method",
          "reference",
          "paymentId",
          "userId",
          "role",
          "active",
          "email",
          "name",
          "text",
          "shaftId",
          "checkId",
          "invitationId",
        ),
        anyValue,
      ),
    );
    await fc.assert(
      fc.asyncProperty(fc.nat(actions.length - 1), input, async (i, raw) => {
        const [key, action] = actions[i]!;
        const result = (await action(raw)) as {
          ok: boolean;
          error?: { code: string; fields?: Record<string, string> };
        };
        if (result.ok) return;
        expect(result.error!.code, `${key} ${JSON.stringify(raw).slice(0, 200)}`).not.toBe("internal");
        if (result.error!.code === "invalid")
          expect(
            Object.keys(result.error!.fields ?? {}).length,
            `${key} ${JSON.stringify(raw)}`,
          ).toBeGreaterThan(0);
      }),
      { numRuns: RUNS * 3, seed: Number(process.env.FUZZ_SEED ?? 20261205) },
    );
  });
});
