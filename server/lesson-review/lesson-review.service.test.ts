import { describe, expect, it } from "vitest";
import { summariseRound } from "./lesson-review.service";

describe("a round's summary figures", () => {
  it("gives the median and quartiles by linear interpolation (R-7: Hyndman & Fan, The American Statistician 50(4), 1996)", () => {
    // n = 4, p = 0.25: h = (n − 1)p + 1 = 1.75 → 10 + 0.75·(20 − 10) = 17.5; p = 0.75: h = 3.25 → 30 + 0.25·10 = 32.5.
    const s = summariseRound(1, [40, 10, 30, 20], null, 22);
    expect(s).toMatchObject({ count: 4, median: 25, lowerQuartile: 17.5, upperQuartile: 32.5, spread: 15, min: 10, max: 40 });
    // Within 10 % of 22: |v − 22| ≤ 2.2, so only 20.
    expect(s.within10).toBe(1);
  });

  it("has no closeness count before a result, and counts choices for a choice question", () => {
    expect(summariseRound(1, [1, 2], null, null).within10).toBeNull();
    const choice = summariseRound(2, [], [3, 0, 2], 5);
    expect(choice).toMatchObject({ round: 2, count: 5, median: null, within10: null, choiceCounts: [3, 0, 2] });
  });

  it("is empty without answers", () => {
    expect(summariseRound(1, [], null, 10)).toMatchObject({ count: 0, median: null, spread: null, within10: 0 });
  });
});
