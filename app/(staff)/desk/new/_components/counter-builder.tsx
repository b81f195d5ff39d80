"use client";
import { ShaftBuilder, type ShaftBuilderProps } from "@/components/shaft-builder/shaft-builder";

/**
 * The same builder at the counter, in its compact keyboard-first layout: drafts are saved for the
 * chosen customer, then quoted for them; a design that fails a check can still be quoted (the order
 * then waits for the owner's engineering sign-off).
 */
export function CounterBuilder(
  props: Omit<ShaftBuilderProps, "quoteHref" | "draftHref"> & { customerId: string },
) {
  const { customerId } = props;
  return (
    <ShaftBuilder
      {...props}
      compact
      allowFailing
      quoteHref={(id) => `/desk/new/quote?customer=${customerId}&design=${id}`}
      draftHref={(id) => `/desk/new?customer=${customerId}&draft=${id}`}
    />
  );
}
