import { describe, expect, it } from "vitest";
import { defaultOverviewRange, mondayOf, overviewQuerySchema, parseIsoDay, weeksOverlapping } from "./department-overview";

describe("week bucketing (weeks start on Monday, UTC days)", () => {
  it("puts every day of a week under that week's Monday", () => {
    // 30 Nov 2026 is a Monday (checked against the calendar: 1 Jan 2026 was a Thursday).
    expect(mondayOf("2026-11-30")).toBe("2026-11-30");
    expect(mondayOf("2026-12-02")).toBe("2026-11-30");
    expect(mondayOf("2026-12-06")).toBe("2026-11-30");
    expect(mondayOf("2026-12-07")).toBe("2026-12-07");
  });

  it("crosses month and year ends", () => {
    expect(mondayOf("2027-01-01")).toBe("2026-12-28");
    expect(mondayOf("2024-03-01")).toBe("2024-02-26"); // leap year: 26, 27, 28, 29 Feb, 1 Mar
  });

  it("lists the Mondays of every week the range touches, oldest first", () => {
    expect(weeksOverlapping("2026-11-04", "2026-11-30")).toEqual(["2026-11-02", "2026-11-09", "2026-11-16", "2026-11-23", "2026-11-30"]);
    expect(weeksOverlapping("2026-12-02", "2026-12-02")).toEqual(["2026-11-30"]);
  });

  it("defaults to this week and the eleven before it", () => {
    const range = defaultOverviewRange("2026-12-02");
    expect(range).toEqual({ from: "2026-09-14", to: "2026-12-02" });
    expect(weeksOverlapping(range.from, range.to)).toHaveLength(12);
  });
});

describe("the overview's date range", () => {
  it("accepts real days only", () => {
    expect(parseIsoDay("2026-02-28")).not.toBeNull();
    expect(parseIsoDay("2026-02-29")).toBeNull();
    expect(parseIsoDay("2026-2-3")).toBeNull();
    const bad = overviewQuerySchema.safeParse({ from: "2026-13-01" });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0]?.path).toEqual(["from"]);
  });

  it("refuses an end before the start, on the end field", () => {
    const parsed = overviewQuerySchema.safeParse({ from: "2026-10-02", to: "2026-10-01" });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues).toEqual([expect.objectContaining({ path: ["to"], message: "The end date must be on or after the start date." })]);
  });

  it("allows up to 731 days, not more", () => {
    expect(overviewQuerySchema.safeParse({ from: "2025-01-01", to: "2026-12-31" }).success).toBe(true); // 730 days apart
    const tooLong = overviewQuerySchema.safeParse({ from: "2025-01-01", to: "2027-01-02" });
    expect(tooLong.success).toBe(false);
    expect(tooLong.error?.issues[0]?.path).toEqual(["from"]);
  });
});
