import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

/**
 * The house's own utility classes (buttons, fields, cards) are defined once in app/globals.css with
 * `@utility`; a class name Tailwind does not know is silently dropped, so a misspelt or never-defined
 * one (`btn-secondary`) leaves a button looking like plain text. Every one the screens use must exist.
 */
const root = path.resolve(import.meta.dirname, "../..");
const FAMILY = /^(?:[a-z0-9-]+:)*((?:btn|card)(?:-[a-z]+)*|field(?:-[a-z]+)+)$/;

function sourceFiles(dir: string): string[] {
  return readdirSync(path.join(root, dir), { withFileTypes: true }).flatMap((e) => {
    const rel = `${dir}/${e.name}`;
    if (e.isDirectory()) return sourceFiles(rel);
    return /\.tsx?$/.test(e.name) ? [rel] : [];
  });
}

/** The house classes each file names in its string literals (class lists), with where. */
function usedClasses(): Map<string, string[]> {
  const used = new Map<string, string[]>();
  for (const file of ["app", "components"].flatMap(sourceFiles)) {
    const text = readFileSync(path.join(root, file), "utf8");
    for (const match of text.matchAll(/"([^"\n]*)"|`([^`]*)`/g)) {
      const literal = match[1] ?? match[2] ?? "";
      for (const token of literal.split(/\s+/)) {
        const name = FAMILY.exec(token)?.[1];
        if (name) used.set(name, [...(used.get(name) ?? []), file]);
      }
    }
  }
  return used;
}

const defined = new Set(
  [...readFileSync(path.join(root, "app/globals.css"), "utf8").matchAll(/^@utility ([a-z-]+)/gm)].map(
    (m) => m[1],
  ),
);

describe("house utility classes", () => {
  const used = usedClasses();

  it("finds the classes the screens use (the scan itself works)", () => {
    expect(used.get("btn-primary")?.length).toBeGreaterThan(5);
    expect(used.get("field-input")?.length).toBeGreaterThan(5);
    expect(defined.has("btn-quiet")).toBe(true);
  });

  it("every one used is defined in app/globals.css", () => {
    const missing = [...used]
      .filter(([name]) => !defined.has(name))
      .map(([name, files]) => `${name}: ${files.join(", ")}`);
    expect(missing).toEqual([]);
  });
});
