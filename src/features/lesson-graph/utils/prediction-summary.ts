import { quantileSorted } from "simple-statistics";
import { isWithin10 } from "@contracts/lesson-rules";

/**
 * Summary figures for the comparison graph. Quartiles and the median come from simple-statistics
 * (7.12.1, src/quantile_sorted.js), which interpolates linearly between order statistics: R's
 * `quantile(type = 7)` and numpy's default, definition 7 of R. J. Hyndman & Y. Fan, "Sample
 * quantiles in statistical packages", The American Statistician 50(4), 361–365 (1996).
 */
export interface PredictionSummary {
  /** Number of answers counted (non-finite values are left out). */
  count: number;
  median: number | null;
  /** 25th percentile (R-7), in the answers' unit. */
  lowerQuartile: number | null;
  /** 75th percentile (R-7), in the answers' unit. */
  upperQuartile: number | null;
  /** Interquartile range, upper − lower quartile: the width of the middle half of the answers. */
  spread: number | null;
  /**
   * Share (0–1) of answers v within 10 % of the result r: |v − r| ≤ 0.1·|r|, with a rounding
   * allowance of 1e-9·|r| so that an answer exactly on the boundary, such as 11 against 10,
   * counts despite binary floating point (11 − 10 ≠ 0.1·10 exactly). With r = 0 only answers of
   * exactly 0 count. Null without a result or without answers.
   */
  shareWithin10: number | null;
  /** How many answers were within 10 % of the result (null without a result). */
  countWithin10: number | null;
  min: number | null;
  max: number | null;
}


/** Median, quartiles, spread and closeness to the result of a class's number answers. */
export function summariseAnswers(values: number[], result: number | null): PredictionSummary {
  const sorted = values.filter(Number.isFinite).sort((a, b) => a - b);
  const count = sorted.length;
  if (count === 0) {
    return { count, median: null, lowerQuartile: null, upperQuartile: null, spread: null, shareWithin10: null, countWithin10: null, min: null, max: null };
  }
  const lowerQuartile = quantileSorted(sorted, 0.25);
  const upperQuartile = quantileSorted(sorted, 0.75);
  const usableResult = result !== null && Number.isFinite(result) ? result : null;
  const countWithin10 = usableResult === null ? null : sorted.filter((v) => isWithin10(v, usableResult)).length;
  return {
    count,
    median: quantileSorted(sorted, 0.5),
    lowerQuartile,
    upperQuartile,
    spread: upperQuartile - lowerQuartile,
    shareWithin10: countWithin10 === null ? null : countWithin10 / count,
    countWithin10,
    min: sorted[0]!,
    max: sorted[count - 1]!,
  };
}

/** How many answers picked each of `n` choices; indexes outside 0…n−1 are counted as `ignored`. */
export function countChoices(choices: number[], n: number): { counts: number[]; ignored: number } {
  const counts = Array.from({ length: n }, () => 0);
  let ignored = 0;
  for (const c of choices) {
    if (Number.isInteger(c) && c >= 0 && c < n) counts[c]! += 1;
    else ignored += 1;
  }
  return { counts, ignored };
}

/** A choice's range in the question's unit; null ends are open (−∞ below, +∞ above). */
export interface ChoiceRange {
  min: number | null;
  max: number | null;
}

/**
 * The index of the first choice whose half-open range [min, max) holds the result, or null.
 * A choice with neither end set has no range and never holds the result.
 */
export function choiceHoldingResult(choices: readonly ChoiceRange[], result: number | null): number | null {
  if (result === null || !Number.isFinite(result)) return null;
  const index = choices.findIndex(
    (c) => (c.min !== null || c.max !== null) && (c.min === null || result >= c.min) && (c.max === null || result < c.max),
  );
  return index === -1 ? null : index;
}
