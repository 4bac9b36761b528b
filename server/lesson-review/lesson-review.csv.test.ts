import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import type { LessonReview, ReviewTrial, RoundSummary } from "../contracts/lesson-review";
import { exportFileName, predictionsCsv, resultsCsv } from "./lesson-review.csv";

const parse = (csv: string) => Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true });

const summary = (round: 1 | 2, count: number, median: number | null, within10: number | null): RoundSummary => ({
  round,
  count,
  median,
  lowerQuartile: null,
  upperQuartile: null,
  spread: null,
  min: null,
  max: null,
  within10,
  choiceCounts: null,
});

function trial(position: number, unit: string, potHeight: number, result: number | null): ReviewTrial {
  return {
    id: `t${position}`,
    position,
    rig: "fountain",
    rigLabel: "Fountain rig",
    quantityLabel: "Rise of the chain above the rim",
    shownParams: [{ key: "potHeight", label: "Height of the pot above the floor", unit: "m", value: potHeight }],
    question: { kind: "number", prompt: "How high?", quantity: "rise", unit, askReason: true, askExplanation: true, revote: true },
    ranAt: result === null ? null : "2026-11-30T09:20:00.000Z",
    result: result === null ? null : { value: result, uncertainty: 0.8, unit },
    theory: result === null ? null : { value: 13.4567891, uncertainty: null, unit },
    predictions: [],
    explanations: [],
    tally: { 1: null, 2: null },
    summary: { 1: summary(1, 0, null, null), 2: summary(2, 0, null, null) },
  };
}

const review = (trials: ReviewTrial[]): LessonReview => ({
  lesson: { id: "l", classId: "c", className: "11X Physíçs / set 2", code: "HKT4MP", status: "ended", startedAt: "2026-11-30T09:05:00.000Z", endedAt: null, planTitle: null },
  participants: [],
  trials,
  pupils: [],
});

describe("the exports", () => {
  it("name value columns with their unit, one column per unit the lesson used, and keep numbers in the unit's column", () => {
    const a = trial(1, "cm", 1, 14.3);
    a.predictions = [
      { id: "p1", participantId: "x", pupil: "Ana B.", round: 1, value: 12, choice: null, choiceLabel: null, reason: "-it drops", closeness: { signedRelativeError: -0.16083916, absoluteRelativeError: 0.16083916, within10: false }, submittedAt: "2026-11-30T09:10:00.000Z" },
    ];
    const b = trial(2, "mm", 1.5, null);
    b.predictions = [
      { id: "p2", participantId: "x", pupil: "Ana B.", round: 1, value: -0.5, choice: null, choiceLabel: null, reason: "", closeness: null, submittedAt: "2026-11-30T09:30:00.000Z" },
    ];
    const back = parse(predictionsCsv(review([a, b])));
    expect(back.meta.fields).toEqual(expect.arrayContaining(["prediction (cm)", "prediction (mm)", "result (cm)", "theory (cm)", "height of the pot above the floor (m)"]));
    expect(back.data[0]).toMatchObject({ "prediction (cm)": "12", "prediction (mm)": "", reason: "'-it drops", "result (cm)": "14.3", "theory (cm)": "13.4568", "relative error (%)": "-16.1", "within 10 %": "no" });
    expect(back.data[1]).toMatchObject({ "prediction (cm)": "", "prediction (mm)": "-0.5", "result (mm)": "", "within 10 %": "" });
  });

  it("keep an explanation from a pupil who made no prediction, on a row of its own", () => {
    const t = trial(1, "cm", 1, 14.3);
    t.predictions = [
      { id: "p1", participantId: "x", pupil: "Ana B.", round: 1, value: 12, choice: null, choiceLabel: null, reason: "", closeness: null, submittedAt: "2026-11-30T09:10:00.000Z" },
    ];
    t.explanations = [
      { id: "e1", participantId: "x", pupil: "Ana B.", text: "The pile pushes up.", shown: false, submittedAt: "2026-11-30T09:21:00.000Z" },
      { id: "e2", participantId: "y", pupil: "Ben C.", text: "+ it flings out", shown: true, submittedAt: "2026-11-30T09:22:00.000Z" },
    ];
    const back = parse(predictionsCsv(review([t])));
    expect(back.data.map((r) => [r.pupil, r.round, r["prediction (cm)"], r.explanation])).toEqual([
      ["Ana B.", "before the run", "12", "The pile pushes up."],
      ["Ben C.", "", "", "'+ it flings out"],
    ]);
    expect(back.data[1]).toMatchObject({ "result (cm)": "14.3", "submitted at (UTC)": "2026-11-30T09:22:00.000Z" });
  });

  it("give one results row per trial, run or not", () => {
    const back = parse(resultsCsv(review([trial(1, "cm", 1, 14.3), trial(2, "cm", 1.5, null)])));
    expect(back.data.map((r) => [r.trial, r["height of the pot above the floor (m)"], r["result (cm)"]])).toEqual([
      ["1", "1", "14.3"],
      ["2", "1.5", ""],
    ]);
  });

  it("name the file after the class and the date in plain ASCII", () => {
    expect(exportFileName(review([]), "predictions")).toBe("11X-Physics-set-2-2026-11-30-predictions.csv");
  });
});
