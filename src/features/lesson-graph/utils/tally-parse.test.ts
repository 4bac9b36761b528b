import { describe, expect, it } from "vitest";
import { LESSON_LIMITS } from "@contracts/lesson-rules";
import { countsProblem, parseCount, parseTypedValues, valuesProblem } from "./tally-parse";

describe("reading a typed list of values", () => {
  it("spaces, new lines, semicolons and comma-space all separate", () => {
    expect(parseTypedValues("12 15\n20;18, 9 ,7").values).toEqual([12, 15, 20, 18, 9, 7]);
    expect(parseTypedValues("12,15,20,18").values).toEqual([12, 15, 20, 18]);
    expect(parseTypedValues("  ").values).toEqual([]);
  });

  it("decimal commas are read when the values are separated otherwise", () => {
    expect(parseTypedValues("12,5\n13,0\n14,5").values).toEqual([12.5, 13, 14.5]);
    expect(parseTypedValues("12,5 13 14.25").values).toEqual([12.5, 13, 14.25]);
    expect(parseTypedValues("12,5; 7").values).toEqual([12.5, 7]);
  });

  it("a lone 12,5 is ambiguous and is reported, not guessed", () => {
    const parsed = parseTypedValues("12,5");
    expect(parsed.ambiguous).toBe("12,5");
    expect(valuesProblem(parsed)).toBe("“12,5” could be one value (12.5) or two (12 and 5). Write 12.5 for one value, or put a space between two.");
  });

  it("says which tokens were not understood", () => {
    const parsed = parseTypedValues("12 cm, 15, about20, −3");
    expect(parsed.values).toEqual([12, 15, -3]);
    expect(parsed.notUnderstood).toEqual(["cm", "about20"]);
    expect(valuesProblem(parsed)).toBe("These are not numbers: “cm”, “about20”. Type numbers only, without units.");
  });

  it("refuses an empty list and more values than a lesson keeps", () => {
    expect(valuesProblem(parseTypedValues(""))).toBe("Type at least one value.");
    const many = Array.from({ length: LESSON_LIMITS.tallyValues + 1 }, (_, i) => i).join(" ");
    expect(valuesProblem(parseTypedValues(many))).toBe(`That is ${LESSON_LIMITS.tallyValues + 1} values; at most ${LESSON_LIMITS.tallyValues} can be saved.`);
    expect(valuesProblem(parseTypedValues("1 2 3"))).toBeNull();
  });
});

describe("counts per choice", () => {
  it("reads whole numbers, treats an empty box as 0, refuses anything else", () => {
    expect(parseCount(" 12 ")).toBe(12);
    expect(parseCount("")).toBe(0);
    expect(parseCount("2.5")).toBeNull();
    expect(parseCount("-1")).toBeNull();
    expect(parseCount("lots")).toBeNull();
  });

  it("checks the limits in plain words", () => {
    expect(countsProblem([3, 0, 4])).toBeNull();
    expect(countsProblem([0, 0])).toBe("Every count is 0: count the hands for at least one choice.");
    expect(countsProblem([LESSON_LIMITS.tallyCount + 1, 0])).toBe(`Each count can be at most ${LESSON_LIMITS.tallyCount}.`);
    expect(countsProblem([1.5, 0])).toBe("Each count is a whole number, 0 or more.");
  });
});
