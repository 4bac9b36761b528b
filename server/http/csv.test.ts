import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { neutraliseCell, toCsv } from "./csv";

const parse = (csv: string) => Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true });

describe("neutralising CSV cells against formulas (OWASP \"CSV Injection\", common practice)", () => {
  it("prefixes an apostrophe to text starting with = + - @ tab or carriage return", () => {
    expect(neutraliseCell("=1+1")).toBe("'=1+1");
    expect(neutraliseCell("+44 text")).toBe("'+44 text");
    expect(neutraliseCell("-5 cm, I think")).toBe("'-5 cm, I think");
    expect(neutraliseCell("@SUM(A1)")).toBe("'@SUM(A1)");
    expect(neutraliseCell("\t=2")).toBe("'\t=2");
    expect(neutraliseCell("\r=2")).toBe("'\r=2");
    // A formula followed by a line break is still caught (a `.*$` pattern would miss it).
    expect(neutraliseCell("=HYPERLINK(\"x\")\nmore")).toBe("'=HYPERLINK(\"x\")\nmore");
  });

  it("leaves other text alone, including a formula character later in the text", () => {
    expect(neutraliseCell("It rises 1+1 cm")).toBe("It rises 1+1 cm");
    expect(neutraliseCell("Sam K.")).toBe("Sam K.");
    expect(neutraliseCell("")).toBe("");
  });

  it("keeps numbers numeric, negative ones included: a number cell is never prefixed", () => {
    expect(neutraliseCell(-0.5)).toBe(-0.5);
    expect(neutraliseCell(12)).toBe(12);
    expect(neutraliseCell(Number.NaN)).toBe("");
    expect(neutraliseCell(null)).toBe("");
  });

  it("writes a BOM, a header and quoted cells that read back the same through papaparse", () => {
    const csv = toCsv(["pupil", "prediction (cm)", "reason"], [["Zoë A.", -0.5, 'He said "up", then, =1+1'], ["Ana B.", 12.5, "=1+1"]]);
    expect(csv.startsWith("\ufeffpupil,prediction (cm),reason\r\n")).toBe(true);
    // The negative number is written bare, so a spreadsheet reads it as a number.
    expect(csv).toContain("Zoë A.,-0.5,");
    const back = parse(csv);
    expect(back.errors).toEqual([]);
    expect(back.data).toEqual([
      { pupil: "Zoë A.", "prediction (cm)": "-0.5", reason: 'He said "up", then, =1+1' },
      { pupil: "Ana B.", "prediction (cm)": "12.5", reason: "'=1+1" },
    ]);
  });
});
