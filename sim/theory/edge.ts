/**
 * Chains going over an edge: a chain falling from a heap at the edge of a table, and a straight
 * chain sliding off a frictionless table.
 */
import { STANDARD_G } from "./constants";
import { gravity, nonNegative, positive } from "./guard";

/**
 * Limiting a/g of a chain falling from a heap over an edge (dimensionless).
 * - inelastic: every link is jerked into motion with a fully inelastic pick-up: a = g/3.
 *   Source: A. Cayley, Proc. R. Soc. Lond. 8 (1857) [memory].
 * - conservative: energy is conserved in the transfer (the energy lost joining the moving part is
 *   regained on leaving the heap): a = g/2.
 *   Source [paper]: C. W. Wong & K. Yasui, "Falling chains", Am. J. Phys. 74, 490 (2006).
 * A rigid-link simulation should land between the two.
 */
export const HEAP_EDGE_ACCEL_RATIO = { inelastic: 1 / 3, conservative: 1 / 2 } as const;

export type HeapEdgeModel = keyof typeof HEAP_EDGE_ACCEL_RATIO;

export interface HeapEdgeInput {
  model: HeapEdgeModel;
  /** Length already hanging over the edge when released at rest, x0, m (≥ 0; 0 = the classic problem). */
  hanging0: number;
  /** Length hanging now, x ≥ x0 (x > 0), m. */
  hanging: number;
  g?: number;
}

/**
 * Speed and acceleration of a chain falling from a heap over an edge [derived].
 *
 * Hanging part x, moving at v; the heap at rest at the edge.
 * - inelastic (Cayley): momentum, d(λxv)/dt = λgx. With p = xv, d(p²)/dx = 2gx², so
 *   v² = 2g(x³ − x0³)/(3x²) and a = ½d(v²)/dx = (g/3)(1 + 2x0³/x³) → g/3.
 * - conservative (Wong & Yasui): energy, ½λxv² = ½λg(x² − x0²), so
 *   v² = g(x² − x0²)/x and a = (g/2)(1 + x0²/x²) → g/2.
 *
 * @returns speed in m/s, accel in m/s².
 * @throws RangeError when x0 < 0, x ≤ 0 or x < x0.
 */
export function heapEdgeFall(input: HeapEdgeInput): { speed: number; accel: number } {
  const x0 = nonNegative("hanging0", input.hanging0, "m");
  const x = positive("hanging", input.hanging, "m");
  if (x < x0) throw new RangeError(`hanging must be at least hanging0 = ${x0} m (got ${x} m)`);
  const g = gravity(input.g, STANDARD_G);
  if (input.model === "inelastic") {
    const r3 = (x0 / x) ** 3;
    return { speed: Math.sqrt(((2 * g * x) / 3) * (1 - r3)), accel: (g / 3) * (1 + 2 * r3) };
  }
  if (input.model === "conservative") {
    const r2 = (x0 / x) ** 2;
    return { speed: Math.sqrt(g * x * (1 - r2)), accel: (g / 2) * (1 + r2) };
  }
  throw new RangeError(`model must be "inelastic" or "conservative" (got ${String(input.model)})`);
}

export interface SlidingChainInput {
  /** Chain length L, m. */
  length: number;
  /** Length hanging over the edge at release, x0, m, 0 < x0 ≤ L. */
  hanging0: number;
  g?: number;
}

/**
 * Time for a straight chain released at rest on a frictionless table, x0 hanging over the edge,
 * to slide completely off, s: t = √(L/g)·ln[(L + √(L² − x0²))/x0].
 *
 * Source [textbook]: the whole chain moves together, λL·ẍ = λg·x, so x = x0·cosh(t√(g/L)), and
 * x = L at t = √(L/g)·arcosh(L/x0), which is the logarithm above. (Assumes the chain turns over the
 * edge without friction or lift-off.)
 *
 * @throws RangeError when L ≤ 0, x0 ≤ 0 (it would never start) or x0 > L.
 */
export function slidingChainTime(input: SlidingChainInput): number {
  const L = positive("length", input.length, "m");
  const x0 = positive("hanging0", input.hanging0, "m");
  if (x0 > L) throw new RangeError(`hanging0 must be at most the chain length ${L} m (got ${x0} m)`);
  const g = gravity(input.g, STANDARD_G);
  return Math.sqrt(L / g) * Math.log((L + Math.sqrt((L - x0) * (L + x0))) / x0);
}
