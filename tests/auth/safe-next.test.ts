import { describe, expect, test } from "vitest";
import { safeNextPath } from "@/lib/http/safe-next";

const BASE = "http://127.0.0.1:3000";

// Each of these is read by a browser (WHATWG URL parser) as another host or is not a plain path.
const REFUSED: [string, unknown][] = [
  ["absolute URL", "https://evil.example/orders"],
  ["protocol-relative", "//evil.example"],
  ["backslash after slash", "/\\evil.example"],
  ["backslashes only", "\\\\evil.example"],
  ["tab inside the double slash", "/\t/evil.example"],
  ["newline inside the double slash", "/\n/evil.example"],
  ["carriage return", "/\r/evil.example"],
  ["NUL byte", "/orders\u0000"],
  ["DEL", "/orders\u007f"],
  ["C1 control", "/orders\u0085"],
  ["encoded slashes", "/%2F%2Fevil.example"],
  ["encoded backslash", "/%5Cevil.example"],
  ["javascript scheme", "javascript:alert(1)"],
  ["relative path", "orders"],
  ["empty", ""],
  ["not a string", 42],
  ["array", ["/orders"]],
  ["very long", `/${"a".repeat(600)}`],
];

const KEPT: [string, string, string][] = [
  ["a plain path", "/orders", "/orders"],
  ["a path with query and fragment", "/orders/abc?tab=files#top", "/orders/abc?tab=files#top"],
  ["dot segments resolve within the site", "/desk/../orders", "/orders"],
  ["an encoded character elsewhere", "/build?name=a%2Fb", "/build?name=a%2Fb"],
];

describe("the return path after sign-in", () => {
  test.each(REFUSED)("refuses %s", (_label, value) => {
    expect(safeNextPath(value, BASE)).toBeNull();
  });

  test.each(KEPT)("keeps %s", (_label, value, expected) => {
    expect(safeNextPath(value, BASE)).toBe(expected);
  });

  test("whatever it keeps resolves to the app's own origin", () => {
    for (const [, value] of [...REFUSED, ...KEPT]) {
      const kept = safeNextPath(value, BASE);
      if (kept !== null) expect(new URL(kept, BASE).origin).toBe(BASE);
    }
  });
});
