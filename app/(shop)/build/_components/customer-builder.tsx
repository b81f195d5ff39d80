"use client";

import { ShaftBuilder, type ShaftBuilderProps } from "@/components/shaft-builder/shaft-builder";

/** The builder as a customer sees it: "Get a quote" goes to the online order page. */
export function CustomerBuilder(props: Omit<ShaftBuilderProps, "quoteHref" | "draftHref">) {
  return (
    <ShaftBuilder
      {...props}
      quoteHref={(id) => `/orders/new?design=${id}`}
      draftHref={(id) => `/build?draft=${id}`}
    />
  );
}
