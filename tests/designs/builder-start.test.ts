import { describe, expect, test } from "vitest";
import { readFileSync } from "node:fs";
import { defaultCatalogue, defaultSettings, parseDesign, type DesignFile } from "@/lib/driveline";
import type { DraftView } from "@/lib/designs/drafts";
import { builderStart, type BuilderShop } from "@/components/shaft-builder/builder-core";
import { defaultBuilderForm } from "@/components/shaft-builder/model";

// The builder page arrives with its first results computed on the server (builderStart), and the
// browser fetches the core only at the first edit: these results must be the builder's own.
const shop: BuilderShop = {
  catalogue: defaultCatalogue,
  settings: defaultSettings,
  tubePreference: "lightest",
};

const example = (name: string): DesignFile => {
  const parsed = parseDesign(JSON.parse(readFileSync(`examples/${name}.json`, "utf8")));
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("\n"));
  return parsed.design;
};

const draftOf = (design: unknown, name = "Saved van"): DraftView => ({
  id: "00000000-0000-4000-8000-000000000001",
  name,
  design: design as DesignFile,
  application: { description: "Parcel van", use: "towing" },
  customerId: null,
  createdAt: "2026-01-05T10:00:00.000Z",
  updatedAt: "2026-01-05T10:00:00.000Z",
});

describe("the builder's starting point (server-side first results)", () => {
  test("a new design starts from the default form, checked and evaluated as the browser would", () => {
    const start = builderStart(null, shop);
    expect(start.form.lengthMm).toBe(1320.8); // the default form: a typical street truck, 52 in
    expect(start.validation.fieldErrors).toEqual({});
    const report = start.evaluation?.report;
    expect(report).toBeDefined();
    // The builder's options: 181-point curves for the plot (every 2°) and the ranked alternatives.
    expect(report!.curves?.angleDeg).toHaveLength(181);
    expect(report!.tubeSelection).not.toBeNull();
  });

  test("a saved two-piece draft opens as two-piece, with its use and name, and its two-piece results", () => {
    const start = builderStart(draftOf(example("two-piece-van")), shop);
    expect(start.form.layout).toBe("two-piece");
    expect(start.form.name).toBe("Saved van");
    expect(start.form.application.use).toBe("towing");
    expect(start.evaluation?.report.layout).toBe("two-piece");
    expect(start.evaluation?.report.pieces).toHaveLength(2);
    expect(start.evaluation?.report.joints.map((j) => j.position)).toHaveLength(3); // front, centre, rear
  });

  test("a draft whose design no longer parses opens as the default form, and nothing is evaluated wrongly", () => {
    const start = builderStart(draftOf({ lengthMm: -3 }), shop);
    expect(start.form.geometry).toEqual(defaultBuilderForm().geometry);
    expect(start.form.application.use).toBe("towing");
    expect(start.validation.design).not.toBeNull();
  });
});
