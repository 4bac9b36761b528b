import { describe, expect, it } from "vitest";
import { closenessOf } from "./lesson-review";

// Relative error as defined on `Closeness`: e = (prediction − result) / |result|.
describe("how close a prediction was to the result", () => {
  it("gives the signed and absolute relative error: 12 against 10 is 20 % too high, 8 is 20 % too low", () => {
    expect(closenessOf(12, 10)).toEqual({ signedRelativeError: expect.closeTo(0.2, 12), absoluteRelativeError: expect.closeTo(0.2, 12), within10: false });
    expect(closenessOf(8, 10)).toEqual({ signedRelativeError: expect.closeTo(-0.2, 12), absoluteRelativeError: expect.closeTo(0.2, 12), within10: false });
  });

  it("counts an answer exactly 10 % away as within 10 %, and one just beyond as not", () => {
    expect(closenessOf(11, 10)!.within10).toBe(true);
    expect(closenessOf(9, 10)!.within10).toBe(true);
    expect(closenessOf(11.001, 10)!.within10).toBe(false);
    expect(closenessOf(8.999, 10)!.within10).toBe(false);
  });

  it("divides by the size of a negative result, so the sign still says too high or too low", () => {
    // −0.45 is above −0.5 by 0.05: +10 % of |−0.5|.
    const c = closenessOf(-0.45, -0.5)!;
    expect(c.signedRelativeError).toBeCloseTo(0.1, 12);
    expect(c.within10).toBe(true);
    expect(closenessOf(-0.7, -0.5)!.signedRelativeError).toBeCloseTo(-0.4, 12);
  });

  it("has no relative error against a result of zero: only an answer of 0 is within", () => {
    expect(closenessOf(0, 0)).toEqual({ signedRelativeError: null, absoluteRelativeError: null, within10: true });
    expect(closenessOf(0.01, 0)).toEqual({ signedRelativeError: null, absoluteRelativeError: null, within10: false });
  });

  it("gives nothing for numbers that are not finite", () => {
    expect(closenessOf(Number.NaN, 10)).toBeNull();
    expect(closenessOf(10, Number.POSITIVE_INFINITY)).toBeNull();
  });
});
