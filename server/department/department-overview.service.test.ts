import { describe, expect, it } from "vitest";
import { resolveRange } from "./department-overview.service";

describe("the overview's range defaults", () => {
  const now = new Date("2026-12-02T15:00:00Z");
  it("is the last 12 weeks to today with nothing given", () => {
    expect(resolveRange({}, now)).toEqual({ from: "2026-09-14", to: "2026-12-02" });
  });
  it("ends today when only the start is given, and 12 weeks back from a given end", () => {
    expect(resolveRange({ from: "2026-11-01" }, now)).toEqual({ from: "2026-11-01", to: "2026-12-02" });
    expect(resolveRange({ to: "2026-06-30" }, now)).toEqual({ from: "2026-04-13", to: "2026-06-30" });
  });
});
