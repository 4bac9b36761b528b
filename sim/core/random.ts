import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";

/** A seeded source of numbers in [0, 1): the same seed gives the same run. */
export interface Random {
  next(): number;
  /** Uniform in [lo, hi). */
  between(lo: number, hi: number): number;
}

export function seededRandom(seed: number): Random {
  const rng = xoroshiro128plus(seed | 0);
  const next = () => uniformFloat64(rng);
  return { next, between: (lo, hi) => lo + (hi - lo) * next() };
}
