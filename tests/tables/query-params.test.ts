import { describe, expect, test } from "vitest";
import { parseTableQuery, parseTableQueryStrict, containsPattern } from "@/lib/tables/params";
import { listOrdersQuerySchema } from "@/lib/tables/orders-spec";
import { listStepsQuerySchema } from "@/lib/tables/steps-spec";
import { listShaftsQuerySchema } from "@/lib/tables/shafts-spec";
import { safeCell } from "@/lib/tables/csv";

describe("a table's query in the URL", () => {
  test("nothing given: the defaults (newest orders first, page 1 of 50, every column)", () => {
    const { query, problems } = parseTableQuery(listOrdersQuerySchema, {});
    expect(problems).toEqual([]);
    expect(query).toEqual({ sort: "created", dir: "desc", page: 1, size: 50, hide: [] });
  });

  test("every filter read from a URL", () => {
    const { query, problems } = parseTableQuery(
      listOrdersQuerySchema,
      new URLSearchParams(
        "sort=promised&dir=asc&page=3&size=100&q=%20Rosa%20&status=open&payment=deposit_paid&channel=counter&late=1&hold=1&from=2026-01-01&to=2026-12-31&hide=email,company",
      ),
    );
    expect(problems).toEqual([]);
    expect(query).toEqual({
      sort: "promised",
      dir: "asc",
      page: 3,
      size: 100,
      q: "Rosa",
      status: "open",
      payment: "deposit_paid",
      channel: "counter",
      late: "1",
      hold: "1",
      from: "2026-01-01",
      to: "2026-12-31",
      hide: ["email", "company"],
    });
  });

  test.each([
    ["sort=bogus", "sort", { sort: "created" }],
    ["page=-2", "page", { page: 1 }],
    ["page=abc", "page", { page: 1 }],
    ["page=1.5", "page", { page: 1 }],
    ["page=99999999", "page", { page: 1 }],
    ["size=7", "size", { size: 50 }],
    ["dir=up", "dir", { dir: "desc" }],
    ["status=lost", "status", {}],
    ["late=yes", "late", {}],
    ["from=2026-02-30", "from", {}],
    ["from=12/04/2026", "from", {}],
    ["hide=number", "hide", { hide: [] }],
    ["q=" + "x".repeat(101), "q", {}],
    // PostgreSQL keeps no NUL in text: it used to reach the statement and answer 500.
    ["q=a%00b", "q", {}],
  ])("%s on a page: the default, and the notice names %s", (search, field, expected) => {
    const { query, problems } = parseTableQuery(listOrdersQuerySchema, new URLSearchParams(search));
    expect(problems.map((p) => p.field)).toEqual([field]);
    expect(query).toMatchObject({ sort: "created", dir: "desc", page: 1, size: 50, ...expected });
    if (!(field in expected)) expect(query).not.toHaveProperty(field);
  });

  test("a bad value keeps the good ones beside it; a range the wrong way round is named on `to`", () => {
    const { query, problems } = parseTableQuery(
      listOrdersQuerySchema,
      new URLSearchParams("late=1&sort=nope&from=2026-05-01&to=2026-04-01"),
    );
    expect(query).toMatchObject({ late: "1", sort: "created", from: "2026-05-01" });
    expect(query.to).toBeUndefined();
    expect(problems.map((p) => p.field).sort()).toEqual(["sort", "to"]);
  });

  test("strictly (exports): the fields and their messages", () => {
    const bad = parseTableQueryStrict(listOrdersQuerySchema, new URLSearchParams("sort=x&page=0"));
    expect(bad.ok).toBe(false);
    if (!bad.ok) {
      expect(Object.keys(bad.fields).sort()).toEqual(["page", "sort"]);
      expect(bad.fields.sort).toMatch(/must be one of number, customer/);
    }
    expect(parseTableQueryStrict(listOrdersQuerySchema, new URLSearchParams("late=1")).ok).toBe(true);
  });

  test("empty values are not filters; unknown keys are ignored; only a key's first value counts", () => {
    const { query, problems } = parseTableQuery(listOrdersQuerySchema, {
      q: "",
      status: ["open", "shipped"],
      utm_source: "mail",
    });
    expect(problems).toEqual([]);
    expect(query).toEqual({ sort: "created", dir: "desc", page: 1, size: 50, hide: [], status: "open" });
  });

  test("step codes: three letters in any case, or done; steps never take done", () => {
    expect(parseTableQuery(listShaftsQuerySchema, { step: "run" }).query.step).toBe("RUN");
    expect(parseTableQuery(listShaftsQuerySchema, { step: "done" }).query.step).toBe("DONE");
    expect(parseTableQuery(listShaftsQuerySchema, { step: "R1N" }).problems[0]?.field).toBe("step");
    expect(parseTableQuery(listStepsQuerySchema, { step: "done" }).problems[0]?.field).toBe("step");
    expect(parseTableQuery(listStepsQuerySchema, { user: "x'; drop" }).problems[0]?.field).toBe("user");
  });

  test("search text is matched literally (% and _ are not wildcards)", () => {
    expect(containsPattern("50%_off\\")).toBe("%50\\%\\_off\\\\%");
  });

  test("cells a spreadsheet would run as a formula get a leading apostrophe (OWASP CSV injection)", () => {
    expect(safeCell('=HYPERLINK("http://x")')).toBe('\'=HYPERLINK("http://x")');
    expect(safeCell("+1 555 0100")).toBe("'+1 555 0100");
    expect(safeCell("-2+3")).toBe("'-2+3");
    expect(safeCell("@SUM(A1)")).toBe("'@SUM(A1)");
    expect(safeCell("\t=1")).toBe("'\t=1");
    expect(safeCell("Y26-0007")).toBe("Y26-0007");
    expect(safeCell(12.5)).toBe(12.5);
    expect(safeCell(null)).toBe("");
  });
});
