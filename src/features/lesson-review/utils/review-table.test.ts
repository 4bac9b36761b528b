import { describe, expect, it } from "vitest";
import type { ReviewPrediction } from "@contracts/lesson-review";
import { filterPredictions, formatCloseness, nextSort, predictionSortValue, sortRows } from "./review-table";

const row = (pupil: string, round: 1 | 2, value: number | null, abs: number | null, reason = ""): ReviewPrediction => ({
  id: `${pupil}-${round}`,
  participantId: pupil,
  pupil,
  round,
  value,
  choice: null,
  choiceLabel: null,
  reason,
  closeness: abs === null ? null : { signedRelativeError: abs, absoluteRelativeError: abs, within10: abs <= 0.1 },
  submittedAt: "2026-11-30T09:00:00.000Z",
});

const rows = [row("Sam 10", 1, 12, 0.2, "b"), row("ana b.", 1, -0.5, 1.03), row("Sam 2", 2, 14, null, "a"), row("Ben C.", 1, 15, 0.05)];
const names = (r: ReviewPrediction[]) => r.map((x) => x.pupil);

describe("sorting the predictions table", () => {
  it("sorts names ignoring case and reading numbers in them as numbers, both ways", () => {
    expect(names(sortRows(rows, (r) => predictionSortValue(r, "pupil"), "ascending"))).toEqual(["ana b.", "Ben C.", "Sam 2", "Sam 10"]);
    expect(names(sortRows(rows, (r) => predictionSortValue(r, "pupil"), "descending"))).toEqual(["Sam 10", "Sam 2", "Ben C.", "ana b."]);
  });

  it("sorts answers as numbers (−0.5 first), not as text", () => {
    expect(sortRows(rows, (r) => predictionSortValue(r, "answer"), "ascending").map((r) => r.value)).toEqual([-0.5, 12, 14, 15]);
  });

  it("sorts by the size of the error and keeps answers without one last in either direction", () => {
    expect(names(sortRows(rows, (r) => predictionSortValue(r, "closeness"), "ascending"))).toEqual(["Ben C.", "Sam 10", "ana b.", "Sam 2"]);
    expect(names(sortRows(rows, (r) => predictionSortValue(r, "closeness"), "descending"))).toEqual(["ana b.", "Sam 10", "Ben C.", "Sam 2"]);
  });

  it("keeps equal rows in their order, and does not change the array it was given", () => {
    const before = names(rows);
    expect(names(sortRows(rows, (r) => predictionSortValue(r, "round"), "ascending"))).toEqual(["Sam 10", "ana b.", "Ben C.", "Sam 2"]);
    expect(names(rows)).toEqual(before);
  });

  it("flips the direction on a second click of the same header; another header starts ascending", () => {
    expect(nextSort(null, "pupil")).toEqual({ key: "pupil", direction: "ascending" });
    expect(nextSort({ key: "pupil", direction: "ascending" }, "pupil")).toEqual({ key: "pupil", direction: "descending" });
    expect(nextSort({ key: "pupil", direction: "descending" }, "round")).toEqual({ key: "round", direction: "ascending" });
  });
});

describe("filtering the predictions table", () => {
  it("finds names containing the search in any case, and by round", () => {
    expect(names(filterPredictions(rows, "  SAM ", "all"))).toEqual(["Sam 10", "Sam 2"]);
    expect(names(filterPredictions(rows, "sam", "1"))).toEqual(["Sam 10"]);
    expect(names(filterPredictions(rows, "", "2"))).toEqual(["Sam 2"]);
    expect(filterPredictions(rows, "nobody", "all")).toEqual([]);
  });
});

describe("how close, in words", () => {
  it("gives the signed percentage and whether it was within 10 %", () => {
    expect(formatCloseness({ signedRelativeError: 0.123, absoluteRelativeError: 0.123, within10: false })).toBe("+12 % (too high)");
    expect(formatCloseness({ signedRelativeError: -0.05, absoluteRelativeError: 0.05, within10: true })).toBe("−5 % (within 10 %)");
    expect(formatCloseness({ signedRelativeError: -0.4, absoluteRelativeError: 0.4, within10: false })).toBe("−40 % (too low)");
    expect(formatCloseness(null)).toBeNull();
  });
});
