/**
 * A chain hanging between two supports: the catenary.
 *
 * Source [textbook]: catenary (Huygens, Leibniz, Johann Bernoulli 1691):
 * y = y0 + a[cosh((x − x0)/a) − 1], a = H/(λg) with H the horizontal tension (the tension at the
 * vertex); tension anywhere T = H·cosh((x − x0)/a) = λg·(y − y0 + a).
 *
 * Coordinates: the first support at (0, 0), the second at (span, heightDifference), y up, metres.
 */
import { STANDARD_G } from "./constants";
import { finite, gravity, positive } from "./guard";

export interface CatenaryInput {
  /** Horizontal distance between the supports d, m (> 0). */
  span: number;
  /** Chain length ℓ, m; must exceed the straight-line distance between the supports. */
  length: number;
  /** Height of the second support above the first Δh, m (may be negative); default 0. */
  heightDifference?: number;
  /** Mass per unit length, kg/m. When omitted, tensions are per unit λ (N per kg/m). */
  lambda?: number;
  g?: number;
}

export interface Point {
  x: number;
  y: number;
}

export interface Catenary {
  /** Catenary parameter a = H/(λg), m. */
  a: number;
  /**
   * Sag, m: depth of the chain's lowest point below the lower support (for level supports,
   * a[cosh(d/2a) − 1]). Zero when the chain rises all the way from the lower support.
   */
  sag: number;
  /** Horizontal component of the tension, H = λga (the same everywhere), N or per unit λ. */
  horizontalTension: number;
  /** Tension at the chain's lowest point (= H when the vertex lies within the span), N or per unit λ. */
  lowestPointTension: number;
  /** Tension at the first (x = 0) and second (x = span) supports, N or per unit λ. */
  endTensions: { first: number; second: number };
  /** The larger end tension (at the higher support), N or per unit λ. */
  endTension: number;
  /** Lowest point of the chain itself (the vertex, or the lower support if the vertex is outside the span). */
  lowestPoint: Point;
  /** Vertex of the catenary curve; may lie outside [0, span] when the supports differ a lot in height. */
  vertex: Point;
  /** True when the vertex lies within the span, i.e. the chain dips below both supports or touches the lower one. */
  vertexInSpan: boolean;
  /** Height y of the chain at horizontal position x (0 ≤ x ≤ span), m. */
  shape: (x: number) => number;
  /** Tension at horizontal position x, N or per unit λ. */
  tension: (x: number) => number;
}

/** sinh(u)/u − 1, accurate also for small u (where the direct form loses digits). */
function sinhOverUMinusOne(u: number): number {
  if (u < 1e-2) {
    const u2 = u * u;
    return (u2 / 6) * (1 + (u2 / 20) * (1 + (u2 / 42) * (1 + u2 / 72)));
  }
  return Math.sinh(u) / u - 1;
}

/**
 * Solve for the catenary through two supports with a given chain length.
 *
 * With u = d/(2a), the length condition ℓ² − Δh² = (2a·sinh(d/2a))² becomes
 *   sinh(u)/u = √(ℓ² − Δh²)/d,
 * whose left side rises monotonically from 1 at u = 0. The root is bracketed (the upper end doubled
 * until it passes the target) and found by bisection to the last bit: slower than Newton but it
 * cannot diverge, and 60–100 halvings are nothing next to one simulation step.
 * The vertex then follows from Δh/ℓ = tanh((d − 2·x0)/(2a)), i.e. x0 = d/2 − a·atanh(Δh/ℓ).
 *
 * @throws RangeError when span ≤ 0, or length ≤ √(span² + Δh²) (the chain cannot reach), or the
 *   chain is so long relative to the span that a underflows (sinh(u)/u beyond double range).
 */
export function catenaryFromSpan(input: CatenaryInput): Catenary {
  const d = positive("span", input.span, "m");
  const length = positive("length", input.length, "m");
  const dh = input.heightDifference === undefined ? 0 : finite("heightDifference", input.heightDifference, "m");
  const lambda = input.lambda === undefined ? 1 : positive("lambda", input.lambda, "kg/m");
  const g = gravity(input.g, STANDARD_G);

  const chord = Math.hypot(d, dh);
  if (!(length > chord)) {
    throw new RangeError(
      `length must exceed the straight-line distance between the supports, ${chord} m (got ${length} m)`,
    );
  }
  // Target for sinh(u)/u − 1, written to avoid cancellation when the chain is nearly taut.
  const reach = Math.sqrt((length - dh) * (length + dh));
  const target = (reach - d) / d;

  let lo = 0;
  let hi = 1;
  while (sinhOverUMinusOne(hi) < target) {
    lo = hi;
    hi *= 2;
    if (hi > 700) throw new RangeError(`length ${length} m is too long for span ${d} m to solve in double precision`);
  }
  for (let i = 0; i < 200 && hi - lo > 0; i++) {
    const mid = 0.5 * (lo + hi);
    if (mid === lo || mid === hi) break;
    if (sinhOverUMinusOne(mid) < target) lo = mid;
    else hi = mid;
  }
  const u = 0.5 * (lo + hi);
  const a = d / (2 * u);

  const x0 = d / 2 - a * Math.atanh(dh / length);
  const y0 = -a * (Math.cosh(x0 / a) - 1);
  const shape = (x: number) => y0 + a * (Math.cosh((finite("x", x, "m") - x0) / a) - 1);
  const H = lambda * g * a;
  const tension = (x: number) => H * Math.cosh((finite("x", x, "m") - x0) / a);

  const vertexInSpan = x0 >= 0 && x0 <= d;
  const lowestPoint: Point = vertexInSpan ? { x: x0, y: y0 } : x0 < 0 ? { x: 0, y: 0 } : { x: d, y: dh };
  const first = tension(0);
  const second = tension(d);
  return {
    a,
    sag: Math.max(0, Math.min(0, dh) - lowestPoint.y),
    horizontalTension: H,
    lowestPointTension: vertexInSpan ? H : tension(lowestPoint.x),
    endTensions: { first, second },
    endTension: Math.max(first, second),
    lowestPoint,
    vertex: { x: x0, y: y0 },
    vertexInSpan,
    shape,
    tension,
  };
}
