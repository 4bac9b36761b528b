/**
 * Comparing a computed value with a figure printed in a source, "to the figures it gives".
 * Used by the theory tests; also handy for showing values to the same precision on the board.
 */

/** Number of significant figures written in a decimal such as "0.1364" (4), "0.500" (3), "2.5" (2). */
export function significantFiguresIn(printed: string): number {
  const match = /^[-+]?(\d*)(?:\.(\d*))?$/.exec(printed.trim());
  if (!match || (match[1] === "" && (match[2] ?? "") === "")) {
    throw new RangeError(`not a plain decimal: "${printed}"`);
  }
  const digits = (match[1] ?? "") + (match[2] ?? "");
  const significant = digits.replace(/^0+/, "");
  if (significant === "") throw new RangeError(`no significant figures in "${printed}"`);
  // Trailing zeros of an integer without a point ("1200") are ambiguous: count them, as written.
  return significant.length;
}

/** `value` rounded to `figures` significant figures (a number). */
export function roundToSignificant(value: number, figures: number): number {
  if (!Number.isInteger(figures) || figures < 1 || figures > 21) {
    throw new RangeError(`figures must be an integer from 1 to 21 (got ${figures})`);
  }
  return Number(value.toPrecision(figures));
}

/** True when `value`, rounded to as many significant figures as `printed` shows, equals it. */
export function matchesPrinted(value: number, printed: string): boolean {
  return roundToSignificant(value, significantFiguresIn(printed)) === Number(printed);
}
