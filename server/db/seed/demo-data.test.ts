import { describe, expect, it } from "vitest";
import { createClassInputSchema } from "../../contracts/classes";
import { rosterInputSchema } from "../../contracts/roster";
import { isLessonCode } from "../../contracts/lesson-rules";
import { lessonPlanInputSchema } from "../../contracts/lesson-plans";
import { checkSetup } from "../../lessons/lessons.service";
import { DEMO_CLASSES, DEMO_PAST_LESSON, DEMO_PLANNED_LESSONS, DEMO_PLANS, DEMO_STAFF, DEMO_UNINVITED } from "./demo-data";

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

describe("the demo's starter plans", () => {
  it("are three plans whose set-ups pass the same checks a teacher's plan does", () => {
    expect(DEMO_PLANS.plans).toHaveLength(3);
    expect(DEMO_STAFF.some((s) => s.key === DEMO_PLANS.owner && s.inDepartment)).toBe(true);
    for (const plan of DEMO_PLANS.plans) {
      const parsed = lessonPlanInputSchema.safeParse({ ...plan, shared: true });
      expect(parsed.error?.issues ?? []).toEqual([]);
      // checkSetup throws with field errors for a parameter outside its range or a question the rig cannot answer.
      for (const trial of parsed.data!.trials) expect(() => checkSetup(trial)).not.toThrow();
    }
  });

  it("cover the fountain against drop height, rods against beads, and a chain onto a scale", () => {
    const [heights, shapes, scale] = DEMO_PLANS.plans;
    expect(heights.trials.map((t) => t.params.potHeight)).toEqual([0.5, 1, 1.5]);
    expect(heights.trials.every((t) => t.question.kind === "number" && t.question.quantity === "rise" && t.question.unit === "cm")).toBe(true);
    expect(shapes.trials.map((t) => t.params.linkShape)).toEqual(["rod", "bead-thread"]);
    expect(new Set(shapes.trials.map((t) => t.params.potHeight)).size).toBe(1);
    expect(shapes.trials.every((t) => t.question.kind === "choice")).toBe(true);
    expect(scale.trials.every((t) => t.rig === "scale" && t.question.quantity === "readingRatio")).toBe(true);
  });

  it("mention the school's risk assessment where a real chain might be dropped", () => {
    for (const plan of [DEMO_PLANS.plans[0], DEMO_PLANS.plans[2]]) expect(plan.summary).toMatch(/risk assessment/);
  });
});

describe("the demo's next lessons", () => {
  it("belong to a class of the same teacher, use a starter plan, and fall at school times in the coming days", () => {
    for (const p of DEMO_PLANNED_LESSONS) {
      const cls = DEMO_CLASSES.find((c) => c.name === p.className);
      expect(cls?.teacher).toBe(p.teacher);
      expect(DEMO_PLANS.plans[p.planIndex]).toBeDefined();
      expect(p.daysAhead).toBeGreaterThanOrEqual(1);
      expect(p.hour * 60 + p.minute).toBeGreaterThanOrEqual(8 * 60);
      expect(p.hour * 60 + p.minute).toBeLessThanOrEqual(16 * 60);
    }
  });
});
