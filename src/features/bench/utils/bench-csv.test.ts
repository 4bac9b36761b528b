import { describe, expect, it } from "vitest";
import { readBenchCsv } from "./bench-csv";

describe("readBenchCsv", () => {
  it("marks each row accepted or rejected with the reason, by heading, in the chosen unit", () => {
    const preview = readBenchCsv("Note,Pot height,Rise,Speed\nfirst,100,14,\nsecond,,12,\nthird,120,tall,\nfourth,900,10,\nfifth,80,11,3.1\n", "cm");
    expect(preview.headerFound).toBe(true);
    expect(preview.rows.map((r) => (r.status === "rejected" ? r.problem : "ok"))).toEqual(["ok", "missing", "not_a_number", "out_of_range", "ok"]);
    expect(preview.rows.map((r) => r.row)).toEqual([2, 3, 4, 5, 6]);
    expect(preview.rows[4]!.cells).toEqual({ potHeight: "80", rise: "11", speed: "3.1", note: "fifth" });
    expect(preview.canSave).toBe(false);
  });
  it("reads columns in order when there is no heading", () => {
    const preview = readBenchCsv("1.0;0.13\n1.5;0.2\n", "m");
    expect(preview.headerFound).toBe(false);
    expect(preview.canSave).toBe(true);
    expect(preview.rows.map((r) => r.cells.rise)).toEqual(["0.13", "0.2"]);
  });
});
