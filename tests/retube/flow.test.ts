import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect } from "vitest";
import { NextRequest } from "next/server";
import { AuditEvent, Design, Order, OrderShaft, WorkOrder, WorkOrderStep } from "@/entities";
import { PUT } from "@/app/api/designs/[id]/repair/route";
import type { CurrentUser } from "@/lib/auth/access";
import { getEm } from "@/lib/db/orm";
import { asBuiltRecord } from "@/lib/floor/queries";
import {
  concedeHold,
  orderFloorState,
  releaseOrder,
  submitStep,
  travellerViewFor,
} from "@/lib/floor/work-orders";
import { placeOrder } from "@/lib/orders/place-order";
import { orderView, populateOrder } from "@/lib/orders/queries";
import { emptyIntake, type RepairBlock } from "@/lib/retube/intake";
import { createStaffUser } from "@/lib/users/staff";
import { authRequest, sessionCookie, uniqueEmail } from "../setup/auth-requests";
import { dbTest } from "../setup/db";
import { newCustomer, saveDesign } from "../setup/orders";
import { code, good, key } from "../floor/helpers";
import { shopToday } from "@/lib/shop/locale";

const PASSWORD = "a-long-password-1";
const staff: Record<"counter" | "owner" | "floor", { user: CurrentUser; cookie: string }> = {} as never;

beforeAll(async () => {
  for (const role of ["counter", "owner", "floor"] as const) {
    const email = uniqueEmail(`retube-${role}`);
    const row = await createStaffUser({ name: `Retube ${role}`, email, role, password: PASSWORD }, null);
    const cookie = sessionCookie(await authRequest("/sign-in/email", { email, password: PASSWORD }));
    staff[role] = { user: { id: row.id, name: row.name, email, role }, cookie };
  }
});

async function put(designId: string, body: unknown, cookie?: string) {
  return PUT(
    new NextRequest(`http://127.0.0.1/api/designs/${designId}/repair`, {
      method: "PUT",
      headers: { "content-type": "application/json", ...(cookie ? { cookie } : {}) },
      body: JSON.stringify(body),
    }),
    { params: Promise.resolve({ id: designId }) },
  );
}

/** The README street truck's own weld-to-weld: 1320.8 mm − 2 × 66 mm seats (demo catalogue) = 1188.8 mm. */
function retubeBody(reuse: Record<string, string>, weldToWeldMm = 1188.8) {
  const parts = emptyIntake().parts;
  for (const [p, note] of Object.entries(reuse)) parts[p as keyof typeof parts] = { reuse: true, note };
  return { job: "retube", repair: { weldToWeldMm, parts } };
}

async function freshDesign() {
  const { user, customer } = await newCustomer();
  const design = await saveDesign(customer, user.id, undefined, `Re-tube ${randomUUID().slice(0, 4)}`);
  const cookie = sessionCookie(
    await authRequest("/sign-in/email", { email: user.email, password: PASSWORD }),
  );
  return { user, customer, design, cookie };
}

describe("PUT /api/designs/[id]/repair", () => {
  dbTest("refuses anonymous (401), the customer and the floor (403); unknown drafts are 404", async () => {
    const { design, cookie } = await freshDesign();
    const body = retubeBody({ frontEnd: "bores round" });
    expect((await put(design.id, body)).status).toBe(401);
    expect((await put(design.id, body, cookie)).status).toBe(403);
    expect((await put(design.id, body, staff.floor.cookie)).status).toBe(403);
    expect((await put(randomUUID(), body, staff.counter.cookie)).status).toBe(404);
    expect((await put("not-a-uuid", body, staff.counter.cookie)).status).toBe(404);
    const em = await getEm();
    expect((await em.findOneOrFail(Design, { id: design.id })).repair ?? null).toBeNull();
  });

  dbTest(
    "422 names the field and keeps what was saved; a good intake is stored with who and when, audited",
    async () => {
      const { design } = await freshDesign();
      const ok = await put(
        design.id,
        retubeBody({ rearJoint: "tight, no rust" }, 1190),
        staff.counter.cookie,
      );
      expect(ok.status).toBe(200);
      expect(await ok.json()).toMatchObject({ job: "retube", repair: { weldToWeldMm: 1190 } });

      const bad = await put(design.id, retubeBody({}, -5), staff.counter.cookie);
      expect(bad.status).toBe(422);
      expect((await bad.json()).error.fields).toEqual({ "repair.weldToWeldMm": "must be a positive number" });
      const em = await getEm();
      const saved = (await em.findOneOrFail(Design, { id: design.id })).repair!;
      expect(saved).toMatchObject({
        weldToWeldMm: 1190,
        parts: { rearJoint: { reuse: true, note: "tight, no rust" } },
        recordedBy: { id: staff.counter.user.id, name: "Retube counter" },
      });
      const audits = await em.find(AuditEvent, { subjectId: design.id, action: "design.repair" });
      expect(audits).toHaveLength(1);
      expect(audits[0]!.details).toMatchObject({ before: null, after: { weldToWeldMm: 1190 } });

      // Back to a new shaft: the intake goes, and that is audited too (before → after).
      expect((await put(design.id, { job: "new" }, staff.owner.cookie)).status).toBe(200);
      em.clear();
      expect((await em.findOneOrFail(Design, { id: design.id })).repair ?? null).toBeNull();
      expect(await em.count(AuditEvent, { subjectId: design.id, action: "design.repair" })).toBe(2);
    },
  );
});

describe("a re-tube order from the counter through the floor", () => {
  dbTest(
    "is priced without the reused parts, released with teardown and inspection first, held by a failed part, cleared by concession or rework",
    { timeout: 120_000 },
    async () => {
      const a = await freshDesign();
      const b = await saveDesign(a.customer, a.user.id, undefined, "Second shaft");
      await put(a.design.id, retubeBody({ frontEnd: "ok", frontJoint: "smooth" }), staff.counter.cookie);
      await put(b.id, retubeBody({ rearEnd: "ears straight" }), staff.counter.cookie);
      // The same design as a new shaft, for the price difference.
      const plain = await saveDesign(a.customer, a.user.id, undefined, "New shaft");

      const order = await placeOrder(staff.counter.user, {
        designIds: [a.design.id, b.id, plain.id],
        fulfilment: "pickup",
        customerId: a.customer.id,
      });
      const em = await getEm();
      const shafts = await em.find(OrderShaft, { order: order.id }, { orderBy: { position: "asc" } });
      expect(shafts.map((s) => s.job)).toEqual(["retube", "retube", "new"]);
      expect(shafts[0]!.repair).toMatchObject({ weldToWeldMm: 1188.8, parts: { frontEnd: { reuse: true } } });
      expect(shafts[2]!.repair).toBeNull();
      const fresh = shafts[2]!.priceLines;
      const frontYoke = fresh.find((l) => l.code === "fitting")!.totalCents;
      const frontJoint = fresh.find((l) => l.code === "joint")!.totalCents;
      expect(shafts[0]!.priceCents).toBe(shafts[2]!.priceCents - frontYoke - frontJoint + 4500);
      expect(shafts[0]!.priceLines.find((l) => l.code === "teardown")?.totalCents).toBe(4500);
      const placed = await em.findOneOrFail(AuditEvent, { subjectId: order.id, action: "order.place" });
      expect((placed.details as { retubes: unknown[] }).retubes).toHaveLength(2);

      // The customer's page and timeline say "re-tube".
      const view = orderView(
        await populateOrder(em, await em.findOneOrFail(Order, { id: order.id })),
        a.user,
        await shopToday(),
      );
      expect(view.shaftViews.map((s) => s.retube?.weldToWeldMm ?? null)).toEqual([1188.8, 1188.8, null]);
      expect(view.events.map((e) => e.label)).toContain("Order received (3 shafts, 2 re-tubes)");

      const released = await releaseOrder(order.id, staff.counter.user, "Customer pays at pickup");
      const [woA, woB] = released.workOrders;
      const steps = await em.find(WorkOrderStep, { workOrder: woA!.id }, { orderBy: { position: "asc" } });
      expect(steps.map((s) => s.code)).toEqual(["TDN", "INS", "CUT", "WLD", "RUN", "BAL", "FIN", "SHP"]);
      expect(
        (await em.find(WorkOrderStep, { workOrder: released.workOrders[2]!.id })).map((s) => s.code).sort(),
      ).toEqual(["BAL", "CUT", "FIN", "RUN", "SHP", "WLD"]);

      // Teardown (the floor works in inches): weld-to-weld re-measured, each part's state.
      const states = {
        frontEndState: "ok",
        rearEndState: "ears worn",
        slipYokeState: "not received",
        frontJointState: "ok",
        rearJointState: "seized",
      };
      const tdn = await submitStep(
        code(woA!.serial, "TDN"),
        { weldToWeldMm: 1188.8 / 25.4, ...states },
        staff.floor.user,
        key(),
      );
      expect(tdn).toMatchObject({ outcome: "pass", next: { code: "INS" } });
      // Inspection: the front joint fails → hold, with what was found as the reason.
      const held = await submitStep(
        code(woA!.serial, "INS"),
        { findings: "front joint: cap brinelled", frontEndPasses: "yes", frontJointPasses: "no" },
        staff.floor.user,
        key(),
      );
      expect(held.outcome).toBe("hold");
      expect(held.failures.map((f) => f.message)).toEqual([
        "Front joint passes, reuse it: no — front joint: cap brinelled",
      ]);
      const floorState = await orderFloorState(em, order.id);
      expect(floorState.state).toBe("on_hold");
      // The floor cannot skip past the hold.
      await expect(submitStep(code(woA!.serial, "CUT"), good.CUT!, staff.floor.user, key())).rejects.toThrow(
        /not next/,
      );
      // The owner accepts it (a concession); the shaft moves on to cutting.
      const conceded = await concedeHold(
        woA!.id,
        staff.owner.user,
        "Customer accepts the joint as is, in writing",
      );
      expect(conceded).toMatchObject({ outcome: "concession", next: { code: "CUT" } });

      // Shaft B: the rear yoke fails, is replaced, and the inspection passes as rework.
      await submitStep(
        code(woB!.serial, "TDN"),
        { weldToWeldMm: 1188.8 / 25.4, ...states },
        staff.floor.user,
        key(),
      );
      const bHold = await submitStep(
        code(woB!.serial, "INS"),
        { findings: "rear yoke ear cracked", rearEndPasses: false },
        staff.floor.user,
        key(),
      );
      expect(bHold.outcome).toBe("hold");
      const rework = await submitStep(
        code(woB!.serial, "INS"),
        { findings: "rear yoke replaced with a new one", rearEndPasses: true },
        staff.floor.user,
        key(),
      );
      expect(rework).toMatchObject({ outcome: "rework", next: { code: "CUT" } });

      // The new shaft on the same order keeps the usual routing.
      const woC = await em.findOneOrFail(WorkOrder, { id: released.workOrders[2]!.id });
      expect(woC.stepCount).toBe(6);

      // The as-built record says re-tube and keeps the teardown and inspection records.
      const record = await asBuiltRecord(em, woA!.serial);
      expect(record.retube).toMatchObject({ weldToWeldMm: 1188.8 });
      expect(record.steps.slice(0, 2).map((s) => [s.code, s.records.map((r) => r.outcome)])).toEqual([
        ["TDN", ["pass"]],
        ["INS", ["hold", "concession"]],
      ]);

      // The traveller knows it is a re-tube (tests/retube/traveller.test.ts reads the printed page).
      const traveller = await travellerViewFor(em, woA!.id);
      expect(traveller.retube).toMatchObject({ weldToWeldMm: 1188.8 });
      expect(traveller.steps.map((s) => s.code).slice(0, 2)).toEqual(["TDN", "INS"]);
    },
  );

  dbTest(
    "a weld-to-weld the floor cannot confirm holds the teardown before the old tube is cut",
    async () => {
      const a = await freshDesign();
      await put(a.design.id, retubeBody({}, 1188.8), staff.counter.cookie);
      const order = await placeOrder(staff.counter.user, {
        designIds: [a.design.id],
        fulfilment: "pickup",
        customerId: a.customer.id,
      });
      const released = await releaseOrder(order.id, staff.counter.user, "Paid at the counter later");
      const wo = released.workOrders[0]!;
      const res = await submitStep(
        code(wo.serial, "TDN"),
        {
          weldToWeldMm: (1188.8 + 10) / 25.4,
          frontEndState: "a",
          rearEndState: "b",
          slipYokeState: "c",
          frontJointState: "d",
          rearJointState: "e",
        },
        staff.floor.user,
        key(),
      );
      expect(res.outcome).toBe("hold");
      expect(res.failures.map((f) => f.key)).toEqual(["weldToWeldMm"]);
      // Nothing reused: inspection asks one confirmation.
      const em = await getEm();
      const ins = await em.findOneOrFail(WorkOrderStep, { workOrder: wo.id, code: "INS" });
      expect(ins.spec.fields.map((f) => f.key)).toEqual(["allNewParts"]);
      const shaft = await em.findOneOrFail(OrderShaft, { order: order.id });
      expect((shaft.repair as RepairBlock).recordedBy.id).toBe(staff.counter.user.id);
    },
  );
});
