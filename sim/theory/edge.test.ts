import { describe, expect, it } from "vitest";
import { HEAP_EDGE_ACCEL_RATIO, heapEdgeFall, slidingChainTime } from "./edge";

describe("straight chain sliding off a frictionless table ([textbook])", () => {
  it("L = 1 m, x0 = L/3, g = 9.8 m/s² → t = 0.563 s (physics-reference §2)", () => {
    expect(slidingChainTime({ length: 1, hanging0: 1 / 3, g: 9.8 }).toPrecision(3)).toBe("0.563");
  });

  it("is the time at which x0·cosh(t√(g/L)) reaches L", () => {
    const L = 0.7;
    const x0 = 0.1;
    const t = slidingChainTime({ length: L, hanging0: x0 });
    expect(x0 * Math.cosh(t * Math.sqrt(9.81 / L))).toBeCloseTo(L, 12);
    expect(slidingChainTime({ length: L, hanging0: L })).toBe(0);
  });

  it("refuses a start with nothing hanging, or more than the chain", () => {
    expect(() => slidingChainTime({ length: 1, hanging0: 0 })).toThrow(/hanging0/);
    expect(() => slidingChainTime({ length: 1, hanging0: 1.1 })).toThrow(/hanging0/);
  });
});

describe("chain falling from a heap over an edge (Cayley 1857 [memory]; Wong & Yasui, Am. J. Phys. 74, 490, 2006)", () => {
  it("starting from nothing hanging, falls at g/3 if pick-up is inelastic and g/2 if it conserves energy", () => {
    expect(HEAP_EDGE_ACCEL_RATIO).toEqual({ inelastic: 1 / 3, conservative: 1 / 2 });
    for (const x of [0.1, 1, 5]) {
      expect(heapEdgeFall({ model: "inelastic", hanging0: 0, hanging: x, g: 10 }).accel).toBeCloseTo(10 / 3, 12);
      expect(heapEdgeFall({ model: "conservative", hanging0: 0, hanging: x, g: 10 }).accel).toBeCloseTo(5, 12);
    }
  });

  it("inelastic pick-up: momentum balance d(xv)/dt = gx holds for the returned speed and acceleration", () => {
    // d(xv)/dt = v² + x·a; checked at several x with a start x0 > 0.
    const g = 9.81;
    for (const x of [0.12, 0.3, 2]) {
      const { speed, accel } = heapEdgeFall({ model: "inelastic", hanging0: 0.1, hanging: x });
      expect(speed ** 2 + x * accel).toBeCloseTo(g * x, 12);
    }
  });

  it("conservative pick-up: the energy ½xv² − ½gx² stays at its starting value", () => {
    const g = 9.81;
    const x0 = 0.1;
    for (const x of [0.12, 0.3, 2]) {
      const { speed } = heapEdgeFall({ model: "conservative", hanging0: x0, hanging: x });
      expect(0.5 * x * speed ** 2 - 0.5 * g * x * x).toBeCloseTo(-0.5 * g * x0 * x0, 12);
    }
  });

  it("refuses a hanging length below the starting one", () => {
    expect(() => heapEdgeFall({ model: "inelastic", hanging0: 0.5, hanging: 0.2 })).toThrow(/hanging/);
    expect(() => heapEdgeFall({ model: "inelastic", hanging0: 0, hanging: 0 })).toThrow(/hanging/);
  });
});
