import { describe, expect, it } from "vitest";
import { formatLessonDate } from "./format-lesson-date";

describe("formatLessonDate", () => {
  it("gives weekday, date and time in the zone asked for", () => {
    expect(formatLessonDate("2026-11-30T09:05:00Z", "en-GB", "UTC")).toBe("Mon, 30 Nov 2026, 09:05");
  });
  it("says so when the date cannot be read", () => {
    expect(formatLessonDate("not a date")).toBe("Unknown date");
  });
});
