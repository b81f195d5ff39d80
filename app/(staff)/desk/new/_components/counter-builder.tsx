"use client";
import { ShaftBuilder, type ShaftBuilderProps } from "@/components/shaft-builder/shaft-builder";

/** The same builder at the counter: drafts are saved for the chosen customer, then quoted for them. */
export function CounterBuilder(
  props: Omit<ShaftBuilderProps, "quoteHref" | "draftHref"> & { customerId: string },
) {
  const { customerId } = props;
  return (
    <ShaftBuilder
      {...props}
      quoteHref={(id) => `/desk/new/quote?customer=${customerId}&design=${id}`}
      draftHref={(id) => `/desk/new?customer=${customerId}&draft=${id}`}
    />
  );
}
