import { beforeAll, describe, expect, vi } from "vitest";
import { NextRequest } from "next/server";
import { randomBytes } from "node:crypto";
import { getEm } from "@/lib/db/orm";
import { Customer } from "@/entities";
import { createPhoneCustomer } from "@/lib/customers";
import { createStaffUser } from "@/lib/users/staff";
import { GET as searchGet } from "@/app/api/customers/search/route";
import { createCustomerAction } from "@/lib/actions/create-customer";
import { authRequest, sessionCookie, uniqueEmail } from "../setup/auth-requests";
import { dbTest, requireDatabase } from "../setup/db";
import { newCustomer } from "../setup/orders";

const PASSWORD = "a-long-password-1";

// Server actions read the session from next/headers; outside a Next request we hand it the cookie.
const session = { cookie: "" };
vi.mock("next/headers", () => ({ headers: async () => new Headers({ cookie: session.cookie }) }));

async function signedIn(email: string) {
  return sessionCookie(await authRequest("/sign-in/email", { email, password: PASSWORD }));
}

async function staffCookie(role: "counter" | "floor" | "owner") {
  const email = uniqueEmail(role);
  await createStaffUser({ name: `Test ${role}`, email, role, password: PASSWORD }, null);
  return signedIn(email);
}

async function search(cookie: string, params: Record<string, string>) {
  const res = await searchGet(
    new NextRequest(`http://127.0.0.1/api/customers/search?${new URLSearchParams(params)}`, {
      headers: { cookie },
    }),
    { params: Promise.resolve({}) },
  );
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
}

const names = (body: Record<string, unknown>) =>
  (body.customers as { name: string }[]).map((c) => c.name).sort();

describe("the counter's customer search (GET /api/customers/search)", () => {
  // A marker no other test's customers carry, so the matches are only ours.
  const tag = `q${randomBytes(4).toString("hex")}`;
  let counter = "";
  let counterId = "";

  beforeAll(async () => {
    requireDatabase();
    const email = uniqueEmail("counter");
    counterId = (await createStaffUser({ name: "Counter", email, role: "counter", password: PASSWORD }, null))
      .id;
    counter = await signedIn(email);
    await createPhoneCustomer(
      { name: `Odalys Brennecke ${tag}`, email: `odalys.${tag}@ranch.example`, phone: "(555) 013-7741" },
      counterId,
    );
    await createPhoneCustomer(
      {
        name: `Tamsin Ruuth ${tag}`,
        email: `t.ruuth.${tag}@mail.example`,
        company: `Kettle Creek Haulage ${tag}`,
      },
      counterId,
    );
    await createPhoneCustomer(
      { name: `Per Lindqvist ${tag}`, email: `per.${tag}@mail.example`, phone: "555 880 1200" },
      counterId,
    );
  });

  dbTest("matches any part of the name, e-mail, company or phone, whatever the capitals", async () => {
    expect(names((await search(counter, { q: `BRENNECKE ${tag}` })).body)).toEqual([
      `Odalys Brennecke ${tag}`,
    ]);
    expect(names((await search(counter, { q: `${tag.toUpperCase()}@RANCH` })).body)).toEqual([
      `Odalys Brennecke ${tag}`,
    ]);
    expect(names((await search(counter, { q: `kettle creek ${tag}` })).body)).toEqual([
      `Tamsin Ruuth ${tag}`,
    ]);
    // Every word must match: the tag narrows a common word to ours.
    expect(names((await search(counter, { q: `mail.example ${tag}` })).body)).toEqual([
      `Per Lindqvist ${tag}`,
      `Tamsin Ruuth ${tag}`,
    ]);
  });

  dbTest("finds a phone by its digits, whatever the spacing typed", async () => {
    const hits = (await search(counter, { q: "5550137741" })).body.customers as {
      name: string;
      phone: string;
    }[];
    expect(hits.map((c) => c.name)).toContain(`Odalys Brennecke ${tag}`);
    const spaced = (await search(counter, { q: `555-880 ${tag}` })).body;
    expect(names(spaced)).toEqual([`Per Lindqvist ${tag}`]);
  });

  dbTest("a query with LIKE's wildcards matches them literally, not everything", async () => {
    expect((await search(counter, { q: `%${tag}_` })).body.customers).toEqual([]);
    expect((await search(counter, { q: "%" })).body.customers).toEqual([]);
  });

  dbTest(
    "returns at most the limit (8 by default, 20 at most; more is refused naming the field)",
    async () => {
      const many = `m${randomBytes(4).toString("hex")}`;
      for (let i = 0; i < 11; i++)
        await createPhoneCustomer(
          { name: `Many ${many} ${i}`, email: `many${i}.${many}@x.example` },
          counterId,
        );
      expect((await search(counter, { q: many })).body.customers).toHaveLength(8);
      expect((await search(counter, { q: many, limit: "3" })).body.customers).toHaveLength(3);
      expect((await search(counter, { q: many, limit: "20" })).body.customers).toHaveLength(11);
      const tooMany = await search(counter, { q: many, limit: "500" });
      expect(tooMany.status).toBe(422);
      expect((tooMany.body.error as { fields: Record<string, string> }).fields).toHaveProperty("limit");
      const empty = await search(counter, { q: "   " });
      expect(empty.status).toBe(422);
      expect((empty.body.error as { fields: Record<string, string> }).fields).toHaveProperty("q");
    },
  );

  dbTest("the owner may search too; customers, the floor and anonymous callers may not", async () => {
    expect((await search(await staffCookie("owner"), { q: tag })).status).toBe(200);
    expect((await search(await staffCookie("floor"), { q: tag })).status).toBe(403);
    const { user } = await newCustomer();
    expect((await search(await signedIn(user.email), { q: tag })).status).toBe(403);
    expect((await search("", { q: tag })).status).toBe(401);
  });

  dbTest("the search can use its trigram index (EXPLAIN with sequential scans off)", async () => {
    const em = await getEm();
    const rows = await em.getConnection().transactional(async (tx) => {
      await em.getConnection().execute("set local enable_seqscan = off", [], "all", tx);
      return em
        .getConnection()
        .execute<{ "QUERY PLAN": string }[]>(
          `explain select id from customer where lower(name || ' ' || email || ' ' || coalesce(company, '') || ' ' || coalesce(phone, '')) like '%brennecke%'`,
          [],
          "all",
          tx,
        );
    });
    expect(rows.map((r) => r["QUERY PLAN"]).join("\n")).toContain("customer_search_trgm_index");
  });
});

describe("the counter creates a customer on the spot (createCustomerAction)", () => {
  dbTest("names each field it refuses", async () => {
    session.cookie = await staffCookie("counter");
    const result = await createCustomerAction({ name: "A", email: "not-an-address", phone: "12" });
    expect(result).toMatchObject({ ok: false, error: { code: "invalid" } });
    const fields = result.ok ? {} : (result.error.fields ?? {});
    expect(Object.keys(fields).sort()).toEqual(["email", "name", "phone"]);
  });

  dbTest(
    "saves a phone customer; a second one with the same e-mail (any capitals) is a conflict naming the first",
    async () => {
      session.cookie = await staffCookie("counter");
      const email = uniqueEmail("phone");
      const first = await createCustomerAction({
        name: "Wilhelmina Achterberg",
        email,
        phone: "555 010 2030",
        company: "Achterberg Feed",
      });
      expect(first).toMatchObject({ ok: true, data: { name: "Wilhelmina Achterberg", hasAccount: false } });
      const again = await createCustomerAction({ name: "W. Achterberg", email: email.toUpperCase() });
      expect(again).toMatchObject({
        ok: false,
        error: { code: "conflict", fields: { email: expect.stringContaining("Wilhelmina Achterberg") } },
      });
      const em = await getEm();
      expect(await em.count(Customer, { email })).toBe(1);
    },
  );

  dbTest("customers and the floor cannot create customers", async () => {
    session.cookie = await staffCookie("floor");
    expect(await createCustomerAction({ name: "Someone", email: uniqueEmail("x") })).toMatchObject({
      ok: false,
      error: { code: "forbidden" },
    });
    const { user } = await newCustomer();
    session.cookie = await signedIn(user.email);
    expect(await createCustomerAction({ name: "Someone", email: uniqueEmail("x") })).toMatchObject({
      ok: false,
      error: { code: "forbidden" },
    });
    session.cookie = "";
    expect(await createCustomerAction({ name: "Someone", email: uniqueEmail("x") })).toMatchObject({
      ok: false,
      error: { code: "unauthenticated" },
    });
  });
});
