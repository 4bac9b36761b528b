/**
 * The folded (U) chain: both ends held level, one released; energy-conserving model.
 *
 * Sources [paper]: M. G. Calkin & R. H. March, "The dynamics of a falling chain. I",
 * Am. J. Phys. 57, 154 (1989); W. Tomaszewski, P. Pieranski & J.-C. Géminard,
 * "The motion of a freely falling chain tip", Am. J. Phys. 74, 776 (2006) [volume from memory].
 *
 * x = distance the free end has fallen below the support, L = chain length, 0 ≤ x < L.
 * The fixed arm has length (L + x)/2 and is at rest; the falling arm (L − x)/2 moves at v.
 * Energy (λ, g): ¼λ(L − x)v² = loss of potential energy = ¼λg·x(2L − x)
 *   ⇒ v² = g·x(2L − x)/(L − x),  a = ½·d(v²)/dx = g[1 + x(2L − x)/(2(L − x)²)].
 * The speed diverges as x → L; real chains (and simulations) depart from it near the end.
 */
import { STANDARD_G } from "./constants";
import { gravity, nonNegative, positive } from "./guard";

export interface FoldedInput {
  /** Chain length L, m. */
  length: number;
  /** Distance x the free end has fallen, m, 0 ≤ x < L. */
  fallen: number;
  g?: number;
}

function validated(input: FoldedInput) {
  const L = positive("length", input.length, "m");
  const x = nonNegative("fallen", input.fallen, "m");
  if (!(x < L)) throw new RangeError(`fallen must be below the chain length ${L} m (got ${x} m)`);
  return { L, x, g: gravity(input.g, STANDARD_G) };
}

/** Square of the free end's speed, m²/s²: v² = g·x(2L − x)/(L − x). */
export function foldedChainSpeedSquared(input: FoldedInput): number {
  const { L, x, g } = validated(input);
  return (g * x * (2 * L - x)) / (L - x);
}

/** Free end's downward acceleration, m/s²: g[1 + x(2L − x)/(2(L − x)²)] (exceeds g for x > 0). */
export function foldedChainAccel(input: FoldedInput): number {
  const { L, x, g } = validated(input);
  return g * (1 + (x * (2 * L - x)) / (2 * (L - x) ** 2));
}
