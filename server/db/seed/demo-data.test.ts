import { describe, expect, it } from "vitest";
import { createClassInputSchema } from "../../contracts/classes";
import { rosterInputSchema } from "../../contracts/roster";
import { isLessonCode } from "../../contracts/lesson-rules";
import { DEMO_CLASSES, DEMO_PAST_LESSON, DEMO_STAFF, DEMO_UNINVITED } from "./demo-data";

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

  it("has one finished lesson whose answers fit its class's roster and whose results are the simulation's calibrated figures", () => {
    const lessonClass = DEMO_CLASSES.find((c) => c.name === DEMO_PAST_LESSON.className)!;
    expect(isLessonCode(DEMO_PAST_LESSON.code)).toBe(true);
    for (const trial of DEMO_PAST_LESSON.trials) {
      expect(trial.answers.length).toBeLessThanOrEqual(lessonClass.roster.length);
      if (trial.revote) expect(trial.revote).toHaveLength(trial.answers.length);
      // The calibrated simulation gives rise/H from 0.13 to 0.16 (DEVELOPERS.md, "Simulation").
      expect(trial.rise.value / trial.potHeight).toBeGreaterThan(0.13);
      expect(trial.rise.value / trial.potHeight).toBeLessThan(0.16);
    }
    for (const e of DEMO_PAST_LESSON.explanations) expect(e.pupil).toBeLessThan(DEMO_PAST_LESSON.trials[0].answers.length);
  });
});
