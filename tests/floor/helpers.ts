import { randomUUID } from "node:crypto";
import { Order, OrderShaft, User } from "@/entities";
import type { CurrentUser } from "@/lib/auth/access";
import type { Role } from "@/lib/auth/roles";
import { getEm } from "@/lib/db/orm";
import { formatStepCode } from "@/lib/traveller/codes";
import { createTestOrder } from "../setup/test-orders";
import { exampleReport } from "../traveller/fixtures";

export async function staff(role: Role): Promise<CurrentUser> {
  const em = await getEm();
  const id = randomUUID();
  const user = em.create(User, {
    id,
    emailVerified: true,
    createdAt: new Date(),
    updatedAt: new Date(),
    name: `Test ${role}`,
    email: `${role}-${id.slice(0, 8)}@test.example`,
    role,
  });
  await em.flush();
  return { id: user.id, name: user.name, email: user.email, role };
}

/** An order of the README street truck (or more shafts), paid deposit, as the payments webhook leaves it. */
export async function paidOrder(
  options: { shafts?: number; fulfilment?: "ship" | "pickup"; paymentState?: Order["paymentState"] } = {},
) {
  const em = await getEm();
  const order = await createTestOrder(em);
  order.status = options.paymentState === "unpaid" ? "awaiting_payment" : "received";
  order.paymentState = options.paymentState ?? "deposit_paid";
  order.fulfilment = options.fulfilment ?? "ship";
  const report = exampleReport();
  for (let i = 1; i <= (options.shafts ?? 1); i++) {
    em.create(OrderShaft, {
      order,
      position: i,
      name: `Shaft ${i}`,
      application: { description: "Half-ton pickup", use: "street" },
      design: {},
      evaluation: JSON.parse(JSON.stringify(report)) as Record<string, unknown>,
      overall: report.overall,
      priceLines: [],
      priceCents: 50_000,
    });
  }
  await em.flush();
  return order;
}

// Inches, since the floor default is "in". README street truck: 1188.8 mm cut, 1320.8 mm between joint centres.
export const good: Record<string, Record<string, unknown>> = {
  CUT: { tubeHeatLot: "H-2291", cutLengthMm: 1188.8 / 25.4 },
  WLD: {
    frontYokeLot: "FY-1",
    rearYokeLot: "RY-1",
    frontJointLot: "FJ-1",
    rearJointLot: "RJ-1",
    weldedLengthMm: 52.0,
    phaseIndexDeg: 0.4,
  },
  RUN: { runoutFrontMm: 0.006, runoutMidMm: 0.012, runoutRearMm: 0.007 },
  BAL: {
    balanceSpeedRpm: 2500,
    residualFrontGmm: 0.1,
    residualRearGmm: 0.12,
    weights: [{ plane: "front", mass: 0.25, angleDeg: 90 }],
  },
  FIN: { overallLengthMm: 52.01, jointsFree: true, phaseIndexDeg: 0.3, paintMarking: true },
  SHP: { carrier: "Freight demo", trackingNumber: "TRACK-0001" },
};

export const code = (serial: string, step: string, revision = 1) =>
  formatStepCode({ serial, step, revision });
export const key = () => randomUUID();
