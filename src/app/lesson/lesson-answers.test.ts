import { describe, expect, it } from "vitest";
import type { TeacherTrial } from "@contracts/lessons";
import { anonymousAnswers, fountainSeries } from "./lesson-answers";

const trial = (over: Partial<TeacherTrial>): TeacherTrial =>
  ({
    rig: "fountain",
    params: { potHeight: 1 },
    question: { kind: "number", prompt: "How high?", quantity: "rise", unit: "cm", askReason: true },
    predictions: [],
    tally: { 1: null, 2: null },
    measured: null,
    ...over,
  }) as TeacherTrial;

const prediction = (round: 1 | 2, value: number | null, choice: number | null = null) =>
  ({ id: "p", participantId: "x", participantName: "Kept out", round, value, choice, reason: "r", createdAt: "" }) as TeacherTrial["predictions"][number];

describe("anonymous answers", () => {
  it("keeps values and rounds, drops names, and expands a show of hands", () => {
    const answers = anonymousAnswers(
      trial({
        predictions: [prediction(1, 12), prediction(2, 15)],
        tally: { 1: { counts: null, values: [10, 11] }, 2: { counts: [2, 0, 1], values: null } },
      }),
    );
    expect(answers).toEqual([
      { round: 1, value: 12, choice: null },
      { round: 2, value: 15, choice: null },
      { round: 1, value: 10, choice: null },
      { round: 1, value: 11, choice: null },
      { round: 2, value: null, choice: 0 },
      { round: 2, value: null, choice: 0 },
      { round: 2, value: null, choice: 2 },
    ]);
    expect(JSON.stringify(answers)).not.toContain("Kept out");
  });
});

describe("fountain series", () => {
  it("puts every rise trial in one unit, whatever unit each asked in, and skips other questions", () => {
    const series = fountainSeries(
      {
        trials: [
          trial({ predictions: [prediction(1, 12), prediction(2, 99)], measured: { rise: { value: 0.143, uncertainty: 0.01, unit: "m", basis: "" } } }),
          trial({ params: { potHeight: 1.5 }, question: { kind: "number", prompt: "?", quantity: "rise", unit: "mm", askReason: false, askExplanation: true, revote: true }, predictions: [prediction(1, 200)] }),
          trial({ question: { kind: "number", prompt: "?", quantity: "speed", unit: "m/s", askReason: false, askExplanation: true, revote: true } }),
          trial({ rig: "hanging" }),
        ],
      },
      "cm",
    );
    expect(series).toHaveLength(2);
    expect(series[0]!.potHeight).toBe(1);
    expect(series[0]!.predictions).toEqual([12]);
    expect(series[0]!.result).toBeCloseTo(14.3, 10);
    expect(series[1]!.predictions[0]).toBeCloseTo(20, 10);
    expect(series[1]!.result).toBeNull();
  });
});
