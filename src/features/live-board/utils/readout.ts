import { DISPLAY_UNITS } from "@contracts/lesson-rules";

/** How many of `unit` make one of the SI unit (cm per m: 100); 1 when the unit is unknown. */
export function perSi(siUnit: string, unit: string): number {
  return DISPLAY_UNITS[siUnit]?.find((u) => u.unit === unit)?.perSi ?? 1;
}

/** Three significant figures, without trailing exponent noise: 0.1234 → "0.123"; whole numbers keep all their digits. */
export function threeFigures(value: number): string {
  if (!Number.isFinite(value)) return "–";
  if (value === 0) return "0";
  const digits = Math.max(0, 2 - Math.floor(Math.log10(Math.abs(value))));
  return value.toFixed(Math.min(digits, 6));
}

/** "12.3 ± 0.4 cm": the uncertainty to the same decimal places as the value. */
export function withUncertainty(value: number, uncertainty: number | null, unit: string): string {
  const v = threeFigures(value);
  const decimals = v.includes(".") ? v.split(".")[1]!.length : 0;
  const u = uncertainty !== null && Number.isFinite(uncertainty) ? ` ± ${Math.max(uncertainty, 0).toFixed(decimals)}` : "";
  return `${v}${u}${unit ? ` ${unit}` : ""}`;
}
