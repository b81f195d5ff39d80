import { describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";

const ROOT = path.resolve(import.meta.dirname, "../..");
const TSX = path.join(ROOT, "node_modules/.bin/tsx");

function run(args: string[], input?: string) {
  return spawnSync(TSX, ["cli/evaluate.ts", ...args], { cwd: ROOT, input, encoding: "utf8" });
}

describe("cli/evaluate.ts", () => {
  it("valid file → exit 0 and the report JSON on stdout", () => {
    const r = run(["examples/street-truck.json"]);
    expect(r.status).toBe(0);
    const report = JSON.parse(r.stdout);
    expect(report.overall).toBe("pass");
    expect(report.joints[0].workingAngleDeg).toBeCloseTo(2, 9);
  });

  it("stdin (-) works the same", () => {
    const r = run(["-"], readFileSync(path.join(ROOT, "examples/compound-offset.json"), "utf8"));
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout).phasing.phaseIndexDeg).not.toBe(0);
  });

  it("bad fields → exit 2, nothing on stdout, one line per bad field on stderr", () => {
    const design = JSON.parse(readFileSync(path.join(ROOT, "examples/street-truck.json"), "utf8"));
    design.torque.engineTorqueNm = -1;
    design.lengthMm = "long";
    const r = run(["-"], JSON.stringify(design));
    expect(r.status).toBe(2);
    expect(r.stdout).toBe("");
    const lines = r.stderr.trim().split("\n");
    expect(lines).toContain("torque.engineTorqueNm: must be a positive number");
    expect(lines).toContain("lengthMm: must be a positive number");
    expect(lines).toHaveLength(2);
  });

  it("bad JSON or an unreadable file → exit 2, nothing on stdout", () => {
    const bad = run(["-"], "{ nope");
    expect(bad.status).toBe(2);
    expect(bad.stdout).toBe("");
    expect(bad.stderr).toMatch(/^design: must be valid JSON/);
    const missing = run(["does-not-exist.json"]);
    expect(missing.status).toBe(2);
    expect(missing.stdout).toBe("");
    expect(missing.stderr).toMatch(/cannot read/);
  });
});
