/**
 * The orders' view models: the plain objects the order screens (client components included) get.
 * No entities and no ORM here, only data; lib/orders/queries.ts builds them on the server.
 */
import type { QuoteLine } from "@/lib/pricing/price-book";
import type { RetubePart } from "@/lib/retube/intake";
import type {
  NoteVisibility,
  OrderStatus,
  PaymentMethod,
  PaymentState,
  Fulfilment,
  OrderChannel,
  PaymentKind,
} from "./states";

export interface OrderRow {
  id: string;
  number: string;
  customerName: string;
  createdAt: string;
  promisedDate: string;
  status: OrderStatus;
  paymentState: PaymentState;
  totalCents: number;
  paidCents: number;
  currency: string;
  shafts: string[];
  channel: OrderChannel;
  late: boolean;
  /** The status in words, e.g. "In the shop — step 3 of 6" (lib/orders/labels.ts). */
  statusLabel: string;
  /** Staff only: a shaft is on hold on the floor. */
  onHold: boolean;
}

/** A warning acknowledged when the order was placed, as the screens show it. */
export interface AcknowledgementView {
  checkId: string;
  /** The warning's text as it was shown when acknowledged. */
  message: string;
  byName: string;
  channel: OrderChannel;
  /** ISO date-time. */
  at: string;
}

export interface ShaftView {
  id: string;
  position: number;
  name: string;
  application: { description: string; use: string } | null;
  overall: string;
  priceLines: QuoteLine[];
  priceCents: number;
  facts: { label: string; value: string }[];
  checks: { id: string; status: string; message: string }[];
  cautions: string[];
  /** Who acknowledged each warning when the order was placed (none on a quote). */
  warningAcknowledgements: AcknowledgementView[];
  /** A check fails and the owner has not accepted it for this order. */
  needsSignoff: boolean;
  /** A re-tube of the customer's shaft: the counter's intake (null for a new shaft). */
  retube: RetubeView | null;
}

export interface RetubeView {
  weldToWeldMm: number;
  parts: { part: RetubePart; label: string; reuse: boolean; note: string }[];
  recordedBy: string;
  /** ISO date-time. */
  recordedAt: string;
}

/** A note on an order, as its reader may see it. */
export interface OrderNoteView {
  id: string;
  body: string;
  visibility: NoteVisibility;
  byName: string;
  at: string;
}

export interface OrderView extends OrderRow {
  customerEmail: string;
  fulfilment: Fulfilment;
  shipTo: string | null;
  notes: string | null;
  subtotalCents: number;
  taxCents: number;
  shippingCents: number;
  depositCents: number;
  refundedCents: number;
  shaftViews: ShaftView[];
  payments: {
    id: string;
    kind: string;
    amountCents: number;
    status: string;
    refundedCents: number;
    createdAt: string;
    paidAt: string | null;
    failureMessage: string | null;
    checkoutUrl: string | null;
    /** How it was paid: the online checkout, or at the counter (cash, cheque, card terminal). */
    method: PaymentMethod;
    /** Counter payments: the cheque number or terminal reference. */
    reference: string | null;
  }[];
  /** Notes from the shop: every note for staff, only customer-visible ones for the customer. */
  shopNotes: OrderNoteView[];
  /** A shaft fails a check no owner has accepted: no payment or release until an owner reviews it. */
  needsSignoff: boolean;
  cancelReason: string | null;
  events: { id: string; at: string; kind: string; label: string }[];
  /** Every shaft passed final inspection: the as-built certificate can be downloaded. */
  asBuiltReady: boolean;
  /** What the order asks for next, if anything. */
  due: { kind: PaymentKind; amountCents: number } | null;
}
