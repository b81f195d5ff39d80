import { describe, expect, it } from "vitest";
import { centsToDecimal, formatMoney, formatMoneyWhole, parseMoney } from "@/lib/money";

// Expected texts: the en-US currency format (CLDR, as Intl.NumberFormat prints it): "$1,234.56".
describe("formatMoney", () => {
  it("prints cents with the currency's sign and grouping", () => {
    expect(formatMoney(123456, "USD")).toBe("$1,234.56");
    expect(formatMoney(0, "USD")).toBe("$0.00");
    expect(formatMoney(1, "USD")).toBe("$0.01");
    expect(formatMoney(99, "USD")).toBe("$0.99");
    expect(formatMoney(100_000_000, "USD")).toBe("$1,000,000.00");
  });

  it("prints a refund (negative) with its sign", () => {
    expect(formatMoney(-2500, "USD")).toBe("-$25.00");
  });

  it("uses the currency it is given, not a default", () => {
    expect(formatMoney(123456, "CAD")).toBe("CA$1,234.56");
    expect(formatMoney(123456, "EUR")).toBe("€1,234.56");
  });

  it("rounds to whole units for charts", () => {
    expect(formatMoneyWhole(123456, "USD")).toBe("$1,235");
    expect(formatMoneyWhole(-4950, "USD")).toBe("-$50");
  });
});

describe("centsToDecimal", () => {
  it("writes a plain decimal a spreadsheet or an input reads", () => {
    expect(centsToDecimal(123450)).toBe("1234.50");
    expect(centsToDecimal(5)).toBe("0.05");
    expect(centsToDecimal(0)).toBe("0.00");
    expect(centsToDecimal(-5)).toBe("-0.05");
    expect(centsToDecimal(-123456)).toBe("-1234.56");
  });
});

describe("parseMoney", () => {
  const cents = (text: string) => {
    const r = parseMoney(text);
    return r.ok ? r.cents : r.message;
  };

  it("reads amounts people type, to the cent, without floating-point error", () => {
    expect(cents("12.50")).toBe(1250);
    expect(cents("12.5")).toBe(1250);
    expect(cents("12")).toBe(1200);
    expect(cents("0.07")).toBe(7);
    // 0.29 * 100 is 28.999999999999996 in floating point: the digits are read instead.
    expect(cents("0.29")).toBe(29);
    expect(cents("1,234.56")).toBe(123456);
    expect(cents(" $125.00 ")).toBe(12500);
  });

  it("refuses more than cents, words, negatives and nothing, saying why", () => {
    expect(parseMoney("12.345")).toEqual({ ok: false, message: expect.stringMatching(/to the cent/) });
    expect(parseMoney("abc")).toEqual({ ok: false, message: expect.stringMatching(/such as/) });
    expect(parseMoney("-5")).toEqual({ ok: false, message: expect.stringMatching(/above zero/) });
    expect(parseMoney("")).toEqual({ ok: false, message: "Enter an amount." });
    for (const bad of ["12.", ".5", "1e3", "12,34", "1.2.3", "NaN", "Infinity"])
      expect(parseMoney(bad).ok, bad).toBe(false);
  });

  it("reads back what centsToDecimal writes", () => {
    for (const c of [0, 1, 9, 10, 99, 100, 12345, 99_999_999]) expect(cents(centsToDecimal(c))).toBe(c);
  });
});
