import { describe, expect, it } from "vitest";
import { fountainSteady } from "./fountain";
import { alphaFromPushRatio, idealAlphaBound, linkKick, pushRatio } from "./link-push";

/** Solve a 3×3 linear system by Cramer's rule (test-only, written out so it shares nothing with the module). */
function solve3(A: number[][], rhs: number[]): number[] {
  const det = (m: number[][]) =>
    m[0]![0]! * (m[1]![1]! * m[2]![2]! - m[1]![2]! * m[2]![1]!) -
    m[0]![1]! * (m[1]![0]! * m[2]![2]! - m[1]![2]! * m[2]![0]!) +
    m[0]![2]! * (m[1]![0]! * m[2]![1]! - m[1]![1]! * m[2]![0]!);
  const D = det(A);
  return [0, 1, 2].map((col) => det(A.map((row, i) => row.map((v, j) => (j === col ? rhs[i]! : v)))) / D);
}

/**
 * Independent rigid-body computation of a pick-up with the contact held down (no lift-off assumed).
 * Unknowns v (centre of mass, up), ω (lifting the pulled end), N (surface impulse):
 *   m·v − N = J              (linear impulse)
 *   m·k²·ω + b·N = J·a       (angular impulse about the centre: J at +a, N at −b)
 *   v − b·ω = 0              (the contact point, at −b, ends at rest: plastic, no penetration)
 */
function pickUpWithContact(m: number, a: number, b: number, k: number, J: number) {
  const [v, omega, N] = solve3(
    [
      [m, 0, -1],
      [0, m * k * k, b],
      [1, -b, 0],
    ],
    [J, J * a, 0],
  );
  return { v: v!, omega: omega!, N: N! };
}

describe("pot push from link geometry ([derived], physics-reference §1)", () => {
  const L = 0.02; // a 2 cm rod
  const rod = { a: L / 2, b: L / 2, k: L / Math.sqrt(12) };

  it("uniform rod jerked at one end: the surface gives half the pull, α = 1/3, h2/h1 = 1/2", () => {
    expect(pushRatio(rod)).toBeCloseTo(0.5, 14);
    expect(alphaFromPushRatio(pushRatio(rod))).toBeCloseTo(1 / 3, 14);
    expect(idealAlphaBound(rod)).toBeCloseTo(1 / 3, 14);
    const alpha = idealAlphaBound(rod);
    expect(fountainSteady({ potHeight: 1, alpha, beta: 0 }).riseRatio).toBeCloseTo(0.5, 12);
  });

  it("matches an independent solution of the impulse equations for the rod and other shapes", () => {
    const m = 0.004;
    const J = 0.01;
    for (const link of [rod, { a: 0.012, b: 0.008, k: 0.005 }, { a: 0.01, b: 0.015, k: 0.004 }]) {
      const independent = pickUpWithContact(m, link.a, link.b, link.k, J);
      expect(independent.N).toBeGreaterThan(0); // these shapes do press on the surface
      const kick = linkKick({ mass: m, impulse: J, ...link });
      expect(kick.surfaceImpulse).toBeCloseTo(independent.N, 14);
      expect(kick.vCm).toBeCloseTo(independent.v, 12);
      expect(kick.omega).toBeCloseTo(independent.omega, 9);
      expect(pushRatio(link)).toBeCloseTo(independent.N / J, 12);
    }
  });

  it("the rod pivots about its resting end, so the pulled end moves at twice the centre's speed", () => {
    const kick = linkKick({ mass: 0.004, impulse: 0.01, ...rod });
    expect(kick.vCm - kick.omega * rod.b).toBeCloseTo(0, 12); // contact end at rest
    expect((kick.vCm + kick.omega * rod.a) / kick.vCm).toBeCloseTo(2, 12);
  });

  it("agrees with the falling-rod result: a uniform rod landing plastically on one end sends its far end to 3V/2", () => {
    // Source: A. Ruina's group, "Falling chain experiments" (Cornell web page): for a uniform rod with
    // small tilt θ and a plastic (sticking) impact, V_B+ = 3V/2. Same algebra as the pick-up: one end
    // ends at rest, and the impulse there is set by the same k² + b² denominator.
    // (1) Impulse equations: rod falling at V (down), impulse P up at the landing end (−b):
    //     v = −V + P/m, ω = −P·b/(m·k²), landing end v − ω·b = 0 ⇒ P = m·V·k²/(k² + b²);
    //     far end (+a): v + ω·a.
    const m = 0.004;
    const V = 2;
    const { a, b, k } = rod;
    const P = (m * V * k * k) / (k * k + b * b);
    const v = -V + P / m;
    const omega = (-P * b) / (m * k * k);
    expect(v - omega * b).toBeCloseTo(0, 12);
    const farEnd = v + omega * a;
    expect((-farEnd / V).toPrecision(4)).toBe("1.500");
    // (2) Angular momentum about the landing point, conserved through the impact, horizontal rod:
    //     m·V·(L/2) = (m·L²/3)·ω_after ⇒ far end speed ω_after·L = 3V/2.
    const omegaAfter = (m * V * (L / 2)) / ((m * L * L) / 3);
    expect(omegaAfter * L).toBeCloseTo(-farEnd, 12);
    // With a tilt θ the lever arm is (L/2)cosθ and the far end gets 3V·cosθ/2, which is why the
    // statement is for small θ; the horizontal rod is its limit.
  });

  it("dumbbells and beads on long threads get no push: the contact lifts off (Biggins, EPL 106, 44001, 2014)", () => {
    // Dumbbell: two equal point masses at ±L/2, pulled at one, resting on the other: k² = a·b exactly.
    expect(pushRatio({ a: L / 2, b: L / 2, k: L / 2 })).toBe(0);
    // Heavier ends than a dumbbell (k² > a·b), e.g. a rod with heavy end caps.
    expect(pushRatio({ a: L / 2, b: L / 2, k: 0.6 * L })).toBe(0);
    // Small bead on a long slack thread: the bead rests right under its centre (b ≈ 0).
    const bead = { a: 0.05, b: 0, k: 0.002 };
    expect(pushRatio(bead)).toBe(0);
    expect(idealAlphaBound(bead)).toBe(0);
    const kick = linkKick({ mass: 0.001, impulse: 0.005, ...bead });
    expect(kick.surfaceImpulse).toBe(0);
    // Without the surface's help the contact point moves up (lifts off) rather than down.
    const dumbbell = linkKick({ mass: 0.004, impulse: 0.01, a: L / 2, b: L / 2, k: 0.6 * L });
    expect(dumbbell.vCm - dumbbell.omega * (L / 2)).toBeGreaterThan(0);
    // And the unconstrained solution would need the surface to pull (N < 0), which it cannot.
    expect(pickUpWithContact(0.004, L / 2, L / 2, 0.6 * L, 0.01).N).toBeLessThan(0);
  });

  it("refuses negative distances, a zero radius of gyration and negative push ratios", () => {
    expect(() => pushRatio({ a: -1, b: 0.01, k: 0.01 })).toThrow(/a must/);
    expect(() => pushRatio({ a: 0.01, b: 0.01, k: 0 })).toThrow(/k must/);
    expect(() => alphaFromPushRatio(-0.1)).toThrow(RangeError);
    expect(() => linkKick({ mass: 0, impulse: 1, ...rod })).toThrow(/mass/);
  });
});
