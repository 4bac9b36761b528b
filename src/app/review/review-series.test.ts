import { describe, expect, it } from "vitest";
import type { LessonReview, ReviewTrial } from "@contracts/lesson-review";
import { seriesOf } from "./review-series";

const trial = (position: number, unit: string, potHeight: number, values: number[], result: number | null, tally: number[] | null = null): ReviewTrial =>
  ({
    id: `t${position}`,
    position,
    rig: "fountain",
    shownParams: [{ key: "potHeight", label: "Height of the pot above the floor", unit: "m", value: potHeight }],
    question: { kind: "number", prompt: "How high?", quantity: "rise", unit, askReason: true, askExplanation: true, revote: true },
    result: result === null ? null : { value: result, uncertainty: null, unit },
    predictions: values.map((value, i) => ({ round: 1, value, choice: null, id: `${position}-${i}` })),
    tally: { 1: tally ? { counts: null, values: tally } : null, 2: null },
  }) as unknown as ReviewTrial;

describe("the review's fountain series", () => {
  it("puts every fountain trial in the first trial's unit, with show-of-hands answers and without names", () => {
    const review = { trials: [trial(1, "cm", 1, [10, 12], 14.3, [20]), trial(2, "mm", 1.5, [210], 227)] } as unknown as LessonReview;
    const { unit, trials } = seriesOf(review);
    expect(unit).toBe("cm");
    expect(trials).toEqual([
      { potHeight: 1, predictions: [10, 12, 20], result: 14.3 },
      { potHeight: 1.5, predictions: [expect.closeTo(21, 9)], result: expect.closeTo(22.7, 9) },
    ]);
  });

  it("leaves out trials that did not ask for the rise", () => {
    const other = { ...trial(2, "cm", 1, [1], 2), question: { kind: "number", prompt: "How fast?", quantity: "speed", unit: "m/s" } } as unknown as ReviewTrial;
    expect(seriesOf({ trials: [trial(1, "cm", 1, [10], 14), other] } as unknown as LessonReview).trials).toHaveLength(1);
  });
});
