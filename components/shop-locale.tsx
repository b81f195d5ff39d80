"use client";
import { createContext, useContext } from "react";
import { DEFAULT_TIME_ZONE, formatDate, formatDateTime, formatTimestamp, shopIsoDate } from "@/lib/dates";
import { DEFAULT_CURRENCY } from "@/lib/money";

/** The shop's currency and time zone for client components (lib/shop/locale.ts reads them on the server). */
export interface ShopLocaleView {
  currency: string;
  timeZone: string;
}

const ShopLocaleContext = createContext<ShopLocaleView>({
  currency: DEFAULT_CURRENCY,
  timeZone: DEFAULT_TIME_ZONE,
});

/** Given once by the audience layouts ((staff), (shop)) so every client component formats alike. */
export function ShopLocaleProvider({
  value,
  children,
}: {
  value: ShopLocaleView;
  children: React.ReactNode;
}) {
  return <ShopLocaleContext.Provider value={value}>{children}</ShopLocaleContext.Provider>;
}

/** The shop's currency and time zone in a client component. */
export function useShopLocale(): ShopLocaleView {
  return useContext(ShopLocaleContext);
}

const TIME_FORMATS = {
  /** "Dec 4, 2026" */
  date: formatDate,
  /** "Dec 4, 2026, 3:05 PM CST" */
  dateTime: formatDateTime,
  /** "2026-12-04 15:05" (tables) */
  timestamp: (at: string, timeZone: string) => formatTimestamp(at, timeZone, { zone: false }),
  /** "2026-12-04" (tables) */
  isoDate: shopIsoDate,
} as const;

/** An instant in the shop's time zone inside a `<time>` element (client components and table cells). */
export function ShopTime({
  at,
  format = "dateTime",
  className,
}: {
  at: string;
  format?: keyof typeof TIME_FORMATS;
  className?: string;
}) {
  const { timeZone } = useShopLocale();
  return (
    <time dateTime={at} className={className}>
      {TIME_FORMATS[format](at, timeZone)}
    </time>
  );
}
