import { describe, expect, it } from "vitest";
import { resolveRange } from "./department-overview.service";

describe("the overview's range defaults", () => {
  const now = new Date("2026-12-02T15:00:00Z");
  it("is the last 12 weeks to today with nothing given", () => {
    expect(resolveRange({}, "UTC", now)).toEqual({ from: "2026-09-14", to: "2026-12-02" });
  });
  it("ends today when only the start is given, and 12 weeks back from a given end", () => {
    expect(resolveRange({ from: "2026-11-01" }, "UTC", now)).toEqual({ from: "2026-11-01", to: "2026-12-02" });
    expect(resolveRange({ to: "2026-06-30" }, "UTC", now)).toEqual({ from: "2026-04-13", to: "2026-06-30" });
  });
  it("takes today in the school's time zone (New Zealand is UTC+13 in December, the IANA tz database)", () => {
    const lateEvening = new Date("2026-12-01T23:30:00Z");
    expect(resolveRange({}, "UTC", lateEvening).to).toBe("2026-12-01");
    expect(resolveRange({}, "Pacific/Auckland", lateEvening).to).toBe("2026-12-02");
  });
});
