import { describe, expect } from "vitest";
import { readFileSync } from "node:fs";
import { NextRequest } from "next/server";
import { GET as listRoute, POST as createRoute } from "@/app/api/designs/route";
import { DELETE as deleteRoute, GET as getRoute, PUT as putRoute } from "@/app/api/designs/[id]/route";
import { createStaffUser } from "@/lib/users/staff";
import { getEm } from "@/lib/db/orm";
import { Customer } from "@/entities";
import { authRequest, sessionCookie, signUpVerified, uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";

const PASSWORD = "a-long-password-1";
const street = JSON.parse(readFileSync("examples/street-truck.json", "utf8"));
const body = (over: Record<string, unknown> = {}) =>
  JSON.stringify({
    name: "Street truck rear",
    design: street,
    application: { description: "1979 pickup", use: "street" },
    ...over,
  });

async function signIn(email: string): Promise<string> {
  const res = await authRequest("/sign-in/email", { email, password: PASSWORD });
  expect(res.status).toBe(200);
  return sessionCookie(res);
}
async function customer(): Promise<string> {
  const email = uniqueEmail("drafts");
  await signUpVerified({ name: "Draft Customer", email, password: PASSWORD });
  return signIn(email);
}
async function staff(role: "counter" | "floor"): Promise<string> {
  const email = uniqueEmail(role);
  await createStaffUser({ name: `A ${role}`, email, role, password: PASSWORD }, null);
  return signIn(email);
}

function req(method: string, path: string, cookie: string | null, payload?: string) {
  const headers = new Headers({ "content-type": "application/json" });
  if (cookie) headers.set("cookie", cookie);
  return new NextRequest(`http://127.0.0.1${path}`, { method, headers, body: payload });
}
const ctx = (id = "") => ({ params: Promise.resolve({ id }) });
const create = (cookie: string | null, payload = body()) =>
  createRoute(req("POST", "/api/designs", cookie, payload), ctx());
const getOne = (cookie: string, id: string) => getRoute(req("GET", `/api/designs/${id}`, cookie), ctx(id));
const list = (cookie: string, query = "") => listRoute(req("GET", `/api/designs${query}`, cookie), ctx());

describe("/api/designs — saved drafts", () => {
  dbTest("a customer saves, lists, reads, updates and deletes a draft", async () => {
    const cookie = await customer();
    const res = await create(cookie);
    expect(res.status).toBe(201);
    const draft = await res.json();
    expect(draft).toMatchObject({ name: "Street truck rear", application: { use: "street" } });
    expect(draft.design.lengthMm).toBe(1320.8);

    const listed = await (await list(cookie)).json();
    expect(listed.drafts.map((d: { id: string }) => d.id)).toEqual([draft.id]);

    expect((await (await getOne(cookie, draft.id)).json()).design).toEqual(draft.design);

    const put = await putRoute(
      req(
        "PUT",
        `/api/designs/${draft.id}`,
        cookie,
        body({
          name: "Renamed",
          design: { ...street, lengthMm: 1400 },
          application: { description: "", use: "towing" },
        }),
      ),
      ctx(draft.id),
    );
    expect(put.status).toBe(200);
    expect(await put.json()).toMatchObject({
      name: "Renamed",
      design: { lengthMm: 1400 },
      application: { use: "towing" },
    });

    expect((await deleteRoute(req("DELETE", `/api/designs/${draft.id}`, cookie), ctx(draft.id))).status).toBe(
      204,
    );
    expect((await getOne(cookie, draft.id)).status).toBe(404);
  });

  dbTest("a customer never reads, changes or deletes another customer's draft: 404", async () => {
    const alice = await customer();
    const bob = await customer();
    const draft = await (await create(alice)).json();
    expect((await getOne(bob, draft.id)).status).toBe(404);
    expect((await putRoute(req("PUT", `/api/designs/${draft.id}`, bob, body()), ctx(draft.id))).status).toBe(
      404,
    );
    expect((await deleteRoute(req("DELETE", `/api/designs/${draft.id}`, bob), ctx(draft.id))).status).toBe(
      404,
    );
    expect((await (await list(bob)).json()).drafts).toEqual([]);
    expect((await getOne(alice, draft.id)).status).toBe(200);
    expect((await getOne(alice, "not-a-uuid")).status).toBe(404);
  });

  dbTest.each([
    [
      "a bad length",
      { design: { ...street, lengthMm: -5 } },
      "design.lengthMm",
      "lengthMm: must be a positive number",
    ],
    [
      "an unknown fitting",
      { design: { ...street, ends: { front: { fittingId: "NOPE" } } } },
      "design.ends.front.fittingId",
      "must be an end fitting in the catalogue",
    ],
    [
      "no speed",
      { design: { ...street, speed: {} } },
      "design.speed.maxShaftRpm",
      "must be a positive number",
    ],
    [
      "an unknown use",
      { application: { description: "", use: "space" } },
      "application.use",
      "must be street",
    ],
    ["an empty name", { name: "  " }, "name", "must not be empty"],
  ])("422 naming the field for %s", async (_what, over, field, message) => {
    const cookie = await customer();
    const res = await create(cookie, body(over));
    expect(res.status).toBe(422);
    const err = await res.json();
    expect(err.error.code).toBe("invalid");
    expect(err.error.fields[field]).toContain(message);
  });

  dbTest("no session → 401; a floor worker → 403", async () => {
    expect((await create(null)).status).toBe(401);
    const floor = await staff("floor");
    expect((await create(floor)).status).toBe(403);
    expect((await list(floor)).status).toBe(403);
  });

  dbTest("the counter saves for a named customer and reads any draft", async () => {
    const counter = await staff("counter");
    expect((await create(counter)).status).toBe(422); // which customer?
    const em = await getEm();
    const phone = em.create(Customer, {
      name: "Phone Customer",
      email: uniqueEmail("phone"),
      createdAt: new Date(),
    });
    await em.persistAndFlush(phone);
    const res = await create(counter, body({ customerId: phone.id }));
    expect(res.status).toBe(201);
    const draft = await res.json();
    expect(draft.customerId).toBe(phone.id);
    const alice = await customer();
    const hers = await (await create(alice)).json();
    expect((await getOne(counter, hers.id)).status).toBe(200);
    const mine = await (await list(counter, `?customerId=${phone.id}`)).json();
    expect(mine.drafts.map((d: { id: string }) => d.id)).toEqual([draft.id]);
  });
});
