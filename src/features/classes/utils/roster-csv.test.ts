import { describe, expect, it } from "vitest";
import { ROSTER_LIMITS } from "@contracts/roster";
import { checkRosterFile, readRosterCsv, ROSTER_CSV_MAX_BYTES } from "./roster-csv";

const verdicts = (text: string) =>
  readRosterCsv(text).rows.map((r) => (r.status === "accepted" ? ["accepted", r.row, r.name] : ["rejected", r.row, r.problem]));

describe("reading a roster CSV", () => {
  it("accepts a plain one-column file, tidying spaces", () => {
    const preview = readRosterCsv("Amira K.\nBen  T.\r\nCallum R.\n");
    expect(preview.names).toEqual(["Amira K.", "Ben T.", "Callum R."]);
    expect(preview.rejectedCount).toBe(0);
    expect(preview.canSave).toBe(true);
    expect(preview.headerSkipped).toBe(false);
  });

  it("classifies each bad row with its reason, numbered as in the file", () => {
    const csv = ["Name", "Amira K.", "", "A".repeat(31), "amira@pupils.example", "Amira Khan", "Ben T.", "amira k", "Dara <M>"].join("\n");
    expect(verdicts(csv)).toEqual([
      ["accepted", 2, "Amira K."],
      ["rejected", 3, "blank"],
      ["rejected", 4, "too_long"],
      ["rejected", 5, "email"],
      ["rejected", 6, "full_name"],
      ["accepted", 7, "Ben T."],
      ["rejected", 8, "duplicate"],
      ["rejected", 9, "characters"],
    ]);
    const preview = readRosterCsv(csv);
    expect(preview.headerSkipped).toBe(true);
    expect(preview.rejectedCount).toBe(6);
    expect(preview.canSave).toBe(false);
    // Only accepted names would be sent, in file order.
    expect(preview.names).toEqual(["Amira K.", "Ben T."]);
    const duplicate = preview.rows.find((r) => r.row === 8);
    expect(duplicate?.status === "rejected" && duplicate.message).toBe("Same name as row 2 of the file.");
  });

  it("reads the column under a name header and says other columns were ignored", () => {
    const preview = readRosterCsv("Group;Display name;Note\nA;Elif S.;left early\nB;Finn O.;\n");
    expect(preview.headerSkipped).toBe(true);
    expect(preview.names).toEqual(["Elif S.", "Finn O."]);
    expect(preview.otherColumnsIgnored).toBe(true);
  });

  it("keeps quoted fields whole and drops a byte-order mark and trailing empty rows", () => {
    const preview = readRosterCsv('\uFEFF"Grace H.",x\r\n"O\'Neill, P.",\r\n\r\n,\r\n');
    expect(preview.rows.map((r) => r.raw)).toEqual(["Grace H.", "O'Neill, P."]);
    // A comma is not allowed in a display name: the quoted field is judged as one name.
    expect(preview.rows[1]).toMatchObject({ status: "rejected", problem: "characters" });
  });

  it("refuses a file with more names than a roster holds", () => {
    // "Pupilaa K.", "Pupilab K.", …: all different, all valid.
    const distinct = Array.from(
      { length: ROSTER_LIMITS.entries + 1 },
      (_, i) => `Pupil${String.fromCharCode(97 + Math.floor(i / 26))}${String.fromCharCode(97 + (i % 26))} K.`,
    );
    const preview = readRosterCsv(distinct.join("\n"));
    expect(preview.rejectedCount).toBe(0);
    expect(preview.names).toHaveLength(ROSTER_LIMITS.entries + 1);
    expect(preview.fileErrors[0]).toMatch(/at most 60 names/);
    expect(preview.canSave).toBe(false);
  });

  it("says so when the file holds no names", () => {
    expect(readRosterCsv("\n\n").fileErrors).toEqual(["There are no names in this file."]);
  });
});

describe("checking a picked file by its content", () => {
  const bytes = (s: string) => new TextEncoder().encode(s);

  it("accepts UTF-8 text", () => {
    const content = bytes("Zoë Ł.\n");
    expect(checkRosterFile({ size: content.length }, content)).toBeNull();
  });

  it("refuses binary content whatever the file is called", () => {
    const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
    expect(checkRosterFile({ size: png.length }, png)?.message).toMatch(/not a CSV text file/);
  });

  it("refuses text in another encoding, and files that are empty or too big", () => {
    const latin1 = new Uint8Array([0x5a, 0x6f, 0xeb, 0x20, 0x4c, 0x2e]);
    expect(checkRosterFile({ size: latin1.length }, latin1)?.message).toMatch(/UTF-8/);
    expect(checkRosterFile({ size: 0 }, new Uint8Array())?.message).toMatch(/empty/);
    expect(checkRosterFile({ size: ROSTER_CSV_MAX_BYTES + 1 }, bytes("a"))?.message).toMatch(/too big/);
  });
});
