/**
 * Evaluate a design file: `tsx cli/evaluate.ts design.json` (or `-` for stdin).
 * Report JSON on stdout, exit 0. Invalid input: exit 2, nothing on stdout, one line per bad
 * field on stderr.
 */
import { readFileSync } from "node:fs";
import { parseAndEvaluate } from "../lib/driveline";

const EXIT_INVALID = 2;

function fail(lines: readonly string[]): never {
  process.stderr.write(lines.map((l) => `${l}\n`).join(""));
  process.exit(EXIT_INVALID);
}

function readInput(arg: string | undefined): string {
  if (!arg) fail(["usage: evaluate <design.json | ->"]);
  try {
    return readFileSync(arg === "-" ? 0 : arg, "utf8");
  } catch (error) {
    fail([`${arg}: cannot read the file (${(error as NodeJS.ErrnoException).code ?? "read error"})`]);
  }
}

function main(): void {
  const text = readInput(process.argv[2]);
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    fail([`design: must be valid JSON (${(error as Error).message})`]);
  }
  const result = parseAndEvaluate(json);
  if (!result.ok) fail(result.issues.map((i) => i.message));
  process.stdout.write(`${JSON.stringify(result.report, null, 2)}\n`);
}

main();
