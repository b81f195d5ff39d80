import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { evaluateDesign, parseDesign } from "@/lib/driveline";

/**
 * Property-based fuzzing of the design file (issue 11): 10,000 generated files, each a valid
 * example with random damage (a value replaced by any JSON, a key removed, an unknown key added)
 * or arbitrary JSON. parseDesign never throws and names the field of every rejection; a file it
 * accepts always evaluates without throwing, to a report whose overall status is one of the three.
 */

const EXAMPLES = ["street-truck", "compound-offset", "long-van-critical-speed-fail"].map(
  (name) => JSON.parse(readFileSync(`examples/${name}.json`, "utf8")) as Record<string, unknown>,
);

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Every path to a value in `value` (objects and arrays included), root first. */
function pathsOf(value: Json, prefix: (string | number)[] = []): (string | number)[][] {
  const here = [prefix];
  if (Array.isArray(value)) return here.concat(value.flatMap((v, i) => pathsOf(v, [...prefix, i])));
  if (value && typeof value === "object")
    return here.concat(Object.entries(value).flatMap(([k, v]) => pathsOf(v, [...prefix, k])));
  return here;
}

/** Numbers a form or a careless script might send: edges, extremes and non-numbers in JSON. */
const nastyNumber = fc.oneof(
  fc.constantFrom(
    0,
    -0,
    -1,
    1e-300,
    1e300,
    Number.MAX_SAFE_INTEGER,
    -Number.MAX_VALUE,
    0.1 + 0.2,
    360,
    90,
    -90,
  ),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.integer({ min: -1_000_000, max: 1_000_000 }),
);
const replacement: fc.Arbitrary<Json> = fc.oneof(
  { weight: 3, arbitrary: nastyNumber },
  {
    weight: 1,
    arbitrary: fc.constantFrom<Json>(null, "", "12", true, [], {}, "steel-dom", "YL-WY-X41-3500"),
  },
  { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 2 }) as fc.Arbitrary<Json> },
);

type Damage =
  | { kind: "replace"; at: number; value: Json }
  | { kind: "delete"; at: number }
  | { kind: "add"; at: number; key: string; value: Json };
const damage: fc.Arbitrary<Damage> = fc.oneof(
  {
    weight: 4,
    arbitrary: fc.record({ kind: fc.constant("replace" as const), at: fc.nat(), value: replacement }),
  },
  { weight: 2, arbitrary: fc.record({ kind: fc.constant("delete" as const), at: fc.nat() }) },
  {
    weight: 1,
    arbitrary: fc.record({
      kind: fc.constant("add" as const),
      at: fc.nat(),
      key: fc.string({ maxLength: 12 }),
      value: replacement,
    }),
  },
);

function damaged(example: Record<string, unknown>, hits: Damage[]): Json {
  let doc = structuredClone(example) as Json;
  for (const hit of hits) {
    const paths = pathsOf(doc);
    const path = paths[hit.at % paths.length]!;
    if (path.length === 0) {
      if (hit.kind === "replace") doc = hit.value;
      continue;
    }
    const parent = path.slice(0, -1).reduce<Json>((node, key) => (node as Record<string, Json>)[key]!, doc);
    const key = path[path.length - 1]!;
    if (parent === null || typeof parent !== "object") continue;
    const container = parent as Record<string | number, Json>;
    if (hit.kind === "replace") container[key] = hit.value;
    else if (hit.kind === "delete") {
      if (Array.isArray(parent)) parent.splice(Number(key), 1);
      else delete container[key];
    } else {
      const target = container[key];
      if (target && typeof target === "object" && !Array.isArray(target)) target[hit.key] = hit.value;
    }
  }
  return doc;
}

const designInput: fc.Arbitrary<unknown> = fc.oneof(
  {
    weight: 9,
    arbitrary: fc
      .tuple(fc.nat(EXAMPLES.length - 1), fc.array(damage, { minLength: 1, maxLength: 4 }))
      .map(([i, hits]) => damaged(EXAMPLES[i]!, hits)),
  },
  { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 3 }) },
);

describe("the design file under fuzzing", () => {
  it(
    "parseDesign never throws, names every rejected field; accepted files always evaluate",
    { timeout: 60_000 },
    () => {
      let accepted = 0;
      fc.assert(
        fc.property(designInput, (input) => {
          const parsed = parseDesign(input);
          if (!parsed.ok) {
            expect(parsed.issues.length).toBeGreaterThan(0);
            for (const issue of parsed.issues) {
              // A field's dotted path ("design" only when the whole file is not an object), and a
              // message that starts with it, so the form and the API can show it beside the field.
              expect(issue.path).toMatch(/^(design|[A-Za-z][\w.[\]]*)$/);
              expect(issue.message.startsWith(`${issue.path}: `), issue.message).toBe(true);
            }
            return;
          }
          accepted += 1;
          const report = evaluateDesign(parsed.design);
          expect(["pass", "warn", "fail"]).toContain(report.overall);
        }),
        { numRuns: 10_000, seed: Number(process.env.FUZZ_SEED ?? 20261205) },
      );
      // The generator must reach the evaluator too, not only the parser's refusals.
      expect(accepted).toBeGreaterThan(500);
    },
  );
});
