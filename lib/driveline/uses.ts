/**
 * What each use of a shaft is called wherever a person reads it: the builder's select, the quote
 * and order screens, mail, tables and papers. The design file's `use` keeps the plain value.
 */
import type { ShaftUse } from "./settings";

/** A use's name for people, keyed by the design file's value (`lib/driveline/schema.ts` USES). */
export const SHAFT_USE_LABEL: Readonly<Record<ShaftUse, string>> = {
  street: "Street",
  towing: "Towing",
  "off-road": "Off-road",
  race: "Race",
  industrial: "Industrial",
};

/** The name of a use; a value this version does not know (an old record) is shown as stored. */
export function shaftUseLabel(use: string | null | undefined): string {
  if (!use) return "";
  return Object.hasOwn(SHAFT_USE_LABEL, use) ? SHAFT_USE_LABEL[use as ShaftUse] : use;
}
