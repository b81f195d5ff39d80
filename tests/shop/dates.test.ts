import { describe, expect, it } from "vitest";
import {
  DEFAULT_TIME_ZONE,
  formatCalendarDate,
  formatDate,
  formatDateTime,
  formatDueDate,
  formatRelative,
  formatTimestamp,
  isTimeZone,
  shopIsoDate,
} from "@/lib/dates";
import { priceBookSchema, defaultPriceBook } from "@/lib/pricing/price-book";

// Offsets from the IANA time zone database (tzdata): America/Chicago is UTC−6 in winter (CST),
// UTC−5 in summer (CDT); Pacific/Auckland is UTC+13 in December (NZDT).
describe("dates in the shop's time zone", () => {
  const lateEvening = new Date("2026-12-05T03:30:00Z"); // 21:30 CST on 4 December in Chicago

  it("a UTC instant just after midnight is still the evening before in the shop", () => {
    expect(shopIsoDate(lateEvening, "America/Chicago")).toBe("2026-12-04");
    expect(shopIsoDate(lateEvening, "UTC")).toBe("2026-12-05");
    expect(formatDate(lateEvening, "America/Chicago")).toBe("Dec 4, 2026");
    expect(formatTimestamp(lateEvening, "America/Chicago")).toBe("2026-12-04 21:30 CST");
    expect(formatTimestamp(lateEvening, "America/Chicago", { zone: false })).toBe("2026-12-04 21:30");
  });

  it("the day turns at the shop's midnight to the millisecond, however often it is asked", () => {
    // Chicago is UTC−6 in December: its 4 December begins at 06:00 UTC.
    const asked = ["05:59:59.000", "05:59:59.999", "06:00:00.000", "06:00:00.999", "05:59:59.999"];
    expect(asked.map((t) => shopIsoDate(`2026-12-04T${t}Z`, "America/Chicago"))).toEqual([
      "2026-12-03",
      "2026-12-03",
      "2026-12-04",
      "2026-12-04",
      "2026-12-03",
    ]);
  });

  it("and a shop east of UTC is already on the next day", () => {
    const utcEvening = new Date("2026-12-04T12:30:00Z");
    expect(shopIsoDate(utcEvening, "Pacific/Auckland")).toBe("2026-12-05");
  });

  it("names the zone, and follows daylight saving time", () => {
    expect(formatDateTime(lateEvening, "America/Chicago")).toBe("Dec 4, 2026, 9:30 PM CST");
    expect(formatTimestamp("2026-07-01T04:59:00Z", "America/Chicago")).toBe("2026-06-30 23:59 CDT");
    expect(formatTimestamp("2026-07-01T05:00:00Z", "America/Chicago")).toBe("2026-07-01 00:00 CDT");
  });

  it("takes ISO strings as well as dates, and prints midnight as 00:00", () => {
    expect(formatTimestamp("2026-12-04T06:00:00.000Z", "America/Chicago")).toBe("2026-12-04 00:00 CST");
  });

  it("calendar dates (promised, due) are not shifted by any zone", () => {
    expect(formatCalendarDate("2026-12-10")).toBe("Thu, Dec 10, 2026");
    expect(formatCalendarDate("2026-12-10", "long")).toBe("Thursday, December 10, 2026");
  });

  it("says a due date against the shop's today", () => {
    // 03:30 UTC on 5 Dec is still 4 Dec in Chicago: the 5th is tomorrow there.
    expect(formatDueDate("2026-12-05", "America/Chicago", lateEvening)).toBe("Sat, Dec 5, 2026 (tomorrow)");
    expect(formatDueDate("2026-12-04", "America/Chicago", lateEvening)).toBe("Fri, Dec 4, 2026 (today)");
    expect(formatDueDate("2026-12-10", "America/Chicago", lateEvening)).toBe("Thu, Dec 10, 2026 (in 6 days)");
    expect(formatDueDate("2026-12-02", "America/Chicago", lateEvening)).toBe(
      "Wed, Dec 2, 2026 (2 days late)",
    );
    expect(formatDueDate("2026-12-05", "UTC", lateEvening)).toBe("Sat, Dec 5, 2026 (today)");
  });

  it("says how long ago", () => {
    const now = new Date("2026-12-04T12:00:00Z");
    expect(formatRelative(new Date("2026-12-01T12:00:00Z"), now)).toBe("3 days ago");
    expect(formatRelative(new Date("2026-12-04T14:00:00Z"), now)).toBe("in 2 hours");
  });
});

describe("the shop's time zone setting", () => {
  it("defaults to the demo shop's zone in a price book saved before it existed", () => {
    const { timeZone: _drop, ...older } = defaultPriceBook;
    expect(priceBookSchema.parse(older).timeZone).toBe(DEFAULT_TIME_ZONE);
    expect(DEFAULT_TIME_ZONE).toBe("America/Chicago");
  });

  it("refuses a zone that does not exist, naming the field", () => {
    const r = priceBookSchema.safeParse({ ...defaultPriceBook, timeZone: "Mars/Olympus" });
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.path).toEqual(["timeZone"]);
    expect(isTimeZone("Europe/Berlin")).toBe(true);
    expect(isTimeZone("Mars/Olympus")).toBe(false);
  });
});
