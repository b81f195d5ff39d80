/**
 * The traveller: routing, record sheets and limits, the measurement check, serials and step codes
 * (all pure). The PDF (lib/traveller/pdf.ts) is server-only and imported on its own.
 */
export * from "./codes";
export * from "./measure";
export * from "./settings";
export * from "./steps";
export * from "./units";
export * from "./view";
