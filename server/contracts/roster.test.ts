import { describe, expect, it } from "vitest";
import { checkRosterName, rosterInputSchema, rosterNameKey } from "./roster";

describe("roster display names", () => {
  it.each([
    ["Amira K.", "Amira K."],
    ["  Amira   K ", "Amira K"],
    ["Mary-Jane O.", "Mary-Jane O."],
    ["Dáithí O'N.", "Dáithí O'N."],
    ["Zoë Ł.", "Zoë Ł."],
    ["Jo", "Jo"],
    ["Li Wei H.", "Li Wei H."],
  ])("accepts %j as %j", (raw, tidy) => {
    expect(checkRosterName(raw)).toEqual({ ok: true, value: tidy });
  });

  it.each([
    ["", "blank"],
    ["   ", "blank"],
    ["A".repeat(31), "too_long"],
    ["amira@pupils.example", "email"],
    ["amira.khan.example.com", "email"],
    ["Amira Khan", "full_name"],
    ["Anne Marie", "full_name"],
    ["Amira <K>", "characters"],
    ["Amira\tK.\u0000", "characters"],
  ])("refuses %j as %s", (raw, problem) => {
    const check = checkRosterName(raw);
    expect(check.ok).toBe(false);
    if (!check.ok) expect(check.problem).toBe(problem);
  });

  it("treats case and a final full stop as the same pupil", () => {
    expect(rosterNameKey("Sam K.")).toBe(rosterNameKey("sam k"));
    expect(rosterNameKey("Sam K.")).not.toBe(rosterNameKey("Sam J."));
  });

  it("reports every bad row at once, duplicates included, by index", () => {
    const result = rosterInputSchema.safeParse({ names: ["Sam K.", "", "sam k", "Sam Kelly", "Ola B."] });
    expect(result.success).toBe(false);
    const paths = result.error!.issues.map((i) => i.path.join("."));
    expect(paths).toEqual(["names.1", "names.2", "names.3"]);
  });

  it("tidies the names it accepts", () => {
    expect(rosterInputSchema.parse({ names: ["  Ola   B. "] })).toEqual({ names: ["Ola B."] });
  });
});
