import { readFileSync } from "node:fs";
import { afterAll, describe, expect, it } from "vitest";
import { defaultCatalogue, resolveSettings } from "@/lib/driveline";
import { answerDesignRoute, type DesignShop } from "@/lib/designs/answers";
import { answerInWorker, designWorkerCount, stopDesignWorkers } from "@/lib/designs/pool";
import { defaultPriceBook } from "@/lib/pricing/price-book";

// The design routes' work runs in worker threads (lib/designs/pool.ts). These tests hold the
// worker's answers to the same function run in this thread, and the pool to its promises: each
// answer reaches the request that asked, a changed shop reaches the worker, a failure is reported.

const file = (name: string) => JSON.parse(readFileSync(`examples/${name}.json`, "utf8"));
const street = file("street-truck");
const compound = file("compound-offset");
const shop: DesignShop = {
  catalogue: defaultCatalogue,
  settings: resolveSettings({}),
  priceBook: defaultPriceBook,
};
const decode = (bytes: Uint8Array) => new TextDecoder().decode(bytes);

afterAll(stopDesignWorkers);

describe("the design worker", () => {
  const bodies: [string, "evaluate" | "quote", string][] = [
    ["a design file", "evaluate", JSON.stringify(street)],
    ["{ design, curves }", "evaluate", JSON.stringify({ design: compound, curves: true })],
    ["a quote", "quote", JSON.stringify({ design: compound, fulfilment: "ship" })],
    ["text that is not JSON", "evaluate", "{ nope"],
    ["a bad field", "quote", JSON.stringify({ design: { ...street, lengthMm: -5 } })],
    ["JSON null", "quote", "null"],
    ["JSON nested too deep", "evaluate", "[".repeat(40) + "]".repeat(40)],
  ];

  it.each(bodies)("answers %s exactly as the route's own function does", async (_name, route, text) => {
    const expected = answerDesignRoute(route, text, shop);
    const got = await answerInWorker(route, text, shop);
    expect(got.status).toBe(expected.status);
    expect(decode(got.bytes)).toBe(expected.json);
  });

  it("gives each of 200 requests in flight its own answer", async () => {
    // Each design differs in length, so a mixed-up answer would carry another one's tube length.
    const lengths = Array.from({ length: 200 }, (_, i) => 1000 + 3 * i);
    const answers = await Promise.all(
      lengths.map((lengthMm) => answerInWorker("evaluate", JSON.stringify({ ...street, lengthMm }), shop)),
    );
    answers.forEach((answer, i) => {
      const expected = answerDesignRoute(
        "evaluate",
        JSON.stringify({ ...street, lengthMm: lengths[i] }),
        shop,
      );
      expect(decode(answer.bytes)).toBe(expected.json);
    });
    const tubeLengths = new Set(answers.map((a) => JSON.parse(decode(a.bytes)).tube.tubeLengthMm));
    expect(tubeLengths.size).toBe(200);
  });

  it("prices with the shop as it is now, not as it was when the worker started", async () => {
    const body = JSON.stringify({ design: street });
    const before = JSON.parse(decode((await answerInWorker("quote", body, shop)).bytes));
    const dearer: DesignShop = {
      ...shop,
      priceBook: { ...shop.priceBook, labourPerShaftCents: shop.priceBook.labourPerShaftCents + 10_000 },
    };
    const after = JSON.parse(decode((await answerInWorker("quote", body, dearer)).bytes));
    expect(after.totalCents).toBeGreaterThan(before.totalCents);
    expect(after).toEqual(JSON.parse(answerDesignRoute("quote", body, dearer).json));
  });

  it("reports a failure inside the worker as an error and answers the next request", async () => {
    const broken = { ...shop, priceBook: null } as unknown as DesignShop;
    await expect(answerInWorker("evaluate", JSON.stringify(street), broken)).rejects.toThrow(
      /design worker:/,
    );
    const next = await answerInWorker("evaluate", JSON.stringify(street), shop);
    expect(next.status).toBe(200);
  });

  it("settles every request in flight when a worker stops, and starts a fresh one", async () => {
    // 2,000 evaluations queue for a few hundred milliseconds; the stop comes long before the last.
    const inFlight = Array.from({ length: 2000 }, () =>
      answerInWorker("evaluate", JSON.stringify(street), shop),
    );
    await stopDesignWorkers();
    const settled = await Promise.allSettled(inFlight);
    const rejected = settled.filter((s) => s.status === "rejected");
    expect(rejected.length).toBeGreaterThan(0);
    for (const r of rejected) expect(String(r.reason)).toMatch(/design worker exited/);
    expect((await answerInWorker("evaluate", JSON.stringify(street), shop)).status).toBe(200);
  });
});

describe("DESIGN_WORKERS", () => {
  it("is one fewer than the cores by default, from one to four", () => {
    const n = designWorkerCount({});
    expect(n).toBeGreaterThanOrEqual(1);
    expect(n).toBeLessThanOrEqual(4);
  });

  it("takes a whole number and names itself when it is anything else", () => {
    expect(designWorkerCount({ DESIGN_WORKERS: "3" })).toBe(3);
    for (const bad of ["0", "-1", "1.5", "many", "100"])
      expect(() => designWorkerCount({ DESIGN_WORKERS: bad })).toThrow(/DESIGN_WORKERS/);
  });
});
