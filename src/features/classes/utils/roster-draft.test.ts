import { describe, expect, it } from "vitest";
import { rosterInputSchema } from "@contracts/roster";
import { fieldErrorsFromIssues } from "@contracts/errors";
import { placeServerErrors, rosterChanged, rowsFromNames, splitPastedNames, validateRoster } from "./roster-draft";

describe("splitPastedNames", () => {
  it("gives one name per line, skipping blank lines and tidying spaces", () => {
    expect(splitPastedNames("Amira K.\r\n\n  Ben   T \n\t\nCallum R.")).toEqual(["Amira K.", "Ben T", "Callum R."]);
  });
  it("drops list markers from numbered or bulleted lists", () => {
    expect(splitPastedNames("1. Amira K.\n2) Ben T.\n- Dara M.\n• Elif S.")).toEqual(["Amira K.", "Ben T.", "Dara M.", "Elif S."]);
  });
  it("keeps a name that only starts like a marker", () => {
    expect(splitPastedNames("Jo-Ann P.")).toEqual(["Jo-Ann P."]);
  });
});

describe("validateRoster", () => {
  it("accepts a clean roster and tidies what it will send", () => {
    const result = validateRoster(["Amira K.", "  Ben   T "]);
    expect(result.valid).toBe(true);
    expect(result.names).toEqual(["Amira K.", "Ben T"]);
  });

  it("leaves blank rows out and remembers which row each name came from", () => {
    const result = validateRoster(["Amira K.", "   ", "Ben T."]);
    expect(result.valid).toBe(true);
    expect(result.names).toEqual(["Amira K.", "Ben T."]);
    expect(result.rowOfName).toEqual([0, 2]);
  });

  it("puts the contract's message on a row that is a full name or an e-mail", () => {
    const result = validateRoster(["Amira Khan", "ben@school.example"]);
    expect(result.valid).toBe(false);
    expect(result.rowErrors.get(0)).toMatch(/full name/);
    expect(result.rowErrors.get(1)).toMatch(/e-mail/);
  });

  it("flags the second of two names that count as the same pupil, naming the first row", () => {
    const result = validateRoster(["Sam K", "Ben T.", "", "sam k."]);
    expect(result.rowErrors.size).toBe(1);
    expect(result.rowErrors.get(3)).toBe("Same name as row 1: add a letter to tell them apart.");
  });

  it("refuses more names than a roster holds", () => {
    // 62 different valid names: "Paa K.", "Pab K.", …
    const names = Array.from({ length: 62 }, (_, i) => `P${String.fromCharCode(97 + Math.floor(i / 26))}${String.fromCharCode(97 + (i % 26))} K.`);
    const result = validateRoster(names);
    expect(result.rowErrors.size).toBe(0);
    expect(result.formErrors).toEqual(["A roster holds at most 60 names: remove 2 names before saving."]);
    expect(result.valid).toBe(false);
  });

  it("agrees with the server's schema on what is valid", () => {
    const samples = [["Amira K.", "Ben T."], ["Amira K.", "amira k"], ["Amira Khan"], ["O'Neil B.", "Zoë-Ann P"]];
    for (const names of samples) {
      expect(validateRoster(names).valid).toBe(rosterInputSchema.safeParse({ names }).success);
    }
  });
});

describe("placeServerErrors", () => {
  it("puts `names.<i>` on the row the i-th name came from, and the rest on the form", () => {
    const parsed = rosterInputSchema.safeParse({ names: ["Amira K.", "amira k"] });
    expect(parsed.success).toBe(false);
    const fields = fieldErrorsFromIssues(parsed.error!.issues);
    // The draft had a blank row between the two, so name 1 came from row 2.
    const placed = placeServerErrors({ ...fields, _form: ["Something about the whole roster."] }, [0, 2]);
    expect(placed.rowErrors.get(2)).toBe("Same name as row 1: add a letter to tell them apart.");
    expect(placed.rowErrors.has(1)).toBe(false);
    expect(placed.formErrors).toEqual(["Something about the whole roster."]);
  });
  it("keeps an error for a row it cannot place", () => {
    expect(placeServerErrors({ "names.9": ["Lost row"] }, [0]).formErrors).toEqual(["Lost row"]);
  });
});

describe("rosterChanged", () => {
  const saved = ["Amira K.", "Ben T."];
  it("ignores blank rows and extra spaces", () => {
    expect(rosterChanged(["Amira K.", " ", "Ben  T. "], saved)).toBe(false);
  });
  it("notices additions, removals, renames and a new order", () => {
    expect(rosterChanged(["Amira K.", "Ben T.", "Cal R."], saved)).toBe(true);
    expect(rosterChanged(["Amira K."], saved)).toBe(true);
    expect(rosterChanged(["Amira K.", "Ben S."], saved)).toBe(true);
    expect(rosterChanged(["Ben T.", "Amira K."], saved)).toBe(true);
  });
});

describe("rowsFromNames", () => {
  it("gives every row its own key", () => {
    const rows = rowsFromNames(["A B.", "C D."]);
    expect(rows.map((r) => r.value)).toEqual(["A B.", "C D."]);
    expect(new Set(rows.map((r) => r.key)).size).toBe(2);
  });
});
