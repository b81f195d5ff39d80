/**
 * The README's engineering page lists every limit with its default and source: the block between
 * its markers must be what the code prints (`npm run -s limits`), so adding a limit without
 * documenting it fails here.
 */
import { readFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { engineeringLimitsMarkdown } from "@/lib/catalogue/limits-table";
import { defaultSettings } from "@/lib/driveline";
import { defaultFloorLimits } from "@/lib/traveller/settings";

const readme = readFileSync("README.md", "utf8");
/** Prettier pads table cells and dividers: compare the text, not the padding. */
const normalise = (text: string): string =>
  text
    .split("\n")
    .map((line) =>
      line
        .trim()
        .replace(/\s*\|\s*/g, "|")
        .replace(/\|:?-+:?(?=\|)/g, "|-"),
    )
    .join("\n");
const block = (): string => {
  const start = readme.indexOf("<!-- limits:start -->");
  const end = readme.indexOf("<!-- limits:end -->");
  expect(start, "README has a <!-- limits:start --> marker").toBeGreaterThan(0);
  expect(end, "README has a <!-- limits:end --> marker").toBeGreaterThan(start);
  return readme.slice(start + "<!-- limits:start -->".length, end).trim();
};

describe("README engineering limits", () => {
  test("the README's table is the one the code prints (run `npm run -s limits` and paste it)", () => {
    expect(normalise(block())).toBe(normalise(engineeringLimitsMarkdown()));
  });

  test("every engineering limit and floor tolerance is named in it with its source", () => {
    const text = block();
    for (const [key, limit] of Object.entries({ ...defaultSettings, ...defaultFloorLimits })) {
      const row = text.split("\n").find((l) => l.includes(`\`${key}\``));
      expect(row, key).toBeDefined();
      expect(normalise(row!)).toContain(normalise(limit.source.replace(/\|/g, "\\|")));
    }
  });
});
