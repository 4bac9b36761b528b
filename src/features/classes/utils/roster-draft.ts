import type { FieldErrors } from "@contracts/errors";
import { ROSTER_LIMITS, checkRosterName, rosterNameKey } from "@contracts/roster";

/**
 * The roster editor works on a draft: rows of text in the order shown. These helpers are the
 * editor's logic without React, so they can be tested on their own. They apply the contract's
 * own rules (`checkRosterName`, `rosterNameKey`), so the editor says what the server would.
 */

export interface RosterRow {
  /** Stable React key; not the server's id. */
  key: string;
  value: string;
}

let lastKey = 0;
export const newRowKey = () => `row-${++lastKey}`;

export const rowsFromNames = (names: readonly string[]): RosterRow[] => names.map((value) => ({ key: newRowKey(), value }));

/** Spaces tidied the way the server stores names. */
export const tidyName = (raw: string) => raw.replace(/\s+/g, " ").trim();

const LIST_MARKER = /^(?:[-*•–—]|\(?\d{1,3}[.)])\s+/;

/**
 * One name per line, as pasted from a register or spreadsheet column: blank lines are skipped,
 * and list markers ("1.", "2)", "-", "•") are dropped so they do not become part of a name.
 */
export function splitPastedNames(text: string): string[] {
  return text
    .split(/\r\n|\r|\n/)
    .map((line) => tidyName(line).replace(LIST_MARKER, ""))
    .map(tidyName)
    .filter(Boolean);
}

export interface RosterValidation {
  /** Problem per row index (rows as shown, counting from 0). Blank rows have none: they are left out. */
  rowErrors: Map<number, string>;
  /** Problems with the roster as a whole. */
  formErrors: string[];
  /** The tidied names to send, blank rows left out. */
  names: string[];
  /** For each name sent, the row it came from: server errors on `names.<i>` land on row `rowOfName[i]`. */
  rowOfName: number[];
  valid: boolean;
}

export function validateRoster(values: readonly string[]): RosterValidation {
  const rowErrors = new Map<number, string>();
  const names: string[] = [];
  const rowOfName: number[] = [];
  const firstRowOfKey = new Map<string, number>();

  values.forEach((raw, row) => {
    if (!tidyName(raw)) return;
    const check = checkRosterName(raw);
    if (!check.ok) {
      rowErrors.set(row, check.message);
      names.push(tidyName(raw));
      rowOfName.push(row);
      return;
    }
    const key = rosterNameKey(check.value);
    const first = firstRowOfKey.get(key);
    if (first === undefined) firstRowOfKey.set(key, row);
    else rowErrors.set(row, `Same name as row ${first + 1}: add a letter to tell them apart.`);
    names.push(check.value);
    rowOfName.push(row);
  });

  const formErrors: string[] = [];
  if (names.length > ROSTER_LIMITS.entries) {
    const extra = names.length - ROSTER_LIMITS.entries;
    formErrors.push(
      `A roster holds at most ${ROSTER_LIMITS.entries} names: remove ${extra} ${extra === 1 ? "name" : "names"} before saving.`,
    );
  }
  return { rowErrors, formErrors, names, rowOfName, valid: rowErrors.size === 0 && formErrors.length === 0 };
}

/** Places the server's field errors (`names.3`, `names`, `_form`) on the editor's rows. */
export function placeServerErrors(fields: FieldErrors, rowOfName: readonly number[]) {
  const rowErrors = new Map<number, string>();
  const formErrors: string[] = [];
  for (const [path, messages] of Object.entries(fields)) {
    const message = messages[0];
    if (!message) continue;
    const match = /^names\.(\d+)$/.exec(path);
    const row = match ? rowOfName[Number(match[1])] : undefined;
    if (row !== undefined) rowErrors.set(row, message);
    else formErrors.push(message);
  }
  return { rowErrors, formErrors };
}

/** True when saving the draft would change the saved roster (names, order or spelling). */
export function rosterChanged(values: readonly string[], saved: readonly string[]): boolean {
  const draft = values.map(tidyName).filter(Boolean);
  return draft.length !== saved.length || draft.some((name, i) => name !== saved[i]);
}

/** How many of `count` more names still fit. */
export const roomLeft = (currentNames: number) => Math.max(0, ROSTER_LIMITS.entries - currentNames);
