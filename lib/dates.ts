/**
 * Dates for people, in the shop's time zone: the one place instants and calendar dates are
 * formatted. Every format names its locale and time zone, so the server and the browser print the
 * same text (no hydration mismatch) whatever the machine's own zone is. The zone comes from the
 * shop's configuration (price book `timeZone`; lib/shop/locale.ts on the server, useShopLocale()
 * in the browser). Pure: used by pages, client components, e-mails, papers and exports.
 */
import { differenceInCalendarDays, formatDistanceStrict, parseISO } from "date-fns";

const LOCALE = "en-US";

/** The demo shop's zone, used when a shop has not set one. */
export const DEFAULT_TIME_ZONE = "America/Chicago";

/** Whether `zone` is an IANA time zone this runtime knows (e.g. "America/Chicago", "UTC"). */
export function isTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat(LOCALE, { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

type Instant = Date | string | number;
const toDate = (at: Instant): Date => (at instanceof Date ? at : new Date(at));

const STYLES = {
  /** "Dec 4, 2026" */
  date: { dateStyle: "medium" },
  /** "December 4, 2026" (e-mails, papers) */
  longDate: { dateStyle: "long" },
  /** "Dec 4, 2026, 3:05 PM CST" */
  dateTime: { dateStyle: "medium", timeStyle: "short" },
  /** parts for the ISO-like "2026-12-04 15:05" of tables and CSV */
  iso: {
    year: "numeric",
    month: "2-digit",
    day: "2-digit",
    hour: "2-digit",
    minute: "2-digit",
    hourCycle: "h23",
  },
  /** "Thu, Dec 10, 2026" (calendar dates: read in UTC, where they were stored at noon) */
  calendar: { weekday: "short", month: "short", day: "numeric", year: "numeric" },
  /** "Thursday, December 10, 2026" */
  calendarLong: { weekday: "long", month: "long", day: "numeric", year: "numeric" },
  /** "CST" */
  zoneName: { timeZoneName: "short" },
} as const satisfies Record<string, Intl.DateTimeFormatOptions>;
type Style = keyof typeof STYLES;

const cache = new Map<string, Intl.DateTimeFormat>();
function fmt(style: Style, timeZone: string): Intl.DateTimeFormat {
  const key = `${style}|${timeZone}`;
  let f = cache.get(key);
  if (!f) {
    f = new Intl.DateTimeFormat(LOCALE, { ...STYLES[style], timeZone });
    cache.set(key, f);
  }
  return f;
}

function isoParts(at: Instant, timeZone: string) {
  const parts = Object.fromEntries(
    fmt("iso", timeZone)
      .formatToParts(toDate(at))
      .map((p) => [p.type, p.value]),
  );
  return {
    date: `${parts.year}-${parts.month}-${parts.day}`,
    time: `${parts.hour === "24" ? "00" : parts.hour}:${parts.minute}`,
  };
}

/** The zone's short name at that instant, e.g. "CST" / "CDT" / "UTC". */
export function zoneName(at: Instant, timeZone: string): string {
  return (
    fmt("zoneName", timeZone)
      .formatToParts(toDate(at))
      .find((p) => p.type === "timeZoneName")?.value ?? timeZone
  );
}

/** An instant's calendar day in the shop, e.g. "Dec 4, 2026". */
export function formatDate(at: Instant, timeZone: string): string {
  return fmt("date", timeZone).format(toDate(at));
}

/** An instant's calendar day in words, e.g. "December 4, 2026" (e-mails, letters). */
export function formatLongDate(at: Instant, timeZone: string): string {
  return fmt("longDate", timeZone).format(toDate(at));
}

/** An instant with its time and zone, e.g. "Dec 4, 2026, 3:05 PM CST". */
export function formatDateTime(at: Instant, timeZone: string): string {
  return `${fmt("dateTime", timeZone).format(toDate(at))} ${zoneName(at, timeZone)}`;
}

/** The last day worked out per zone, by the UTC second it was for (every request asks for today). */
const dayBySecond = new Map<string, { second: number; date: string }>();

/** An instant's calendar day in the shop as an ISO date, e.g. "2026-12-04" (tables, CSV, filters). */
export function shopIsoDate(at: Instant, timeZone: string): string {
  // Zone offsets are whole seconds (even the old local mean times), so one second is one day.
  const second = Math.floor(toDate(at).getTime() / 1000);
  const hit = dayBySecond.get(timeZone);
  if (hit?.second === second) return hit.date;
  const date = isoParts(at, timeZone).date;
  dayBySecond.set(timeZone, { second, date });
  return date;
}

/** A compact, sortable timestamp in the shop's zone, e.g. "2026-12-04 15:05 CST" (tables, papers, CSV). */
export function formatTimestamp(at: Instant, timeZone: string, { zone = true } = {}): string {
  const p = isoParts(at, timeZone);
  return `${p.date} ${p.time}${zone ? ` ${zoneName(at, timeZone)}` : ""}`;
}

/** How long ago, e.g. "3 days ago" / "in 2 hours" (the instant's distance from `now`). */
export function formatRelative(at: Instant, now: Instant = Date.now()): string {
  return formatDistanceStrict(toDate(at), toDate(now), { addSuffix: true });
}

/**
 * A calendar date with no time (a promised or due date, stored as "2026-12-10") in words, e.g.
 * "Thu, Dec 10, 2026" or (long) "Thursday, December 10, 2026". Calendar dates are not instants: no zone shifts them.
 */
export function formatCalendarDate(isoDate: string, style: "short" | "long" = "short"): string {
  return fmt(style === "long" ? "calendarLong" : "calendar", "UTC").format(
    new Date(`${isoDate.slice(0, 10)}T12:00:00Z`),
  );
}

/**
 * A due date against today in the shop: "Thu, Dec 10, 2026 (in 6 days)", "… (today)",
 * "… (2 days late)".
 */
export function formatDueDate(isoDate: string, timeZone: string, now: Instant = Date.now()): string {
  const days = differenceInCalendarDays(parseISO(isoDate.slice(0, 10)), parseISO(shopIsoDate(now, timeZone)));
  const when =
    days === 0
      ? "today"
      : days === 1
        ? "tomorrow"
        : days > 0
          ? `in ${days} days`
          : `${-days} day${days === -1 ? "" : "s"} late`;
  return `${formatCalendarDate(isoDate)} (${when})`;
}
