import { describe, expect, it } from "vitest";
import { defaultPlannedSlot, plannedDayLabel, plannedForIso } from "./planned-time";

describe("planned lesson times", () => {
  it("suggests the next weekday at 09:00, skipping the weekend", () => {
    // Wednesday 2 Dec 2026 → Thursday; Friday 4 Dec → Monday 7 Dec; Saturday → Monday.
    expect(defaultPlannedSlot(new Date(2026, 11, 2, 15, 0))).toEqual({ date: "2026-12-03", time: "09:00" });
    expect(defaultPlannedSlot(new Date(2026, 11, 4, 8, 0))).toEqual({ date: "2026-12-07", time: "09:00" });
    expect(defaultPlannedSlot(new Date(2026, 11, 5, 8, 0))).toEqual({ date: "2026-12-07", time: "09:00" });
    // Across a month and a year end.
    expect(defaultPlannedSlot(new Date(2026, 11, 31, 12, 0))).toEqual({ date: "2027-01-01", time: "09:00" });
  });

  it("reads a typed local date and time, and refuses impossible ones", () => {
    expect(plannedForIso("2026-12-03", "09:05")).toBe(new Date(2026, 11, 3, 9, 5).toISOString());
    expect(plannedForIso("2026-02-31", "09:00")).toBeNull();
    expect(plannedForIso("2026-12-03", "25:00")).toBeNull();
    expect(plannedForIso("", "09:00")).toBeNull();
    expect(plannedForIso("2026-12-03", "")).toBeNull();
  });

  it("labels today and tomorrow in words, other days by date", () => {
    const now = new Date(2026, 11, 2, 8, 0);
    expect(plannedDayLabel(new Date(2026, 11, 2, 9, 5).toISOString(), now)).toBe("Today, 09:05");
    expect(plannedDayLabel(new Date(2026, 11, 3, 14, 0).toISOString(), now)).toBe("Tomorrow, 14:00");
    expect(plannedDayLabel(new Date(2026, 11, 10, 9, 0).toISOString(), now)).toBe("Thu 10 Dec, 09:00");
    expect(plannedDayLabel("nonsense", now)).toBe("Unknown time");
  });
});
