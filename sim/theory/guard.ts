/**
 * Input checks shared by the theory functions. A bad argument is a programming error or a
 * slider out of range, so it throws a RangeError naming the parameter and its unit instead of
 * returning NaN that would travel to the board.
 */

const describe = (value: number) => (Number.isNaN(value) ? "NaN" : String(value));

/** A finite number; `unit` is printed in the message ("m", "kg/m", "" for ratios). */
export function finite(name: string, value: number, unit: string): number {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number${unit ? ` of ${unit}` : ""} (got ${describe(value)})`);
  }
  return value;
}

/** A finite number > 0. */
export function positive(name: string, value: number, unit: string): number {
  finite(name, value, unit);
  if (!(value > 0)) throw new RangeError(`${name} must be greater than 0${unit ? ` ${unit}` : ""} (got ${describe(value)})`);
  return value;
}

/** A finite number ≥ 0. */
export function nonNegative(name: string, value: number, unit: string): number {
  finite(name, value, unit);
  if (!(value >= 0)) throw new RangeError(`${name} must be at least 0${unit ? ` ${unit}` : ""} (got ${describe(value)})`);
  return value;
}

/** Gravity: the default when omitted, otherwise a positive number of m/s². */
export function gravity(g: number | undefined, fallback: number): number {
  return g === undefined ? fallback : positive("g", g, "m/s²");
}
