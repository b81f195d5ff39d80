import { readFileSync } from "node:fs";
import { describe, expect } from "vitest";
import { Order, OrderShaft, WorkOrder, WorkOrderStep } from "@/entities";
import { getEm } from "@/lib/db/orm";
import { releaseOrder, submitStep } from "@/lib/floor/work-orders";
import { placeOrder } from "@/lib/orders/place-order";
import type { EvaluationReport } from "@/lib/driveline";
import type { StepSpec } from "@/lib/traveller/steps";
import { fromSi } from "@/lib/traveller/units";
import { dbTest } from "../setup/db";
import { newCustomer, saveDesign } from "../setup/orders";
import { code, key, staff } from "./helpers";
import { TWO_PIECE_STEP_CODES } from "../traveller/fixtures";

const twoPieceVan = JSON.parse(readFileSync("examples/two-piece-van.json", "utf8")) as Record<
  string,
  unknown
>;

/** In-limit values for a step's record sheet, in the floor's default inches: each nominal, or well inside its limit. */
function goodValues(spec: StepSpec): Record<string, unknown> {
  const values: Record<string, unknown> = {};
  for (const f of spec.fields) {
    if (f.type === "text") values[f.key] = `${f.key.toUpperCase()}-1`;
    else if (f.type === "confirm") values[f.key] = true;
    else if (f.type === "weights") values[f.key] = [];
    else if (f.quantity === "speed") values[f.key] = 800;
    else {
      const l = f.limit!;
      const si = l.nominal ?? (l.max ?? 1) / 2;
      values[f.key] = fromSi(f.quantity, "in", si);
    }
  }
  return values;
}

describe("a two-piece shaft through the shop", () => {
  dbTest(
    "ordered online and at the counter, priced with its centre bearing, re-evaluated on the server",
    async () => {
      const { user, customer } = await newCustomer();
      const design = await saveDesign(customer, user.id, twoPieceVan, "Van, two-piece");
      const online = await placeOrder(user, { designIds: [design.id], fulfilment: "pickup" });
      const counter = await staff("counter");
      const byPhone = await saveDesign(customer, counter.id, twoPieceVan, "Van, two-piece (phone)");
      const desk = await placeOrder(counter, {
        customerId: customer.id,
        designIds: [byPhone.id],
        fulfilment: "pickup",
      });
      const em = (await getEm()).fork();
      for (const order of [online, desk]) {
        const shaft = await em.findOneOrFail(OrderShaft, { order: order.id });
        const report = shaft.evaluation as unknown as EvaluationReport;
        expect(report.layout).toBe("two-piece");
        expect(report.pieces).toHaveLength(2);
        expect(shaft.priceLines.filter((l) => l.code === "tube")).toHaveLength(2);
        expect(shaft.priceLines.filter((l) => l.code === "joint")).toHaveLength(3);
        expect(shaft.priceLines.find((l) => l.code === "centre-bearing")?.totalCents).toBe(34_420); // demo price
        expect(shaft.priceCents).toBe(shaft.priceLines.reduce((s, l) => s + l.totalCents, 0));
        const row = await em.findOneOrFail(Order, { id: order.id });
        expect(row.subtotalCents).toBe(shaft.priceCents);
      }
      expect((await em.findOneOrFail(Order, { id: desk.id })).channel).toBe("counter");
    },
  );

  dbTest(
    "released with per-piece steps; each piece is held to its own limits; assembly, inspection, pickup",
    async () => {
      const { user, customer } = await newCustomer();
      const design = await saveDesign(customer, user.id, twoPieceVan, "Van, two-piece");
      const order = await placeOrder(user, { designIds: [design.id], fulfilment: "pickup" });
      const counter = await staff("counter");
      const floor = await staff("floor");
      const released = await releaseOrder(order.id, counter, "Deposit taken by phone (test)");
      expect(released.workOrders[0]!.stepCount).toBe(11);
      const serial = released.workOrders[0]!.serial;
      const em = (await getEm()).fork();
      const wo = await em.findOneOrFail(WorkOrder, { serial });
      const steps = await em.find(WorkOrderStep, { workOrder: wo.id }, { orderBy: { position: "asc" } });
      expect(steps.map((s) => s.code)).toEqual(TWO_PIECE_STEP_CODES);
      const spec = (c: string) => steps.find((s) => s.code === c)!.spec;

      // Piece A's cut: in limit.
      const a = await submitStep(code(serial, "CUA"), goodValues(spec("CUA")), floor, key());
      expect(a).toMatchObject({ outcome: "pass", next: { code: "CUB" } });
      // Piece B cut to piece A's length: 79 mm short of its own, held with the limit named.
      const wrong = { ...goodValues(spec("CUB")), cutLengthMm: goodValues(spec("CUA")).cutLengthMm };
      const held = await submitStep(code(serial, "CUB"), wrong, floor, key());
      expect(held.outcome).toBe("hold");
      expect(held.failures.map((f) => f.key)).toEqual(["cutLengthMm"]);
      // Recut to its own length clears the hold (rework), then every remaining step in order.
      expect((await submitStep(code(serial, "CUB"), goodValues(spec("CUB")), floor, key())).outcome).toBe(
        "rework",
      );
      for (const c of ["WLA", "WLB", "RUA", "RUB", "BAA", "BAB", "ASM", "FIN"]) {
        const r = await submitStep(code(serial, c), goodValues(spec(c)), floor, key());
        expect([c, r.outcome]).toEqual([c, "pass"]);
      }
      expect((await em.fork().findOneOrFail(Order, { id: order.id })).status).toBe("ready");
      const shipped = await submitStep(code(serial, "SHP"), { pickedUpBy: "Bea Buyer" }, floor, key());
      expect(shipped).toMatchObject({ outcome: "pass", workOrderState: "picked_up", next: null });
    },
  );
});
