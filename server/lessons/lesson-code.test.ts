import { describe, expect, it } from "vitest";
import { LESSON_CODE_ALPHABET, LESSON_CODE_LENGTH, isLessonCode } from "../contracts/lesson-rules";
import { newLessonCode } from "./lesson-code";

describe("newLessonCode", () => {
  it("makes 6-character codes from the unambiguous alphabet only", () => {
    for (let i = 0; i < 2000; i++) {
      const code = newLessonCode();
      expect(code).toHaveLength(LESSON_CODE_LENGTH);
      expect(isLessonCode(code)).toBe(true);
    }
  });

  it("uses every letter of the alphabet and no other", () => {
    const seen = new Set<string>();
    for (let i = 0; i < 2000; i++) for (const ch of newLessonCode()) seen.add(ch);
    expect([...seen].sort().join("")).toBe([...LESSON_CODE_ALPHABET].sort().join(""));
  });

  it("maps each random pick to the alphabet position it names", () => {
    const picks = [0, 19, 1, 2, 3, 4];
    let i = 0;
    const code = newLessonCode((max) => {
      expect(max).toBe(LESSON_CODE_ALPHABET.length);
      return picks[i++]!;
    });
    expect(code).toBe("A9CEFH");
  });

  it("rarely repeats: 5000 codes from a space of 64 million are (almost surely) all different", () => {
    const codes = new Set(Array.from({ length: 5000 }, () => newLessonCode()));
    // Birthday bound: P(any repeat) ≈ 5000²/(2·20⁶) ≈ 0.2 %; allow one repeat to keep this from flaking.
    expect(codes.size).toBeGreaterThanOrEqual(4999);
  });
});
