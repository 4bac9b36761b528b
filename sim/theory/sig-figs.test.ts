import { describe, expect, it } from "vitest";
import { matchesPrinted, roundToSignificant, significantFiguresIn } from "./sig-figs";

describe("comparing with printed figures", () => {
  it("counts the significant figures a decimal shows", () => {
    expect(significantFiguresIn("3.339")).toBe(4);
    expect(significantFiguresIn("0.1364")).toBe(4);
    expect(significantFiguresIn("0.500")).toBe(3);
    expect(significantFiguresIn("0.087")).toBe(2);
    expect(significantFiguresIn("2.5")).toBe(2);
    expect(significantFiguresIn("1.7848")).toBe(5);
  });

  it("refuses text that is not a plain decimal", () => {
    expect(() => significantFiguresIn("abc")).toThrow(RangeError);
    expect(() => significantFiguresIn("0.000")).toThrow(RangeError);
    expect(() => roundToSignificant(1, 0)).toThrow(RangeError);
  });

  it("accepts a value that rounds to the printed figure and rejects one that does not", () => {
    expect(matchesPrinted(3.33882, "3.339")).toBe(true);
    expect(matchesPrinted(3.3384, "3.339")).toBe(false); // rounds to 3.338
    expect(matchesPrinted(3.3396, "3.339")).toBe(false); // rounds to 3.340
    expect(matchesPrinted(0.49999999999999994, "0.500")).toBe(true);
    expect(roundToSignificant(0.0869565, 2)).toBe(0.087);
  });
});
