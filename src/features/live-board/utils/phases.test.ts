import { describe, expect, it } from "vitest";
import { nextPhaseOf, revoteToggleOf, runNeedsPhaseChange } from "./phases";

describe("moving a trial on", () => {
  it("goes set up → predict → observe → explain, and back to explain after a re-vote", () => {
    expect(nextPhaseOf("setup")).toBe("predict");
    expect(nextPhaseOf("predict")).toBe("observe");
    expect(nextPhaseOf("observe")).toBe("explain");
    expect(nextPhaseOf("explain")).toBeNull();
    expect(nextPhaseOf("revote")).toBe("explain");
  });
  it("offers no explain step when the question asks for no explanation", () => {
    expect(nextPhaseOf("observe", { askExplanation: false })).toBeNull();
    expect(revoteToggleOf("observe", { askExplanation: false, revote: true })).toEqual({ to: "revote", label: "Open a re-vote" });
    expect(revoteToggleOf("revote", { askExplanation: false, revote: true })).toBeNull();
  });
  it("offers the re-vote only after explain, and only when the question offers one", () => {
    expect(revoteToggleOf("observe", {})).toBeNull();
    expect(revoteToggleOf("explain", {})).toEqual({ to: "revote", label: "Open a re-vote" });
    expect(revoteToggleOf("revote", {})).toEqual({ to: "explain", label: "Close the re-vote" });
    expect(revoteToggleOf("explain", { revote: false })).toBeNull();
  });
  it("Run closes predictions only before observing", () => {
    expect(runNeedsPhaseChange("predict")).toBe(true);
    expect(runNeedsPhaseChange("setup")).toBe(true);
    expect(runNeedsPhaseChange("observe")).toBe(false);
    expect(runNeedsPhaseChange("explain")).toBe(false);
  });
});
