import type { Closeness, ReviewPrediction } from "@contracts/lesson-review";

export type SortDirection = "ascending" | "descending";
export interface SortState<K extends string> {
  key: K;
  direction: SortDirection;
}

/**
 * Sorts a copy of `rows` by the value `valueOf` gives. Stable (equal values keep their order);
 * empty values (null, NaN, "") go last in either direction, so "no answer" never tops a list.
 * Text compares case- and accent-insensitively with numbers in it read as numbers ("Sam 2" before "Sam 10").
 */
export function sortRows<T>(rows: readonly T[], valueOf: (row: T) => string | number | null, direction: SortDirection): T[] {
  const collator = new Intl.Collator("en", { sensitivity: "base", numeric: true });
  const sign = direction === "ascending" ? 1 : -1;
  const isEmpty = (v: string | number | null) => v === null || v === "" || (typeof v === "number" && Number.isNaN(v));
  return rows
    .map((row, index) => ({ row, index, value: valueOf(row) }))
    .sort((a, b) => {
      const ae = isEmpty(a.value);
      const be = isEmpty(b.value);
      if (ae || be) return ae && be ? a.index - b.index : ae ? 1 : -1;
      const cmp =
        typeof a.value === "number" && typeof b.value === "number"
          ? a.value - b.value
          : collator.compare(String(a.value), String(b.value));
      return cmp === 0 ? a.index - b.index : sign * cmp;
    })
    .map((x) => x.row);
}

/** Clicking a column's header: a new column sorts ascending; the same column flips. */
export function nextSort<K extends string>(current: SortState<K> | null, key: K): SortState<K> {
  if (current?.key === key) return { key, direction: current.direction === "ascending" ? "descending" : "ascending" };
  return { key, direction: "ascending" };
}

export type PredictionColumn = "pupil" | "round" | "answer" | "closeness" | "reason";

/** What each column of the predictions table sorts by: how close sorts by the size of the error. */
export function predictionSortValue(row: ReviewPrediction, key: PredictionColumn): string | number | null {
  switch (key) {
    case "pupil":
      return row.pupil;
    case "round":
      return row.round;
    case "answer":
      return row.value ?? row.choiceLabel;
    case "closeness":
      return row.closeness?.absoluteRelativeError ?? null;
    case "reason":
      return row.reason;
  }
}

export type RoundFilter = "all" | "1" | "2";

/** Rows whose pupil's name contains the search (any case, spaces at the ends ignored), in the chosen round. */
export function filterPredictions(rows: readonly ReviewPrediction[], search: string, round: RoundFilter): ReviewPrediction[] {
  const needle = search.trim().toLocaleLowerCase();
  return rows.filter((r) => (round === "all" || String(r.round) === round) && (!needle || r.pupil.toLocaleLowerCase().includes(needle)));
}

/** A number as people read it: up to 3 significant figures beyond the integer part, no trailing zeros. */
export function formatNumber(value: number): string {
  if (!Number.isFinite(value)) return "—";
  const abs = Math.abs(value);
  const rounded = abs >= 100 ? Math.round(value * 10) / 10 : Number(value.toPrecision(3));
  return rounded.toLocaleString("en-GB", { maximumFractionDigits: 6 }).replace("-", "−");
}

export const withUnit = (value: number, unit: string) => (unit ? `${formatNumber(value)} ${unit}` : formatNumber(value));

/**
 * How close, in words: "+12 % (too high)", "−5 % (within 10 %)". The sign is the relative
 * error's, (prediction − result)/|result|; null when there is nothing to compare with.
 */
export function formatCloseness(c: Closeness | null): string | null {
  if (!c) return null;
  if (c.signedRelativeError === null) return c.within10 ? "exactly right" : "result was 0";
  const pct = Math.round(c.signedRelativeError * 100);
  const signed = pct > 0 ? `+${pct} %` : pct < 0 ? `−${Math.abs(pct)} %` : "0 %";
  const words = c.within10 ? "within 10 %" : c.signedRelativeError > 0 ? "too high" : "too low";
  return `${signed} (${words})`;
}
