import { describe, expect, it } from "vitest";
import { SIGNED_OUT_MESSAGES, readNavigationState } from "./navigation-state";

describe("readNavigationState", () => {
  it("reads a known sign-out reason", () => {
    expect(readNavigationState({ signedOut: "signed_out_everywhere", leaveUnsaved: true })).toEqual({
      signedOut: "signed_out_everywhere",
      leaveUnsaved: true,
    });
    expect(SIGNED_OUT_MESSAGES.signed_out_everywhere).toBe("You were signed out on all devices.");
  });
  it("ignores anything it does not recognise", () => {
    expect(readNavigationState(null)).toEqual({});
    expect(readNavigationState({ signedOut: "toString", leaveUnsaved: "yes" })).toEqual({ signedOut: undefined, leaveUnsaved: false });
    expect(readNavigationState("signed_out")).toEqual({});
  });
});
