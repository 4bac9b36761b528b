import { describe, expect, it } from "vitest";
import { formatPlanDate } from "./format-plan-date";

describe("a plan's date", () => {
  it("shows the day in the given time zone, and says so when the date is unreadable", () => {
    expect(formatPlanDate("2026-11-30T23:30:00Z", "en-GB", "UTC")).toBe("30 Nov 2026");
    expect(formatPlanDate("2026-11-30T23:30:00Z", "en-GB", "Europe/Berlin")).toBe("1 Dec 2026");
    expect(formatPlanDate("not a date")).toBe("on an unknown date");
  });
});
