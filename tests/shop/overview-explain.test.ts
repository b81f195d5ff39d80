import { afterAll, beforeAll, describe, expect } from "vitest";
import { Client } from "pg";
import { dbTest, requireDatabase } from "../setup/db";
import { defaultGeneration } from "./helpers";
import { defaultFloorSettings } from "@/lib/traveller/settings";
import { generateShop, insertCustomers, type GenerateResult } from "@/lib/demo/generate";
import { measuredStepAverages, overviewContext } from "@/lib/shop/overview";
import { OVERVIEW_QUERIES, pgExec, type OverviewQueryContext } from "@/lib/shop/overview-queries";

// Every overview query's plan on a generated shop (two years of orders, in a transaction rolled
// back at the end), after ANALYZE: each uses the indexes named beside it in overview-queries.ts.
const ORDERS = 4_000;

interface PlanNode {
  "Node Type": string;
  "Index Name"?: string;
  "Relation Name"?: string;
  Plans?: PlanNode[];
}

function walk(node: PlanNode, out: PlanNode[] = []): PlanNode[] {
  out.push(node);
  for (const child of node.Plans ?? []) walk(child, out);
  return out;
}

let db: Client;
let ctx: OverviewQueryContext;
let made: GenerateResult;

describe("overview queries use their indexes", () => {
  beforeAll(async () => {
    db = new Client({ connectionString: requireDatabase() });
    await db.connect();
    await db.query("begin");
    const now = new Date();
    const customers = await insertCustomers(db, 300, now, 3, 50_000);
    made = await generateShop(db, {
      orders: ORDERS,
      customers,
      ...defaultGeneration,
      now,
      weeks: 104,
      events: false,
      seed: 42,
    });
    await db.query(
      "analyze shop_order, order_shaft, work_order, work_order_step, step_record, payment, refund, customer",
    );
    const exec = pgExec(db);
    ctx = overviewContext(
      now,
      defaultFloorSettings,
      await measuredStepAverages(exec, defaultFloorSettings, now),
    );
  }, 180_000);

  afterAll(async () => {
    await db?.query("rollback");
    await db?.end();
  });

  dbTest("the generated shop is big enough to plan against", () => {
    expect(made.orders).toBe(ORDERS);
    expect(made.stepRecords).toBeGreaterThan(ORDERS * 5);
  });

  for (const [key, q] of Object.entries(OVERVIEW_QUERIES)) {
    dbTest(`${q.name}: ${q.indexes.join(", ")}`, async () => {
      let n = 0;
      const text = q.sql.replace(/\?/g, () => `$${++n}`);
      const { rows } = await db.query<{ "QUERY PLAN": { Plan: PlanNode }[] }>(
        `explain (format json) ${text}`,
        q.params(ctx),
      );
      const nodes = walk(rows[0]!["QUERY PLAN"][0]!.Plan);
      const used = new Set(nodes.map((p) => p["Index Name"]).filter(Boolean));
      const seqScan = nodes.some((p) => p["Node Type"] === "Seq Scan");
      // A query that reads a whole table may scan it; the reason is stated beside the query.
      if ("seqScanIsRight" in q && seqScan && used.size === 0) return;
      for (const index of q.indexes) expect([...used], `${key} uses ${index}`).toContain(index);
    });
  }
});
