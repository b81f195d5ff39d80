import { describe, expect, it } from "vitest";
import { allClean, median, medianRound, roundsFigure } from "../../bench/table";

const run = (p99: number, extra: Partial<{ non2xx: number; p50: number; rate: number }> = {}) => ({
  latency: { p50: extra.p50 ?? 3, p99 },
  requests: { average: extra.rate ?? 300 },
  non2xx: extra.non2xx ?? 0,
  errors: 0,
  timeouts: 0,
});

describe("bench rounds", () => {
  it("the median is the middle value, the lower middle one for an even count", () => {
    expect(median([9, 1, 5])).toBe(5);
    expect(median([4, 1, 3, 2])).toBe(2);
  });

  it("one slow round does not decide the row, but is printed beside it", () => {
    const runs = [run(18, { p50: 4 }), run(447, { p50: 5 }), run(22, { p50: 6 })];
    expect(medianRound(runs)).toBe(runs[2]);
    expect(roundsFigure(runs)).toBe(
      "p50 6 ms · p99 22 ms · 300 req/s (median of 3 rounds; p99 18 / 447 / 22 ms)",
    );
  });

  it("two slow rounds of three do decide it", () => {
    expect(medianRound([run(18), run(447), run(130)]).latency.p99).toBe(130);
  });

  it("a failed request in any round is a failure", () => {
    expect(allClean([run(10), run(11)])).toBe(true);
    expect(allClean([run(10), run(11, { non2xx: 1 })])).toBe(false);
  });
});
