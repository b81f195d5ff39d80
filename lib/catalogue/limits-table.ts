/**
 * The README's engineering page: every limit the checks and the floor apply, with its default and
 * source, and the demo catalogue's material and joint figures with theirs. Pure; printed by
 * `npm run -s limits` and compared with the README by tests/catalogue/readme-limits.test.ts, so
 * the page cannot drift from the code.
 */
import { defaultCatalogue, defaultSettings, type Limit } from "@/lib/driveline";
import { defaultFloorLimits } from "@/lib/traveller/settings";
import { FLOOR_LIMIT_META, LIMIT_META, type LimitMeta } from "./limits";

const cell = (text: string): string => text.replace(/\|/g, "\\|").replace(/\n/g, " ");

function limitRows(limits: Record<string, Limit>, meta: Record<string, LimitMeta>): string[] {
  return Object.entries(limits).map(([key, limit]) => {
    const m = meta[key];
    const unit = m?.unit ? ` ${m.unit}` : "";
    return `| ${cell(m?.label ?? key)} | \`${key}\` | ${limit.value}${unit} | ${cell(limit.source)} |`;
  });
}

/** The markdown between the README's `limits:start` and `limits:end` markers. */
export function engineeringLimitsMarkdown(): string {
  const lines: string[] = [];
  lines.push("Engineering limits (shop settings; the owner edits them in the catalogue):", "");
  lines.push("| limit | setting | default | source |", "|---|---|---|---|");
  lines.push(...limitRows(defaultSettings, LIMIT_META));
  lines.push("", "Floor tolerances (shop settings):", "");
  lines.push("| limit | setting | default | source |", "|---|---|---|---|");
  lines.push(...limitRows(defaultFloorLimits, FLOOR_LIMIT_META));
  lines.push("", "Materials in the demo catalogue (a shop's catalogue replaces them):", "");
  lines.push(
    "| material | condition | E (GPa) | ρ (kg/m³) | min. tensile yield (MPa) | weld-zone tensile yield (MPa) | source |",
    "|---|---|---|---|---|---|---|",
  );
  for (const m of defaultCatalogue.materials) {
    const weld = m.weldZoneTensileYieldMPa != null ? `${m.weldZoneTensileYieldMPa}` : "–";
    const source = [m.source, m.weldZoneSource].filter(Boolean).join("; ");
    lines.push(
      `| ${cell(m.name)} | ${cell(m.condition ?? "–")} | ${m.elasticModulusGPa} | ${m.densityKgM3} | ${m.tensileYieldMPa} | ${weld} | ${cell(source)} |`,
    );
  }
  lines.push("", "Joint series in the demo catalogue (invented parts; demo data):", "");
  lines.push(
    "| series | peak rating (N·m) | continuous rating (N·m) | largest working angle (°) |",
    "|---|---|---|---|",
  );
  for (const j of defaultCatalogue.jointSeries) {
    lines.push(
      `| ${cell(j.name)} | ${j.torqueRatingNm} | ${j.continuousTorqueNm ?? "–"} | ${j.maxWorkingAngleDeg} |`,
    );
  }
  return lines.join("\n");
}
