import Papa from "papaparse";
import { checkBenchValue, type BenchValueProblem, type HeightUnit } from "@contracts/bench";

/**
 * Reading bench runs from a CSV file before anything is saved: columns pot height, rise,
 * optional speed and note (by heading, or in that order without one), in the units the teacher
 * chose. Every row is judged with the API's own checks, so the preview says what the server will.
 */
export const BENCH_CSV_MAX_BYTES = 200 * 1024;

const HEADINGS = {
  potHeight: /^(pot height|pot|h1|drop|height)\b/i,
  rise: /^(rise|h2|leap)\b/i,
  speed: /^(chain speed|speed|v)\b/i,
  note: /^(note|notes|comment)\b/i,
} as const;
type Column = keyof typeof HEADINGS;

export const VALUE_PROBLEM_LABELS: Record<BenchValueProblem, string> = {
  missing: "Missing value",
  not_a_number: "Not a number",
  out_of_range: "Out of range",
};

export type BenchCsvRow =
  | { row: number; cells: Record<Column, string>; status: "accepted" }
  | { row: number; cells: Record<Column, string>; status: "rejected"; problem: BenchValueProblem; message: string };

export interface BenchCsvPreview {
  rows: BenchCsvRow[];
  headerFound: boolean;
  rejectedCount: number;
  canSave: boolean;
}

export function readBenchCsv(text: string, heightUnit: HeightUnit): BenchCsvPreview {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { skipEmptyLines: "greedy", delimitersToGuess: [",", ";", "\t"] });
  const table = parsed.data.map((cells) => cells.map((c) => String(c ?? "").trim()));
  const first = table[0] ?? [];
  const headerFound = first.some((cell) => HEADINGS.potHeight.test(cell) || HEADINGS.rise.test(cell));
  const index: Record<Column, number> = { potHeight: 0, rise: 1, speed: 2, note: 3 };
  if (headerFound) {
    for (const column of Object.keys(HEADINGS) as Column[]) index[column] = first.findIndex((cell) => HEADINGS[column].test(cell));
  }
  const body = headerFound ? table.slice(1) : table;
  const rows = body.map((cells, i): BenchCsvRow => {
    const get = (c: Column) => (index[c] >= 0 ? (cells[index[c]] ?? "") : "");
    const row = i + (headerFound ? 2 : 1);
    const rowCells = { potHeight: get("potHeight"), rise: get("rise"), speed: get("speed"), note: get("note") };
    const checks = [
      checkBenchValue(rowCells.potHeight, "potHeight", heightUnit),
      checkBenchValue(rowCells.rise, "rise", heightUnit),
      checkBenchValue(rowCells.speed, "speed", "m/s", true),
    ];
    const bad = checks.find((c) => !c.ok);
    if (bad && !bad.ok) return { row, cells: rowCells, status: "rejected", problem: bad.problem, message: bad.message };
    return { row, cells: rowCells, status: "accepted" };
  });
  const rejectedCount = rows.filter((r) => r.status === "rejected").length;
  return { rows, headerFound, rejectedCount, canSave: rows.length > 0 && rejectedCount === 0 };
}
