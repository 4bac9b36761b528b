import { describe, expect, it } from "vitest";
import { choiceOfValue, codeFromPath, formatNumber, formatUncertainty, niceTicks, plotDomain, stackDots, withUnit } from "./pupil-format";
import { latestPrediction, mergeMine, readStoredLesson, storageKey, writeStoredLesson, type StoredLesson } from "./pupil-storage";

describe("lesson code in the address", () => {
  it("reads the code after /join/, whatever the case, and refuses anything else", () => {
    expect(codeFromPath("/join/cek7xa")).toBe("CEK7XA");
    expect(codeFromPath("/join/CEK-7XA/")).toBe("CEK7XA");
    expect(codeFromPath("/join")).toBeNull();
    // O and 0 are not in the alphabet (look-alikes), so this is not a code.
    expect(codeFromPath("/join/CEK70A")).toBeNull();
    expect(codeFromPath("/join/CEK7XA/extra")).toBeNull();
  });
});

describe("numbers as shown", () => {
  it("keeps three significant figures and the unit", () => {
    expect(formatNumber(14.2333)).toBe("14.2");
    expect(formatNumber(0.66666)).toBe("0.667");
    expect(formatNumber(1234)).toBe("1230");
    expect(formatNumber(-2.5)).toBe("-2.5");
    expect(withUnit(12.5, "cm")).toBe("12.5 cm");
    expect(withUnit(1.5, "")).toBe("1.5");
  });
});

describe("answer plot", () => {
  it("ticks at 1, 2 or 5 steps that cover the range", () => {
    expect(niceTicks(0, 10)).toEqual([0, 2, 4, 6, 8, 10]);
    expect(niceTicks(3.2, 4.1)).toEqual([3.2, 3.4, 3.6, 3.8, 4]);
    expect(niceTicks(3.3, 4.1)).toEqual([3.4, 3.6, 3.8, 4]);
  });

  it("the domain holds every value with room at both ends", () => {
    const d = plotDomain([5, 12, 30]);
    expect(d.min).toBeLessThan(5);
    expect(d.max).toBeGreaterThan(30);
    expect(d.ticks[0]).toBeGreaterThanOrEqual(d.min);
    expect(d.ticks.at(-1)).toBeLessThanOrEqual(d.max);
    const same = plotDomain([7, 7]);
    expect(same.min).toBeLessThan(7);
    expect(same.max).toBeGreaterThan(7);
  });

  it("close answers stack into a column, distant ones stay on the axis", () => {
    const domain = { min: 0, max: 100, ticks: [] };
    const dots = stackDots([10, 10, 10.5, 50], domain, 100, 4);
    expect(dots).toEqual([
      { x: 10, level: 0 },
      { x: 10, level: 1 },
      { x: 10, level: 2 },
      { x: 50, level: 0 },
    ]);
  });

  it("finds the choice whose range holds a value", () => {
    const choices = [
      { min: null, max: 10 },
      { min: 10, max: 20 },
      { min: 20, max: null },
    ];
    expect(choiceOfValue(choices, 4)).toBe(0);
    expect(choiceOfValue(choices, 10)).toBe(1);
    expect(choiceOfValue(choices, 25)).toBe(2);
    expect(choiceOfValue([{ min: null, max: null }, { min: null, max: null }], 3)).toBeNull();
  });
});

describe("storage on the device", () => {
  const map = new Map<string, string>();
  const store = {
    getItem: (k: string) => map.get(k) ?? null,
    setItem: (k: string, v: string) => void map.set(k, v),
    removeItem: (k: string) => void map.delete(k),
  };
  const lesson: StoredLesson = {
    code: "CEK7XA",
    resumeToken: "r".repeat(32),
    participantId: "p1",
    displayName: "Ada F.",
    mine: { predictions: [], explanations: [] },
    outbox: [],
  };

  it("keeps one entry per lesson code and reads it back", () => {
    writeStoredLesson(store, lesson);
    expect([...map.keys()]).toEqual([storageKey("CEK7XA")]);
    expect(readStoredLesson(store, "CEK7XA")).toEqual(lesson);
    expect(readStoredLesson(store, "HJK7XA")).toBeNull();
  });

  it("treats a damaged entry as none", () => {
    map.set(storageKey("TTTTTT"), "{not json");
    expect(readStoredLesson(store, "TTTTTT")).toBeNull();
  });

  it("own answers: the server's list wins, a just-acknowledged local one is kept, the latest counts", () => {
    const p = (clientId: string, value: number) => ({ trialId: "t", round: 1 as const, clientId, value, choice: null, reason: "" });
    const merged = mergeMine({ predictions: [p("a", 1)], explanations: [] }, { predictions: [p("a", 1), p("b", 2)], explanations: [] });
    expect(merged.predictions.map((x) => x.clientId)).toEqual(["a", "b"]);
    expect(latestPrediction(merged, "t", 1)?.value).toBe(2);
    expect(latestPrediction(merged, "t", 2)).toBeNull();
  });
});

describe("formatUncertainty", () => {
  it("keeps one significant figure", () => {
    expect(formatUncertainty(0.635)).toBe("0.6");
    expect(formatUncertainty(0.0049)).toBe("0.005");
    expect(formatUncertainty(12)).toBe("10");
    expect(formatUncertainty(0)).toBe("0");
  });
});
