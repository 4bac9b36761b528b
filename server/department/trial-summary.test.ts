import { describe, expect, it } from "vitest";
import type { Question } from "../contracts/lessons";
import { isWithin10 } from "../contracts/lesson-rules";
import { resultInQuestionUnit, summariseTrial } from "./trial-summary";

const numberQuestion = (unit: string, quantity = "rise"): Question => ({
  kind: "number",
  prompt: "How high?",
  quantity,
  unit,
  askReason: true,
  askExplanation: true,
  revote: true,
});

describe("how close a class's predictions were to the result", () => {
  it("counts answers within 10 % including the boundary, and takes the median relative error", () => {
    // Result 10: 11 and 9 are exactly 10 % off (they count), 12 is 20 % off, 5 is 50 % off.
    // Relative errors sorted: 0.1, 0.1, 0.2, 0.5 → median (0.1 + 0.2) / 2 = 0.15 (R-7 interpolation).
    const summary = summariseTrial([11, 9, 12, 5], 10);
    expect(summary.predictions).toBe(4);
    expect(summary.within10).toBe(2);
    expect(summary.medianRelError).toBeCloseTo(0.15, 12);
  });

  it("takes the middle answer's error for an odd count and works with negative results", () => {
    // Result −4: errors |−4.2+4|/4 = 0.05, |−2+4|/4 = 0.5, |−4+4|/4 = 0 → sorted 0, 0.05, 0.5 → 0.05.
    const summary = summariseTrial([-4.2, -2, -4], -4);
    expect(summary).toEqual({ predictions: 3, within10: 2, medianRelError: expect.closeTo(0.05, 12) });
  });

  it("with a result of 0 counts only exact zeros and has no relative error", () => {
    expect(summariseTrial([0, 0.01, -1], 0)).toEqual({ predictions: 3, within10: 1, medianRelError: null });
  });

  it("leaves out answers that are not finite numbers, and has no median without answers", () => {
    expect(summariseTrial([Number.NaN, Number.POSITIVE_INFINITY], 3)).toEqual({ predictions: 0, within10: 0, medianRelError: null });
    expect(isWithin10(10.999999, 10)).toBe(true);
    expect(isWithin10(11.0001, 10)).toBe(false);
  });
});

describe("the result in the question's unit", () => {
  const measured = { rise: { value: 0.143, unit: "m" }, force: { value: 0.25, unit: "N" } };

  it("converts the SI result into the unit predictions were typed in", () => {
    expect(resultInQuestionUnit(numberQuestion("cm"), measured)).toBeCloseTo(14.3, 12);
    expect(resultInQuestionUnit(numberQuestion("mm"), measured)).toBeCloseTo(143, 12);
    expect(resultInQuestionUnit(numberQuestion("mN", "force"), measured)).toBeCloseTo(250, 12);
  });

  it("has nothing to compare without a result, for a choice question or an unknown unit", () => {
    expect(resultInQuestionUnit(numberQuestion("cm"), null)).toBeNull();
    expect(resultInQuestionUnit(numberQuestion("cm", "speed"), measured)).toBeNull();
    expect(resultInQuestionUnit(numberQuestion("N"), measured)).toBeNull();
    expect(resultInQuestionUnit({ ...numberQuestion("cm"), kind: "choice", choices: [] }, measured)).toBeNull();
  });
});
