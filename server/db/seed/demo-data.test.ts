import { describe, expect, it } from "vitest";
import { createClassInputSchema } from "../../contracts/classes";
import { rosterInputSchema } from "../../contracts/roster";
import { DEMO_CLASSES, DEMO_STAFF, DEMO_UNINVITED } from "./demo-data";

describe("the demo school", () => {
  it("has a head of department, two teachers and an admin", () => {
    expect(DEMO_STAFF.map((s) => s.role).sort()).toEqual(["admin", "head_of_department", "teacher", "teacher"]);
  });

  it("uses only addresses under the reserved .example domain (RFC 2606)", () => {
    for (const email of [...DEMO_STAFF.map((s) => s.email), DEMO_UNINVITED.email]) expect(email).toMatch(/@[a-z]+\.example$/);
  });

  it("has three classes whose details and rosters pass the same rules teachers' input does", () => {
    expect(DEMO_CLASSES).toHaveLength(3);
    for (const c of DEMO_CLASSES) {
      expect(createClassInputSchema.safeParse(c).success).toBe(true);
      const roster = rosterInputSchema.safeParse({ names: c.roster });
      expect(roster.error?.issues ?? []).toEqual([]);
      expect(c.roster.length).toBeGreaterThanOrEqual(12);
    }
  });
});
