/**
 * "Late" is counted from the shop's own day, not UTC's: at 21:30 in Chicago (03:30 UTC the next
 * day) an order promised for that Chicago day is not late yet. Offsets from the IANA time zone
 * database (tzdata): America/Chicago is UTC−6 in winter.
 */
import { describe, expect, test } from "vitest";
import { defaultFloorSettings } from "@/lib/traveller/settings";
import { overviewContext } from "@/lib/shop/overview";
import { shopToday } from "@/lib/shop/locale";
import { dbTest } from "../setup/db";

const lateEvening = new Date("2026-12-05T03:30:00Z"); // 21:30 CST on 4 December in Chicago

describe("the shop's day", () => {
  test("the owner's overview counts late from the shop's today", () => {
    expect(overviewContext(lateEvening, defaultFloorSettings, [], "America/Chicago").today).toBe(
      "2026-12-04",
    );
    expect(overviewContext(lateEvening, defaultFloorSettings, [], "UTC").today).toBe("2026-12-05");
  });

  dbTest(
    "shopToday reads the zone from the shop's price book (the demo's default: America/Chicago)",
    async () => {
      expect(await shopToday(lateEvening)).toBe("2026-12-04");
      expect(await shopToday(new Date("2026-12-05T12:00:00Z"))).toBe("2026-12-05");
    },
  );
});
