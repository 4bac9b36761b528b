import { describe, expect, it } from "vitest";
import { canonicalTimeZone, isoDayIn, updateTimeZoneInputSchema } from "./school";

describe("the school's time zone", () => {
  it("takes IANA names in any case and refuses others", () => {
    expect(updateTimeZoneInputSchema.parse({ timeZone: " europe/london " })).toEqual({ timeZone: "Europe/London" });
    expect(updateTimeZoneInputSchema.safeParse({ timeZone: "Mars/Olympus" }).success).toBe(false);
    expect(updateTimeZoneInputSchema.safeParse({ timeZone: "" }).success).toBe(false);
    // Stored as the runtime's own id for the zone, which is the one the picker lists (ICU keeps
    // some older ids, e.g. Asia/Calcutta for Asia/Kolkata).
    expect(Intl.supportedValuesOf("timeZone")).toContain(canonicalTimeZone("Asia/Kolkata"));
    expect(canonicalTimeZone("utc")).toBe("UTC");
  });

  // Offsets from the IANA tz database (London: GMT in winter, BST = UTC+1 from the last Sunday
  // of March; New Zealand: NZDT = UTC+13 in December).
  it("gives the calendar day in that zone", () => {
    expect(isoDayIn(new Date("2026-12-01T23:30:00Z"), "Europe/London")).toBe("2026-12-01");
    expect(isoDayIn(new Date("2026-06-30T23:30:00Z"), "Europe/London")).toBe("2026-07-01");
    expect(isoDayIn(new Date("2026-12-01T11:30:00Z"), "Pacific/Auckland")).toBe("2026-12-02");
    expect(isoDayIn(new Date("2026-12-01T03:00:00Z"), "America/New_York")).toBe("2026-11-30");
  });
});
