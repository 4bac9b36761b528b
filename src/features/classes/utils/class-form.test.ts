import { describe, expect, it } from "vitest";
import { changedClassFields, checkClassFields, rosterCountLabel } from "./class-form";

describe("checkClassFields", () => {
  it("tidies spaces and accepts a complete class", () => {
    const result = checkClassFields({ name: "  10A   Physics ", yearGroup: "Year 10", subject: "Physics" });
    expect(result).toEqual({ ok: true, value: { name: "10A Physics", yearGroup: "Year 10", subject: "Physics" } });
  });
  it("gives a message per field that is blank or too long", () => {
    const result = checkClassFields({ name: " ", yearGroup: "Y".repeat(21), subject: "Physics" });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.fields.name?.[0]).toMatch(/Give the class name/);
    expect(result.fields.yearGroup?.[0]).toMatch(/20 characters or fewer/);
    expect(result.fields.subject).toBeUndefined();
  });
});

describe("changedClassFields", () => {
  const saved = { name: "10A Physics", yearGroup: "Year 10", subject: "Physics" };
  it("sends only what changed", () => {
    expect(changedClassFields(saved, { ...saved, name: "10B Physics" })).toEqual({ name: "10B Physics" });
    expect(changedClassFields(saved, saved)).toEqual({});
  });
});

describe("rosterCountLabel", () => {
  it("counts pupils in words", () => {
    expect(rosterCountLabel(0)).toBe("No pupils on the roster yet");
    expect(rosterCountLabel(1)).toBe("1 pupil on the roster");
    expect(rosterCountLabel(26)).toBe("26 pupils on the roster");
  });
});
