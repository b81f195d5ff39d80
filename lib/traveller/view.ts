/**
 * The traveller's view model: plain data (no entities) from which the PDF, and later the scan
 * station and the as-built record, are drawn. Built by the floor service from a work order.
 */
import type { EvaluationReport } from "@/lib/driveline/report";
import { formatStepCode } from "./codes";
import type { FloorSettings } from "./settings";
import type { StepSpec } from "./steps";
import type { Fulfilment } from "@/lib/orders/states";

export interface TravellerStep extends StepSpec {
  /** The text of the step's Code 128. */
  barcodeText: string;
}

/** A failed engineering check an owner accepted for this one order shaft (printed as "Accepted exception"). */
export interface AcceptedException {
  checkId: string;
  /** The check's message from the frozen evaluation (it still reads "fail"). */
  message: string;
  reason: string;
  byName: string;
  /** ISO date-time. */
  at: string;
}

export interface TravellerView {
  /** `timeZone`: the shop's (price book), for the dates printed; absent: the default shop's. */
  shop: { name: string; phone: string | null; timeZone?: string };
  serial: string;
  /** What the serial's QR code holds (the serial itself, or a link to the as-built record). */
  serialQrText: string;
  revision: number;
  /** Set when this revision was superseded: the page is marked VOID. */
  voidedBy: number | null;
  order: {
    number: string;
    customerName: string;
    promisedDate: string;
    fulfilment: Fulfilment;
  };
  shaft: {
    name: string;
    /** 1-based, of `count` shafts on the order. */
    position: number;
    count: number;
    application: { description: string; use: string } | null;
  };
  /** The floor settings the steps were derived with (paper size, units, limits). */
  floor: FloorSettings;
  report: EvaluationReport;
  /** Failed checks an owner accepted for this shaft; none for a shaft that passed. */
  acceptedExceptions: AcceptedException[];
  /** A re-tube of the customer's shaft: the counter's weld-to-weld and the parts reused (with their notes). */
  retube?: { weldToWeldMm: number; reused: string[] } | null;
  steps: TravellerStep[];
}

export interface TravellerViewInput extends Omit<
  TravellerView,
  "steps" | "serialQrText" | "voidedBy" | "acceptedExceptions"
> {
  steps: readonly StepSpec[];
  acceptedExceptions?: AcceptedException[];
  serialQrText?: string;
  voidedBy?: number | null;
}

/** Adds each step's code; the same serial, step and revision always give the same code. */
export function buildTravellerView(input: TravellerViewInput): TravellerView {
  return {
    ...input,
    serialQrText: input.serialQrText ?? input.serial,
    voidedBy: input.voidedBy ?? null,
    acceptedExceptions: input.acceptedExceptions ?? [],
    steps: input.steps.map((s) => ({
      ...s,
      barcodeText: formatStepCode({ serial: input.serial, step: s.code, revision: input.revision }),
    })),
  };
}
