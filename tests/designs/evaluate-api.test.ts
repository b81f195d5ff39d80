import { describe, expect } from "vitest";
import { readFileSync } from "node:fs";
import { NextRequest } from "next/server";
import { POST } from "@/app/api/designs/evaluate/route";
import { dbTest } from "../setup/db";

const street = JSON.parse(readFileSync("examples/street-truck.json", "utf8"));
const call = (body: string) =>
  POST(
    new NextRequest("http://127.0.0.1/api/designs/evaluate", {
      method: "POST",
      body,
      headers: { "content-type": "application/json" },
    }),
    {
      params: Promise.resolve({}),
    },
  );

describe("POST /api/designs/evaluate", () => {
  dbTest("answers the report for a valid design file", async () => {
    const res = await call(JSON.stringify(street));
    expect(res.status).toBe(200);
    const report = await res.json();
    expect(report.overall).toBe("pass");
    expect(report.joints).toHaveLength(2);
    expect(report.criticalSpeedRpm).toBeGreaterThan(0);
  });

  dbTest("accepts { design, curves } and includes the curves", async () => {
    const res = await call(JSON.stringify({ design: street, curves: true }));
    expect(res.status).toBe(200);
    expect((await res.json()).curves.output.length).toBeGreaterThan(100);
  });

  dbTest("answers 422 naming each bad field", async () => {
    const bad = { ...street, lengthMm: -5, torque: { ...street.torque, engineTorqueNm: "lots" } };
    const res = await call(JSON.stringify(bad));
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.error.code).toBe("invalid");
    expect(Object.keys(body.error.fields)).toEqual(
      expect.arrayContaining(["lengthMm", "torque.engineTorqueNm"]),
    );
    expect(body.error.message).toContain("torque.engineTorqueNm:");
  });

  dbTest("answers 422 for a body that is not JSON", async () => {
    const res = await call("{ nope");
    expect(res.status).toBe(422);
    expect((await res.json()).error.message).toMatch(/not valid JSON/);
  });
});

describe("POST /api/designs/quote", () => {
  dbTest("prices a design file with the shop's price book", async () => {
    const { POST: quote } = await import("@/app/api/designs/quote/route");
    const res = await quote(
      new NextRequest("http://127.0.0.1/api/designs/quote", {
        method: "POST",
        body: JSON.stringify({ design: street, fulfilment: "ship" }),
      }),
      { params: Promise.resolve({}) },
    );
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.orderable).toBe(true);
    expect(body.shippingCents).toBeGreaterThan(0);
    expect(body.totalCents).toBe(body.subtotalCents + body.shippingCents + body.taxCents);
    expect(body.lines.map((l: { code: string }) => l.code)).toContain("tube");
  });
});
