import { describe, expect, it } from "vitest";
import { safeReturnTo } from "./auth.routes";

describe("where sign-in may return to", () => {
  it.each(["/", "/classes", "/classes/3f0e?tab=roster"])("keeps the local path %s", (path) => {
    expect(safeReturnTo(path)).toBe(path);
  });

  it.each([
    ["another site, scheme-relative", "//evil.example/x"],
    ["another site, backslash trick", "/\\evil.example"],
    ["an absolute URL", "https://evil.example/"],
    ["a sign-in loop", "/auth/google"],
    ["a header injection", "/classes\r\nSet-Cookie: x=1"],
    ["not a string", 42],
    ["absurdly long", "/" + "a".repeat(400)],
  ])("drops %s", (_label, value) => {
    expect(safeReturnTo(value)).toBeUndefined();
  });
});
