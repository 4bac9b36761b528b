import { describe, expect, it } from "vitest";
import { retentionCutoff } from "./retention";

const at = (iso: string) => new Date(iso);

describe("when pupil data has been kept long enough", () => {
  it.each([
    // In the school year that began last September: everything from before that September goes.
    ["2026-03-18T10:00:00Z", "2025-09-01T00:00:00.000Z"],
    ["2025-08-31T23:59:59Z", "2024-09-01T00:00:00.000Z"],
    // From the first moment of 1 September, the year just ended is past its time.
    ["2025-09-01T00:00:00Z", "2025-09-01T00:00:00.000Z"],
    ["2025-12-31T23:00:00Z", "2025-09-01T00:00:00.000Z"],
  ])("until the end of the school year: at %s the cutoff is %s", (now, cutoff) => {
    expect(retentionCutoff("end_of_school_year", at(now)).toISOString()).toBe(cutoff);
  });

  it("counts whole days back for 90 and 30 days", () => {
    expect(retentionCutoff("days_90", at("2026-03-18T02:30:00Z")).toISOString()).toBe("2025-12-18T02:30:00.000Z");
    expect(retentionCutoff("days_30", at("2026-03-18T02:30:00Z")).toISOString()).toBe("2026-02-16T02:30:00.000Z");
  });
});
