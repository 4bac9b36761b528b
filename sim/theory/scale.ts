/**
 * A vertical chain released with its lower end just above a scale pan.
 */
import { STANDARD_G } from "./constants";
import { gravity, nonNegative, positive } from "./guard";

/**
 * While the chain falls, the pan reads this many times the weight already on it (dimensionless).
 * Source [textbook]; see {@link fallingChainScaleReading}.
 */
export const FALLING_CHAIN_READING_RATIO = 3;

export interface ScaleInput {
  /** Mass per unit length, kg/m. */
  lambda: number;
  /** Chain length L, m. */
  length: number;
  /** Length that has already landed on the pan x (= distance the top has fallen), m, ≥ 0. */
  fallen: number;
  g?: number;
}

/**
 * Scale reading for a chain falling freely onto a pan, N.
 *
 * Source [textbook], classic variable-mass problem. With the top falling freely, v² = 2gx; the pan
 * holds the weight of the landed part λgx and stops the momentum flux λv² = 2λgx, so it reads
 * 3λgx while x < L, then λgL once the last link has landed.
 * Caveat [paper]: E. Hamm & J.-C. Géminard, "The weight of a falling chain, revisited",
 * Am. J. Phys. 78, 828 (2010): real chains fall slightly faster than free fall, because links
 * landing on the pan can pull on the chain above; measured readings depart from this idealisation.
 *
 * @throws RangeError when λ ≤ 0, L ≤ 0, x < 0 or g ≤ 0.
 */
export function fallingChainScaleReading(input: ScaleInput): number {
  const lambda = positive("lambda", input.lambda, "kg/m");
  const length = positive("length", input.length, "m");
  const fallen = nonNegative("fallen", input.fallen, "m");
  const g = gravity(input.g, STANDARD_G);
  return fallen < length ? FALLING_CHAIN_READING_RATIO * lambda * g * fallen : lambda * g * length;
}
