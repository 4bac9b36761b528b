import { describe, expect, it } from "vitest";
import { nextPhaseOf, runNeedsPhaseChange } from "./phases";

describe("moving a trial on", () => {
  it("goes set up → predict → observe → explain, and back to explain after a re-vote", () => {
    expect(nextPhaseOf("setup")).toBe("predict");
    expect(nextPhaseOf("predict")).toBe("observe");
    expect(nextPhaseOf("observe")).toBe("explain");
    expect(nextPhaseOf("explain")).toBeNull();
    expect(nextPhaseOf("revote")).toBe("explain");
  });
  it("Run closes predictions only before observing", () => {
    expect(runNeedsPhaseChange("predict")).toBe(true);
    expect(runNeedsPhaseChange("setup")).toBe(true);
    expect(runNeedsPhaseChange("observe")).toBe(false);
    expect(runNeedsPhaseChange("explain")).toBe(false);
  });
});
