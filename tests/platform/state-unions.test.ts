import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

/**
 * State and kind unions (an order's statuses, a work order's states, a step's outcomes, …) live in
 * plain modules outside the entity files (lib/orders/states.ts, lib/floor/states.ts,
 * lib/mail/states.ts), so screens, client components and views name them without importing the
 * ORM. The entities import them for their columns. This fails when an entity file defines or
 * re-exports one again, or writes an enum column's values inline.
 */
const root = path.resolve(import.meta.dirname, "../..");

/** The union modules: importable from the browser, so they import nothing at all. */
const UNION_MODULES = ["lib/orders/states.ts", "lib/floor/states.ts", "lib/mail/states.ts"];

/** `export const X_STATES = [...] as const`, an exported string-literal union type, or a re-export of a *_STATES-like name. */
function unionsIn(source: string): string[] {
  const found: string[] = [];
  for (const m of source.matchAll(/^export\s+const\s+(\w+)\s*(?::[^=]*)?=\s*\[[^\]]*\]\s*as\s+const/gm))
    found.push(m[1]!);
  for (const m of source.matchAll(/^export\s+type\s+(\w+)\s*=\s*((?:\s*\|?\s*"[^"]*")+)\s*;/gm))
    found.push(m[1]!);
  for (const m of source.matchAll(/^export\s*(?:type\s*)?\{([^}]*)\}/gm))
    for (const name of m[1]!.split(",").map((n) => n.replace(/^\s*type\s+/, "").trim()))
      if (/_(STATES|STATUSES|OUTCOMES|KINDS|METHODS|VISIBILITIES|COMPLETIONS)$/.test(name)) found.push(name);
  // An enum column whose values are written inline: `@Enum({ items: ["a", "b"], ... })`.
  for (const m of source.matchAll(/@Enum\(\{\s*items:\s*\[([^\]]*)\]/g))
    found.push(`@Enum items [${m[1]!.trim()}]`);
  return found;
}

const entityFiles = readdirSync(path.join(root, "entities")).filter((f) => f.endsWith(".entity.ts"));

describe("state unions live outside the entity files", () => {
  it("the scan finds a union when there is one (it can fail)", () => {
    const probe = [
      `import { Entity } from "@mikro-orm/core";`,
      `export const WIDGET_STATES = ["new", "old"] as const;`,
      `export type WidgetKind =\n  | "round"\n  | "square";`,
      `export { PAYMENT_METHODS, type PaymentMethod };`,
      `export interface NotAUnion { a: "x" | "y" }`,
      `class W { @Enum({ items: ["on", "off"], nativeEnumName: "w" }) s!: string; }`,
      `class V { @Enum({ items: () => WIDGET_STATES, nativeEnumName: "v" }) s!: string; }`,
    ].join("\n");
    expect(unionsIn(probe)).toEqual([
      "WIDGET_STATES",
      "WidgetKind",
      "PAYMENT_METHODS",
      '@Enum items ["on", "off"]',
    ]);
    expect(entityFiles.length).toBeGreaterThan(20);
  });

  it("no entity file defines or re-exports one", () => {
    const offenders = entityFiles.flatMap((f) =>
      unionsIn(readFileSync(path.join(root, "entities", f), "utf8")).map((name) => `entities/${f}: ${name}`),
    );
    expect(
      offenders,
      "move these to lib/orders/states.ts, lib/floor/states.ts or lib/mail/states.ts and import them",
    ).toEqual([]);
  });

  it("the union modules import nothing, so client components may use them", () => {
    for (const f of UNION_MODULES) {
      const source = readFileSync(path.join(root, f), "utf8");
      expect(source, f).not.toMatch(/^\s*import\b/m);
      expect(unionsIn(source).length, f).toBeGreaterThan(0);
    }
  });

  it("the entities take their enum columns' values from the union modules", () => {
    for (const [file, names] of [
      ["order.entity.ts", ["ORDER_STATUSES", "PAYMENT_STATES", "ORDER_CHANNELS", "FULFILMENTS"]],
      ["payment.entity.ts", ["PAYMENT_METHODS", "PAYMENT_KINDS", "PAYMENT_STATUSES"]],
      ["email-message.entity.ts", ["EMAIL_STATUSES"]],
      ["order-note.entity.ts", ["NOTE_VISIBILITIES"]],
      ["work-order.entity.ts", ["WORK_ORDER_STATES"]],
      ["work-order-step.entity.ts", ["STEP_STATES"]],
      ["step-record.entity.ts", ["STEP_OUTCOMES"]],
    ] as const) {
      const source = readFileSync(path.join(root, "entities", file), "utf8");
      for (const name of names) {
        expect(source, `${file} imports ${name}`).toMatch(
          new RegExp(`import \\{[^}]*\\b${name}\\b[^}]*\\} from "\\.\\./lib/(orders|floor|mail)/states"`),
        );
        expect(source, `${file} uses ${name} for an @Enum`).toMatch(
          new RegExp(`items: \\(\\) => ${name}\\b`),
        );
      }
    }
  });
});
