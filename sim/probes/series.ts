/** A probe's time series, sampled at a fixed rate during a run (SI units). */
export interface Series {
  name: string;
  unit: string;
  label: string;
  t: number[];
  v: number[];
}

export const newSeries = (name: string, label: string, unit: string): Series => ({ name, label, unit, t: [], v: [] });

/** A settled value: mean over a window, with a one-standard-error uncertainty. */
export interface Settled {
  value: number;
  uncertainty: number;
  unit: string;
  /** Over what the value was taken, in words (shown beside it). */
  basis: string;
}

/**
 * Mean of the samples with t in [from, to], and its standard error from block averages
 * (five blocks): neighbouring samples of a run are correlated, so the plain standard error
 * of the samples would be far too small. Block averaging is common practice in simulation
 * analysis, not a result from a paper.
 */
export function settleOver(series: Series, from: number, to: number, basis: string): Settled {
  const values: number[] = [];
  for (let i = 0; i < series.t.length; i++) {
    const t = series.t[i]!;
    const v = series.v[i]!;
    if (t >= from && t <= to && Number.isFinite(v)) values.push(v);
  }
  return settleValues(values, series.unit, basis);
}

export function settleValues(values: readonly number[], unit: string, basis: string): Settled {
  if (values.length === 0) return { value: Number.NaN, uncertainty: Number.NaN, unit, basis };
  const mean = values.reduce((s, v) => s + v, 0) / values.length;
  const blocks = Math.min(5, values.length);
  const means: number[] = [];
  for (let b = 0; b < blocks; b++) {
    const lo = Math.floor((b * values.length) / blocks);
    const hi = Math.floor(((b + 1) * values.length) / blocks);
    let sum = 0;
    for (let i = lo; i < hi; i++) sum += values[i]!;
    means.push(sum / Math.max(1, hi - lo));
  }
  let spread = 0;
  for (const m of means) spread += (m - mean) * (m - mean);
  const uncertainty = blocks > 1 ? Math.sqrt(spread / (blocks - 1) / blocks) : Number.NaN;
  return { value: mean, uncertainty, unit, basis };
}
