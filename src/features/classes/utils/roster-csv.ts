import Papa from "papaparse";
import { ROSTER_LIMITS, classifyRosterRows, type RosterNameProblem } from "@contracts/roster";

/**
 * Reading a roster from a CSV file, before anything is saved: each row of the file is judged
 * with the roster's own rules (`classifyRosterRows`, shared with the server), so the preview
 * says row by row what the server would accept.
 */

/** A class list is a few kilobytes; anything far bigger is not one. */
export const ROSTER_CSV_MAX_BYTES = 100 * 1024;

/** Header cells that name the column of display names (the row is then skipped). */
const NAME_HEADER = /^(?:pupils?|names?|display names?|pupil names?|first name and initial)$/i;

export type RosterCsvRow =
  | { row: number; raw: string; status: "accepted"; name: string }
  | { row: number; raw: string; status: "rejected"; problem: RosterNameProblem; message: string };

export interface RosterCsvPreview {
  rows: RosterCsvRow[];
  /** Accepted names in file order: what saving would send. */
  names: string[];
  rejectedCount: number;
  /** The first row named the column and was not read as a pupil. */
  headerSkipped: boolean;
  /** Other columns held something; only the names column was read. */
  otherColumnsIgnored: boolean;
  /** Problems with the file as a whole (too many names). */
  fileErrors: string[];
  /** Nothing stands in the way of saving. */
  canSave: boolean;
}

export const PROBLEM_LABELS: Record<RosterNameProblem, string> = {
  blank: "Blank",
  too_long: "Too long",
  email: "Looks like an e-mail address",
  full_name: "Looks like a full name",
  characters: "Unusual characters",
  duplicate: "Duplicate",
};

/** Reads CSV text (one pupil per row, names in the first column or under a "Name" header). */
export function readRosterCsv(text: string): RosterCsvPreview {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), {
    skipEmptyLines: false,
    delimitersToGuess: [",", ";", "\t"],
  });
  const table = parsed.data.map((cells) => cells.map((c) => String(c ?? "")));
  // A file ends with a newline, and spreadsheets add empty rows at the end: those are not pupils.
  while (table.length && table[table.length - 1]!.every((c) => !c.trim())) table.pop();

  const headerColumn = table[0]?.findIndex((cell) => NAME_HEADER.test(cell.trim())) ?? -1;
  const headerSkipped = headerColumn >= 0;
  const column = headerSkipped ? headerColumn : 0;
  const body = headerSkipped ? table.slice(1) : table;
  const firstRow = headerSkipped ? 2 : 1;

  const raws = body.map((cells) => cells[column] ?? "");
  const otherColumnsIgnored = body.some((cells) => cells.some((cell, i) => i !== column && cell.trim() !== ""));
  const verdicts = classifyRosterRows(raws);
  const rows: RosterCsvRow[] = verdicts.map((verdict, i) => {
    const row = firstRow + i;
    const raw = raws[i]!;
    if (verdict.ok) return { row, raw, status: "accepted", name: verdict.value };
    // Duplicates are reported against the file's own row numbers, which the teacher can see.
    const message =
      verdict.duplicateOf !== undefined ? `Same name as row ${verdict.duplicateOf + firstRow} of the file.` : verdict.message;
    return { row, raw, status: "rejected", problem: verdict.problem, message };
  });

  const names = rows.flatMap((r) => (r.status === "accepted" ? [r.name] : []));
  const rejectedCount = rows.length - names.length;
  const fileErrors: string[] = [];
  if (rows.length === 0) fileErrors.push("There are no names in this file.");
  if (names.length > ROSTER_LIMITS.entries) {
    fileErrors.push(`A roster holds at most ${ROSTER_LIMITS.entries} names; this file has ${names.length}.`);
  }
  return {
    rows,
    names,
    rejectedCount,
    headerSkipped,
    otherColumnsIgnored,
    fileErrors,
    canSave: rejectedCount === 0 && fileErrors.length === 0,
  };
}

export type RosterFileProblem = { message: string } | null;

/**
 * Checks a picked file before reading it: size, and that its content is text (by content,
 * not by name: a spreadsheet saved as .xlsx or a photo renamed .csv is refused).
 */
export function checkRosterFile(file: { size: number }, bytes: Uint8Array): RosterFileProblem {
  if (file.size === 0) return { message: "This file is empty." };
  if (file.size > ROSTER_CSV_MAX_BYTES) {
    return { message: `This file is too big for a class list (over ${Math.round(ROSTER_CSV_MAX_BYTES / 1024)} KB). Save just the names as CSV.` };
  }
  if (bytes.includes(0)) {
    return { message: "This is not a CSV text file. In your spreadsheet, choose “Save as” and the CSV format." };
  }
  try {
    new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    return { message: "This file is not in UTF-8 text. In your spreadsheet, save it as “CSV UTF-8”." };
  }
  return null;
}
