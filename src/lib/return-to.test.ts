import { describe, expect, it } from "vitest";
import { safeReturnTo, signInPath, signInStartUrl } from "./return-to";

describe("safeReturnTo", () => {
  it("accepts local paths with a query", () => {
    expect(safeReturnTo("/classes?show=archived")).toBe("/classes?show=archived");
  });
  it("refuses other sites, protocol-relative and backslash tricks", () => {
    expect(safeReturnTo("https://elsewhere.example/")).toBeUndefined();
    expect(safeReturnTo("//elsewhere.example")).toBeUndefined();
    expect(safeReturnTo("/\\elsewhere.example")).toBeUndefined();
    expect(safeReturnTo("/classes\n")).toBeUndefined();
  });
  it("refuses the sign-in pages and the server's auth routes, so sign-in cannot loop", () => {
    expect(safeReturnTo("/sign-in")).toBeUndefined();
    expect(safeReturnTo("/sign-in/not-invited")).toBeUndefined();
    expect(safeReturnTo("/sign-in?returnTo=/x")).toBeUndefined();
    expect(safeReturnTo("/auth/google")).toBeUndefined();
    expect(safeReturnTo("/sign-inside")).toBe("/sign-inside");
  });
});

describe("sign-in links", () => {
  it("carries the page to come back to", () => {
    expect(signInPath("/classes/abc")).toBe("/sign-in?returnTo=%2Fclasses%2Fabc");
    expect(signInStartUrl("/classes/abc")).toBe("/auth/google?returnTo=%2Fclasses%2Fabc");
  });
  it("leaves out a missing, unsafe or home returnTo", () => {
    expect(signInPath("/")).toBe("/sign-in");
    expect(signInPath("//evil.example")).toBe("/sign-in");
    expect(signInStartUrl(null)).toBe("/auth/google");
  });
});
