import { describe, expect, it } from "vitest";
import { archivedFilterFromParam, paramFromArchivedFilter } from "./archived-filter";

describe("archived filter in the address", () => {
  it("round-trips every filter", () => {
    for (const filter of ["exclude", "only", "include"] as const) {
      const param = paramFromArchivedFilter(filter);
      expect(archivedFilterFromParam(param ?? null)).toBe(filter);
    }
  });
  it("shows current classes for a missing or unknown value", () => {
    expect(archivedFilterFromParam(null)).toBe("exclude");
    expect(archivedFilterFromParam("everything")).toBe("exclude");
    expect(paramFromArchivedFilter("exclude")).toBeUndefined();
  });
});
