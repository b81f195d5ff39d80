import { describe, expect, it } from "vitest";
import { spawn } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";

const ROOT = path.resolve(import.meta.dirname, "../..");
const TSX = path.join(ROOT, "node_modules/.bin/tsx");

/** Runs the CLI as a shell would; resolves with its exit code and output. */
function run(
  args: string[],
  input?: string,
): Promise<{ status: number | null; stdout: string; stderr: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn(TSX, ["cli/evaluate.ts", ...args], { cwd: ROOT });
    let stdout = "";
    let stderr = "";
    child.stdout.setEncoding("utf8").on("data", (d: string) => (stdout += d));
    child.stderr.setEncoding("utf8").on("data", (d: string) => (stderr += d));
    child.on("error", reject);
    child.on("close", (status) => resolve({ status, stdout, stderr }));
    child.stdin.end(input ?? "");
  });
}

const badDesign = JSON.parse(readFileSync(path.join(ROOT, "examples/street-truck.json"), "utf8"));
badDesign.torque.engineTorqueNm = -1;
badDesign.lengthMm = "long";

// Every run starts at once (each is a separate process that mostly waits on loading TypeScript);
// each test reads its own.
const runs = {
  valid: run(["examples/street-truck.json"]),
  stdin: run(["-"], readFileSync(path.join(ROOT, "examples/compound-offset.json"), "utf8")),
  badFields: run(["-"], JSON.stringify(badDesign)),
  badJson: run(["-"], "{ nope"),
  missing: run(["does-not-exist.json"]),
};

describe("cli/evaluate.ts", () => {
  it("valid file → exit 0 and the report JSON on stdout", async () => {
    const r = await runs.valid;
    expect(r.status).toBe(0);
    const report = JSON.parse(r.stdout);
    expect(report.overall).toBe("pass");
    expect(report.joints[0].workingAngleDeg).toBeCloseTo(2, 9);
  });

  it("stdin (-) works the same", async () => {
    const r = await runs.stdin;
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout).phasing.phaseIndexDeg).not.toBe(0);
  });

  it("bad fields → exit 2, nothing on stdout, one line per bad field on stderr", async () => {
    const r = await runs.badFields;
    expect(r.status).toBe(2);
    expect(r.stdout).toBe("");
    const lines = r.stderr.trim().split("\n");
    expect(lines).toContain("torque.engineTorqueNm: must be a positive number");
    expect(lines).toContain("lengthMm: must be a positive number");
    expect(lines).toHaveLength(2);
  });

  it("bad JSON or an unreadable file → exit 2, nothing on stdout", async () => {
    const bad = await runs.badJson;
    expect(bad.status).toBe(2);
    expect(bad.stdout).toBe("");
    expect(bad.stderr).toMatch(/^design: must be valid JSON/);
    const missing = await runs.missing;
    expect(missing.status).toBe(2);
    expect(missing.stdout).toBe("");
    expect(missing.stderr).toMatch(/cannot read/);
  });
});
