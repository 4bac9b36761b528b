import { describe, expect, it } from "vitest";
import { formatShare, formatWeek, presetOf, presetRange, rangeFromParams } from "./overview-range";

describe("date range presets", () => {
  it("this school year starts on the 1 September before today", () => {
    expect(presetRange("this-school-year", "2026-12-02")).toEqual({ from: "2026-09-01", to: "2026-12-02" });
    expect(presetRange("this-school-year", "2026-03-15")).toEqual({ from: "2025-09-01", to: "2026-03-15" });
  });

  it("this term starts on 1 September, 1 January or 1 April", () => {
    expect(presetRange("this-term", "2026-12-02").from).toBe("2026-09-01");
    expect(presetRange("this-term", "2026-02-10").from).toBe("2026-01-01");
    expect(presetRange("this-term", "2026-06-30").from).toBe("2026-04-01");
  });

  it("the last 12 weeks run from a Monday eleven weeks before this week's", () => {
    expect(presetRange("last-12-weeks", "2026-12-02")).toEqual({ from: "2026-09-14", to: "2026-12-02" });
  });

  it("recognises a range that is a preset, and one that is not", () => {
    expect(presetOf({ from: "2026-09-01", to: "2026-12-02" }, "2026-12-02")).toBe("this-term"); // the term and the year agree in autumn
    expect(presetOf({ from: "2026-09-14", to: "2026-12-02" }, "2026-12-02")).toBe("last-12-weeks");
    expect(presetOf({ from: "2026-10-01", to: "2026-10-31" }, "2026-12-02")).toBeNull();
  });
});

describe("the range in the address", () => {
  it("is read from ?from and ?to when both are real days", () => {
    expect(rangeFromParams(new URLSearchParams("from=2026-10-01&to=2026-10-31"), "2026-12-02")).toEqual({ from: "2026-10-01", to: "2026-10-31" });
  });
  it("falls back to the last 12 weeks otherwise", () => {
    const fallback = { from: "2026-09-14", to: "2026-12-02" };
    expect(rangeFromParams(new URLSearchParams("from=2026-10-01"), "2026-12-02")).toEqual(fallback);
    expect(rangeFromParams(new URLSearchParams("from=2026-02-30&to=2026-03-01"), "2026-12-02")).toEqual(fallback);
  });
});

describe("labels", () => {
  it("names a week by its Monday and Sunday", () => {
    expect(formatWeek("2026-11-30")).toBe("30 Nov – 6 Dec 2026");
  });
  it("shows a share as a whole percentage, and a dash for none", () => {
    expect(formatShare(0.4321)).toBe("43 %");
    expect(formatShare(null)).toBe("–");
  });
});
