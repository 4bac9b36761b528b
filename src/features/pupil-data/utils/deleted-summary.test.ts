import { describe, expect, it } from "vitest";
import { deletedSummary } from "./deleted-summary";

describe("what a deletion removed, in words", () => {
  it("counts with the right plural", () => {
    expect(deletedSummary([{ kind: "roster_names", count: 1 }])).toBe("1 roster name");
    expect(deletedSummary([{ kind: "roster_names", count: 12 }])).toBe("12 roster names");
  });
  it("says nothing was deleted when every count is zero or there are none", () => {
    expect(deletedSummary([{ kind: "roster_names", count: 0 }])).toBe("nothing");
    expect(deletedSummary([])).toBe("nothing");
  });
});
