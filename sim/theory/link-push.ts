/**
 * Why a pile can push: a link lying on a hard surface is jerked up at one point and, if its
 * mass distribution allows, levers against the surface on the other side.
 *
 * Source: J. S. Biggins & M. Warner, Proc. R. Soc. A 470: 20130689 (2014) [paper: the mechanism];
 * the formulas below are [derived] (physics-reference.md §1, "Link geometry → pot push").
 */
import { nonNegative, positive } from "./guard";

export interface LinkGeometry {
  /** Distance from the link's centre of mass to the point where the chain pulls, m (≥ 0). */
  a: number;
  /** Distance from the centre of mass to the contact with the surface, on the other side, m (≥ 0). */
  b: number;
  /** Radius of gyration about the centre of mass, m (> 0): moment of inertia = m·k². */
  k: number;
}

function geometry({ a, b, k }: LinkGeometry): LinkGeometry {
  return { a: nonNegative("a", a, "m"), b: nonNegative("b", b, "m"), k: positive("k", k, "m") };
}

/**
 * Surface impulse per unit pull impulse, r = N/J (dimensionless).
 *
 * [derived] Upward positive; the pull J acts at +a, the contact at −b. After the impulses
 *   m·v_cm = J + N,   m·k²·ω = J·a − N·b.
 * A plastic contact that may not move down ends at rest: v_cm − ω·b = 0, so
 *   (J + N)k² = (J·a − N·b)·b  ⇒  N/J = (a·b − k²)/(k² + b²).
 * When a·b ≤ k² that would need N ≤ 0; a surface cannot pull, so N = 0 and the contact lifts off.
 * Uniform rod jerked at one end (a = b = L/2, k² = L²/12): N/J = 1/2.
 */
export function pushRatio(link: LinkGeometry): number {
  const { a, b, k } = geometry(link);
  const k2 = k * k;
  return Math.max(0, (a * b - k2) / (k2 + b * b));
}

/**
 * Pot-push coefficient from the push ratio: α = r/(1 + r).
 *
 * [derived] Each link leaves with momentum J + N; the chain supplies J and the pile N, so the
 * pile's share of the momentum flux λv² is N/(J + N) = r/(1 + r).
 */
export function alphaFromPushRatio(r: number): number {
  nonNegative("r", r, "");
  return r / (1 + r);
}

/**
 * Upper bound on α for links of this geometry, picked up one at a time from a hard flat pile.
 * Ideal uniform rods give 1/3 (hence h2/h1 = 1/2 with β = 0); real chains give far less.
 */
export function idealAlphaBound(link: LinkGeometry): number {
  return alphaFromPushRatio(pushRatio(link));
}

export interface LinkKickInput extends LinkGeometry {
  /** Link mass, kg. */
  mass: number;
  /** Upward pull impulse J applied at distance a from the centre, N·s (≥ 0). */
  impulse: number;
}

export interface LinkKick {
  /** Upward velocity of the centre of mass just after the pick-up, m/s: (J + N)/m. */
  vCm: number;
  /** Angular velocity just after, rad/s, positive when it lifts the pulled end: (J·a − N·b)/(m·k²). */
  omega: number;
  /** Impulse from the surface N, N·s (0 when the contact lifts off). */
  surfaceImpulse: number;
}

/** Motion of a link just after it is jerked off a hard surface [derived, as {@link pushRatio}]. */
export function linkKick(input: LinkKickInput): LinkKick {
  const mass = positive("mass", input.mass, "kg");
  const J = nonNegative("impulse", input.impulse, "N·s");
  const { a, b, k } = geometry(input);
  const N = pushRatio({ a, b, k }) * J;
  return { vCm: (J + N) / mass, omega: (J * a - N * b) / (mass * k * k), surfaceImpulse: N };
}
