import { describe, expect, it } from "vitest";
import { catenaryFromSpan } from "./catenary";
import { STANDARD_G } from "./constants";

describe("hanging chain: catenary ([textbook], Huygens, Leibniz, Johann Bernoulli 1691)", () => {
  it("level supports: the solution has the requested length, passes through both supports, sags symmetrically", () => {
    const c = catenaryFromSpan({ span: 1.6, length: 2.0 });
    // Length from the arc-length formula of the returned curve: ℓ = 2a·sinh(d/2a).
    expect(2 * c.a * Math.sinh(1.6 / (2 * c.a))).toBeCloseTo(2.0, 13);
    expect(c.shape(0)).toBeCloseTo(0, 13);
    expect(c.shape(1.6)).toBeCloseTo(0, 13);
    expect(c.vertex.x).toBeCloseTo(0.8, 13);
    expect(c.lowestPoint.y).toBeCloseTo(-c.sag, 13);
    expect(c.vertexInSpan).toBe(true);
    expect(c.endTensions.first).toBeCloseTo(c.endTensions.second, 12);
  });

  it("tension grows with height: T = λg(y − y_lowest + a), and the horizontal part is λga", () => {
    const lambda = 0.1;
    const c = catenaryFromSpan({ span: 1.6, length: 2.0, lambda });
    expect(c.lowestPointTension).toBeCloseTo(lambda * STANDARD_G * c.a, 12);
    expect(c.endTension).toBeCloseTo(lambda * STANDARD_G * (c.sag + c.a), 12);
    // Per unit λ when λ is omitted.
    expect(catenaryFromSpan({ span: 1.6, length: 2.0 }).horizontalTension).toBeCloseTo(STANDARD_G * c.a, 12);
  });

  it("a nearly taut chain matches the shallow-sag (parabola) approximation ℓ ≈ d + 8s²/(3d)", () => {
    // [textbook] For s ≪ d the catenary is a parabola; solving for s: s ≈ √(3d(ℓ − d)/8).
    // Exercises the small-u branch of the solver, where the direct sinh(u)/u loses digits.
    const d = 1;
    const c = catenaryFromSpan({ span: d, length: d + 1e-6 });
    expect(c.sag / Math.sqrt((3 * d * 1e-6) / 8)).toBeCloseTo(1, 5);
  });

  it("unequal heights: the sag is measured from the lower support, and mirroring the supports mirrors the curve", () => {
    const up = catenaryFromSpan({ span: 1.2, length: 2.0, heightDifference: 0.5 });
    const down = catenaryFromSpan({ span: 1.2, length: 2.0, heightDifference: -0.5 });
    expect(up.shape(1.2)).toBeCloseTo(0.5, 12);
    expect(up.a).toBeCloseTo(down.a, 12);
    expect(up.sag).toBeCloseTo(down.sag, 12);
    expect(up.vertex.x).toBeCloseTo(1.2 - down.vertex.x, 12);
    expect(up.sag).toBeCloseTo(0 - up.lowestPoint.y, 12); // lower support is the first one, at y = 0
    expect(up.endTension).toBe(up.endTensions.second); // higher support carries more
  });

  it("when the vertex falls outside the span, the lowest point is the lower support and the sag is zero", () => {
    const c = catenaryFromSpan({ span: 1.0, length: 1.3, heightDifference: 0.8 });
    expect(c.vertexInSpan).toBe(false);
    expect(c.vertex.x).toBeLessThan(0);
    expect(c.lowestPoint).toEqual({ x: 0, y: 0 });
    expect(c.sag).toBe(0);
    expect(c.lowestPointTension).toBeCloseTo(c.endTensions.first, 12);
    expect(c.lowestPointTension).toBeGreaterThan(c.horizontalTension);
  });

  it("refuses a chain that cannot reach between the supports", () => {
    expect(() => catenaryFromSpan({ span: 1.6, length: 1.6 })).toThrow(/length must exceed/);
    expect(() => catenaryFromSpan({ span: 1.2, length: 1.25, heightDifference: 0.5 })).toThrow(/length must exceed/);
    expect(() => catenaryFromSpan({ span: 0, length: 1 })).toThrow(/span/);
    expect(() => catenaryFromSpan({ span: 1, length: 2, heightDifference: Number.NaN })).toThrow(/heightDifference/);
  });
});
