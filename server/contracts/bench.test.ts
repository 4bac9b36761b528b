import { describe, expect, it } from "vitest";
import { benchRunInputSchema, checkBenchValue } from "./bench";

describe("checkBenchValue", () => {
  it("converts the teacher's unit to metres", () => {
    expect(checkBenchValue("120", "potHeight", "cm")).toEqual({ ok: true, si: 1.2 });
    expect(checkBenchValue("155", "rise", "mm")).toEqual({ ok: true, si: 0.155 });
    expect(checkBenchValue("1,25", "potHeight", "m")).toEqual({ ok: true, si: 1.25 });
  });
  it("names the problem: missing, not a number, out of range (in the teacher's unit)", () => {
    expect(checkBenchValue("", "rise", "cm")).toMatchObject({ ok: false, problem: "missing" });
    expect(checkBenchValue("about 12", "rise", "cm")).toMatchObject({ ok: false, problem: "not_a_number" });
    expect(checkBenchValue("4", "potHeight", "cm")).toMatchObject({ ok: false, problem: "out_of_range", message: "Pot height must be between 5–500 cm." });
    expect(checkBenchValue("21", "speed", "m/s")).toMatchObject({ ok: false, problem: "out_of_range" });
    expect(checkBenchValue("", "speed", "m/s", true)).toEqual({ ok: true, si: null });
  });
  it("the run schema reports each bad field under its own name", () => {
    const result = benchRunInputSchema.safeParse({ potHeight: "x", rise: 300, heightUnit: "cm" });
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((i) => i.path.join("."))).toEqual(["potHeight", "rise"]);
  });
});
