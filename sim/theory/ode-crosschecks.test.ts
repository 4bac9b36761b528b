/**
 * Closed forms checked against independent numerical integration of the equations of motion they
 * come from, with `odex` (E. Hairer & G. Wanner's ODEX extrapolation integrator, a dev dependency
 * that shares no code with sim/). Each block writes out the equation it integrates and where it
 * comes from, so the check does not reuse the closed form it tests.
 */
import { describe, expect, it } from "vitest";
import { catenaryFromSpan } from "./catenary";
import { STANDARD_G } from "./constants";
import { heapEdgeFall, slidingChainTime } from "./edge";
import { foldedChainAccel, foldedChainSpeedSquared } from "./folded";
import { noFloorGrowth } from "./fountain";

// Loaded dynamically: see tests/types/odex.d.ts for why a static import would not type-check.
const ODEX = "odex";
const { Solver } = (await import(/* @vite-ignore */ ODEX)) as Odex.Module;
type Derivative = Odex.Derivative;

const g = STANDARD_G;

function solver(n: number): Odex.Solver {
  const s = new Solver(n);
  s.absoluteTolerance = 1e-12;
  s.relativeTolerance = 1e-12;
  s.maxSteps = 100_000;
  return s;
}

/**
 * Integrate y' = f(t, y) from t = 0 until event(y) first reaches 0 from below; the crossing is
 * located by bisection on odex's dense output. Returns the time and state there.
 */
function integrateUntil(f: Derivative, y0: number[], tMax: number, event: (y: number[]) => number) {
  const s = solver(y0.length);
  s.denseOutput = true;
  let hit: { t: number; y: number[] } | undefined;
  s.solve(f, 0, y0, tMax, (nr, tOld, t, y, dense) => {
    if (nr === 1 || event(y) < 0 || !dense) return;
    const at = (time: number) => y0.map((_, i) => dense(i, time));
    let lo = tOld;
    let hi = t;
    for (let i = 0; i < 200 && hi - lo > 0; i++) {
      const mid = 0.5 * (lo + hi);
      if (mid === lo || mid === hi) break;
      if (event(at(mid)) < 0) lo = mid;
      else hi = mid;
    }
    hit = { t: hi, y: at(hi) };
    return false;
  });
  if (!hit) throw new Error("event not reached before tMax");
  return hit;
}

describe("folded (U) chain against its equation of motion (Calkin & March, Am. J. Phys. 57, 154, 1989)", () => {
  // Derivation from energy conservation: free end fallen x, chain length L. Fixed arm (L + x)/2 at
  // rest, falling arm (L − x)/2 moving at ẋ. Kinetic energy T = ¼λ(L − x)ẋ². Potential energy, fixed
  // arm centred at −(L + x)/4 and falling arm (from −x to −(L + x)/2) centred at −(L + 3x)/4:
  //   V = −λg[(L + x)² + (L − x)(L + 3x)]/8 = −λg(L² + 2Lx − x²)/4.
  // d(T + V)/dt = 0:  ¼λ[−ẋ³ + 2(L − x)ẋẍ] − ½λg(L − x)ẋ = 0  ⇒  ẍ = g + ẋ²/(2(L − x)).
  // This is integrated in time from rest; the closed forms are functions of x only.
  const L = 1.5;
  const f: Derivative = (_t, [x, v]) => [v!, g + v! ** 2 / (2 * (L - x!))];

  it.each([0.25, 0.5, 0.75])("at x/L = %s the integrated speed and acceleration match the closed forms", (ratio) => {
    const { y } = integrateUntil(f, [0, 0], 10, ([x]) => x! - ratio * L);
    const [x, v] = y as [number, number];
    expect(x / L).toBeCloseTo(ratio, 10);
    expect(v ** 2 / foldedChainSpeedSquared({ length: L, fallen: x })).toBeCloseTo(1, 8);
    const [, accel] = f(0, [x, v]) as [number, number];
    expect(accel / foldedChainAccel({ length: L, fallen: x })).toBeCloseTo(1, 8);
  });
});

describe("sliding chain against x'' = g·x/L ([textbook])", () => {
  // Whole chain (mass λL) moves together, pulled by the hanging weight λgx: λL·ẍ = λg·x.
  it.each([
    { L: 1, x0: 1 / 3, gravity: 9.8 },
    { L: 0.6, x0: 0.05, gravity: 9.81 },
  ])("L = $L m, x0 = $x0 m: the integrated time to slide off matches", ({ L, x0, gravity }) => {
    const f: Derivative = (_t, [x, v]) => [v!, (gravity * x!) / L];
    const { t } = integrateUntil(f, [x0, 0], 10, ([x]) => x! - L);
    expect(t / slidingChainTime({ length: L, hanging0: x0, g: gravity })).toBeCloseTo(1, 9);
  });

  it("reproduces the printed 0.563 s from the integration alone (L = 1 m, x0 = L/3, g = 9.8 m/s²)", () => {
    const f: Derivative = (_t, [x, v]) => [v!, 9.8 * x!];
    expect(integrateUntil(f, [1 / 3, 0], 10, ([x]) => x! - 1).t.toPrecision(3)).toBe("0.563");
  });
});

describe("chain falling from a heap over an edge against its equations of motion", () => {
  const x0 = 0.01;

  it("inelastic pick-up (Cayley 1857 [memory]): tends to g/3", () => {
    // Momentum of the hanging part, picking up links from rest: d(xv)/dt = gx ⇒ v̇ = g − v²/x.
    const f: Derivative = (_t, [x, v]) => [v!, g - v! ** 2 / x!];
    for (const target of [0.02, 0.1, 1]) {
      const { y } = integrateUntil(f, [x0, 0], 100, ([x]) => x! - target);
      const [x, v] = y as [number, number];
      const theory = heapEdgeFall({ model: "inelastic", hanging0: x0, hanging: x });
      expect(v / theory.speed).toBeCloseTo(1, 8);
      expect(f(0, [x, v])[1]! / theory.accel).toBeCloseTo(1, 8);
    }
    const far = integrateUntil(f, [x0, 0], 100, ([x]) => x! - 100 * x0).y as [number, number];
    expect(f(0, far)[1]! / g).toBeCloseTo(1 / 3, 5);
  });

  it("conservative pick-up (Wong & Yasui, Am. J. Phys. 74, 490, 2006): tends to g/2", () => {
    // Energy ½xv² − ½gx² constant: ½v³ + x·v·v̇ − g·x·v = 0 ⇒ v̇ = g − v²/(2x).
    const f: Derivative = (_t, [x, v]) => [v!, g - v! ** 2 / (2 * x!)];
    for (const target of [0.02, 0.1, 1]) {
      const { y } = integrateUntil(f, [x0, 0], 100, ([x]) => x! - target);
      const [x, v] = y as [number, number];
      const theory = heapEdgeFall({ model: "conservative", hanging0: x0, hanging: x });
      expect(v / theory.speed).toBeCloseTo(1, 8);
      expect(f(0, [x, v])[1]! / theory.accel).toBeCloseTo(1, 8);
    }
    const far = integrateUntil(f, [x0, 0], 100, ([x]) => x! - 1000 * x0).y as [number, number];
    expect(f(0, far)[1]! / g).toBeCloseTo(1 / 2, 5);
  });
});

describe("fountain with no floor against its momentum balance (Biggins, EPL 106, 44001, 2014)", () => {
  // Free end a depth z below the pot, whole moving chain at speed v, pot push αλv², arch neglected:
  //   λz·v̇ = λgz − (1 − α)λv²  (see fountain.ts). Started from rest with a short end hanging, the
  // motion should settle onto constant acceleration g/(3 − 2α), with αv²/(gz) → 2α/(3 − 2α).
  it.each([0, 0.12, 1 / 3])("α = %s: the integrated end settles onto the closed-form acceleration and rise", (alpha) => {
    const z0 = 1e-3;
    const f: Derivative = (_t, [z, v]) => [v!, g - ((1 - alpha) * v! ** 2) / z!];
    const { y } = integrateUntil(f, [z0, 0], 100, ([z]) => z! - 1e4 * z0);
    const [z, v] = y as [number, number];
    const { accelRatio, riseRatio } = noFloorGrowth(alpha);
    expect(f(0, [z, v])[1]! / g / accelRatio).toBeCloseTo(1, 6);
    if (alpha > 0) expect((alpha * v ** 2) / (g * z) / riseRatio).toBeCloseTo(1, 6);
  });
});

describe("catenary against a shooting solution of the hanging-chain equation ([textbook])", () => {
  // Force balance on an element with horizontal tension H = λga: y'' = √(1 + y'²)/a, and arc length
  // s' = √(1 + y'²). For a trial a, shoot from (0, 0) with slope tan θ0 and bisect θ0 until the
  // curve reaches the second support; then bisect a until the arc length equals the chain length
  // (longer chains need smaller a). Nothing here uses sinh, cosh or the closed-form solver.
  function integrateShape(a: number, slope0: number, xEnd: number) {
    const s = solver(3);
    return s.solve((_x, [, p]) => {
      const w = Math.sqrt(1 + p! ** 2);
      return [p!, w / a, w];
    }, 0, [0, slope0, 0], xEnd).y as [number, number, number];
  }

  function shoot(span: number, length: number, dh: number) {
    const slopeFor = (a: number) => {
      let lo = -Math.PI / 2 + 1e-9;
      let hi = Math.PI / 2 - 1e-9;
      for (let i = 0; i < 60; i++) {
        const mid = 0.5 * (lo + hi);
        if (integrateShape(a, Math.tan(mid), span)[0] < dh) lo = mid;
        else hi = mid;
      }
      return Math.tan(0.5 * (lo + hi));
    };
    let aLo = span / 20;
    let aHi = span * 20;
    for (let i = 0; i < 60; i++) {
      const a = Math.sqrt(aLo * aHi);
      if (integrateShape(a, slopeFor(a), span)[2] > length) aLo = a;
      else aHi = a;
    }
    const a = Math.sqrt(aLo * aHi);
    return { a, slope0: slopeFor(a) };
  }

  it.each([
    { span: 1.6, length: 2.0, dh: 0 },
    { span: 1.2, length: 2.0, dh: 0.5 },
    { span: 1.0, length: 1.3, dh: 0.8 }, // vertex outside the span
    { span: 2.0, length: 2.5, dh: -0.4 },
  ])("span $span m, length $length m, height difference $dh m", ({ span, length, dh }) => {
    const lambda = 0.3;
    const closed = catenaryFromSpan({ span, length, heightDifference: dh, lambda });
    const shot = shoot(span, length, dh);
    expect(closed.a / shot.a).toBeCloseTo(1, 7);
    for (const x of [0.25 * span, 0.5 * span, 0.75 * span]) {
      expect(closed.shape(x)).toBeCloseTo(integrateShape(shot.a, shot.slope0, x)[0], 7);
    }
    // Tension at the first support: T = H·√(1 + y'²) with H = λga.
    const H = lambda * g * shot.a;
    expect(closed.endTensions.first / (H * Math.sqrt(1 + shot.slope0 ** 2))).toBeCloseTo(1, 6);
  });
});
