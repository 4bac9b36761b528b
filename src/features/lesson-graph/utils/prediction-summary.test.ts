import { describe, expect, it } from "vitest";
import { isWithin10 } from "@contracts/lesson-rules";
import { choiceHoldingResult, countChoices, summariseAnswers } from "./prediction-summary";

/**
 * Hyndman & Fan (1996), definition 7, written out independently of simple-statistics:
 * h = (n − 1)p + 1 (1-based), Q(p) = x_⌊h⌋ + (h − ⌊h⌋)(x_⌊h⌋+1 − x_⌊h⌋).
 * R. J. Hyndman & Y. Fan, "Sample quantiles in statistical packages", The American
 * Statistician 50(4), 361–365 (1996) [definition recalled from memory, matches R's help page
 * for quantile(), type 7].
 */
function hyndmanFan7(sorted: number[], p: number): number {
  const h = (sorted.length - 1) * p + 1;
  const k = Math.floor(h);
  const lower = sorted[k - 1]!;
  const upper = sorted[Math.min(k, sorted.length - 1)]!;
  return lower + (h - k) * (upper - lower);
}

describe("summary of a class's number answers", () => {
  it("three answers, worked by hand: median, quartiles, spread and share within 10 %", () => {
    // Sorted 10, 12, 20. R-7 positions (n − 1)p: Q1 at 0.5 → 10 + 0.5·2 = 11; median at 1 → 12;
    // Q3 at 1.5 → 12 + 0.5·8 = 16; spread 16 − 11 = 5.
    // Result 11: 10 % is 1.1, so 10 (off by 1) and 12 (off by 1) count, 20 does not → 2 of 3.
    const s = summariseAnswers([20, 10, 12], 11);
    expect(s).toEqual({
      count: 3,
      median: 12,
      lowerQuartile: 11,
      upperQuartile: 16,
      spread: 5,
      shareWithin10: 2 / 3,
      countWithin10: 2,
      min: 10,
      max: 20,
    });
  });

  it("matches R's quantile(1:10) for type 7: 3.25, 5.5, 7.75 (worked by hand: positions 2.25, 4.5, 6.75)", () => {
    const s = summariseAnswers([10, 9, 8, 7, 6, 5, 4, 3, 2, 1], null);
    expect(s.lowerQuartile).toBeCloseTo(3.25, 12);
    expect(s.median).toBeCloseTo(5.5, 12);
    expect(s.upperQuartile).toBeCloseTo(7.75, 12);
    expect(s.spread).toBeCloseTo(4.5, 12);
    // A different textbook rule (median of each half, Moore & McCabe style) would give Q1 = 3:
    // the label must say which spread this is, and this check fails if the library changes rule.
    expect(s.lowerQuartile).not.toBe(3);
  });

  it("agrees with Hyndman & Fan definition 7 written out independently, on uneven data", () => {
    const data = [14.5, 8, 22, 13.6, 13.6, 30, 5.5, 19, 12, 16.25, 11];
    const sorted = [...data].sort((a, b) => a - b);
    const s = summariseAnswers(data, null);
    expect(s.lowerQuartile).toBeCloseTo(hyndmanFan7(sorted, 0.25), 12);
    expect(s.median).toBeCloseTo(hyndmanFan7(sorted, 0.5), 12);
    expect(s.upperQuartile).toBeCloseTo(hyndmanFan7(sorted, 0.75), 12);
    // n = 11: position (n − 1)/4 = 2.5 → halfway between the 3rd and 4th smallest (11 and 12).
    expect(s.lowerQuartile).toBeCloseTo(11.5, 12);
  });

  it("an answer exactly 10 % away counts; one a hair further does not", () => {
    expect(isWithin10(11, 10)).toBe(true);
    expect(isWithin10(9, 10)).toBe(true);
    expect(isWithin10(11.0000001, 10)).toBe(false);
    expect(isWithin10(8.99, 10)).toBe(false);
    // 13.6 cm and 14.96 cm: 10 % of 13.6 is 1.36; in binary floating point 14.96 − 13.6 > 1.36.
    expect(14.96 - 13.6 > 0.1 * 13.6).toBe(true);
    expect(isWithin10(14.96, 13.6)).toBe(true);
  });

  it("negative and zero results: 10 % of the size of the result", () => {
    expect(isWithin10(-9, -10)).toBe(true);
    expect(isWithin10(-11.5, -10)).toBe(false);
    expect(summariseAnswers([0, 0.1], 0).shareWithin10).toBe(0.5);
  });

  it("without a result there is no share; without answers there are no figures", () => {
    expect(summariseAnswers([1, 2], null).shareWithin10).toBeNull();
    expect(summariseAnswers([], 5)).toMatchObject({ count: 0, median: null, spread: null, shareWithin10: null, min: null });
    expect(summariseAnswers([Number.NaN, 4], 4)).toMatchObject({ count: 1, median: 4, spread: 0, shareWithin10: 1 });
  });
});

describe("choice answers", () => {
  it("counts per choice and sets aside indexes that name no choice", () => {
    expect(countChoices([0, 2, 2, 1, 2, 5, -1], 3)).toEqual({ counts: [1, 1, 3], ignored: 2 });
    expect(countChoices([], 2)).toEqual({ counts: [0, 0], ignored: 0 });
  });

  it("finds the choice whose half-open range [min, max) holds the result", () => {
    const choices = [
      { min: null, max: 10 },
      { min: 10, max: 20 },
      { min: 20, max: null },
    ];
    expect(choiceHoldingResult(choices, 9.99)).toBe(0);
    expect(choiceHoldingResult(choices, 10)).toBe(1);
    expect(choiceHoldingResult(choices, 19.999)).toBe(1);
    expect(choiceHoldingResult(choices, 20)).toBe(2);
    expect(choiceHoldingResult(choices, null)).toBeNull();
  });

  it("choices without ranges never hold the result", () => {
    expect(choiceHoldingResult([{ min: null, max: null }, { min: 0, max: 5 }], 7)).toBeNull();
    expect(choiceHoldingResult([{ min: null, max: null }, { min: 0, max: 5 }], 3)).toBe(1);
  });
});
