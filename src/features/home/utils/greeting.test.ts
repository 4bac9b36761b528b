import { describe, expect, it } from "vitest";
import { firstNameOf, greetingFor } from "./greeting";

describe("greeting", () => {
  it("changes with the time of day", () => {
    expect(greetingFor(8)).toBe("Good morning");
    expect(greetingFor(12)).toBe("Good afternoon");
    expect(greetingFor(17)).toBe("Good afternoon");
    expect(greetingFor(18)).toBe("Good evening");
  });
  it("uses the first name", () => {
    expect(firstNameOf("Priya Lindqvist")).toBe("Priya");
    expect(firstNameOf("  Tom  Ashdown ")).toBe("Tom");
  });
});
