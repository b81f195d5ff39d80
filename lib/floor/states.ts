/**
 * The shop floor's states, outside the entity files so that screens (client components included) and
 * views can name them without importing the ORM. The entities (work-order, work-order-step,
 * step-record) use these for their columns; the database enums are the migrations' (work_order_state,
 * work_order_step_state, step_outcome).
 */

/** Where one shaft of a released order is: released to the floor, worked on, held, ready, gone. */
export const WORK_ORDER_STATES = ["released", "in_shop", "on_hold", "ready", "shipped", "picked_up"] as const;
export type WorkOrderState = (typeof WORK_ORDER_STATES)[number];

/** One routing step of a traveller: still to do, held at the station, or done. */
export const STEP_STATES = ["pending", "on_hold", "done"] as const;
export type StepState = (typeof STEP_STATES)[number];

/** How a done step was completed: within limits, after rework, or by an owner's concession. */
export const STEP_COMPLETIONS = ["pass", "rework", "concession"] as const;
export type StepCompletion = (typeof STEP_COMPLETIONS)[number];

/** What one submission at a station (or an owner's concession) came to. */
export const STEP_OUTCOMES = ["pass", "hold", "rework", "concession"] as const;
export type StepOutcome = (typeof STEP_OUTCOMES)[number];
