import { createHash, randomUUID } from "node:crypto";
import { count, eq } from "drizzle-orm";
import { trialSetupSchema } from "../../contracts/lessons";
import type { Db } from "../client";
import { benchRuns, classes, departments, explanations, lessonParticipants, lessonPlans, lessons, plannedLessons, predictions, rosterEntries, schools, staff, trials } from "../schema";
import { checkSetup, defaultParams, defaultQuestion, theoryFor } from "../../lessons/lessons.service";
import { refreshTrialSummaries } from "../../department/trial-summary";
import { DEMO_BENCH_RUNS, DEMO_CLASSES, DEMO_PAST_LESSON, DEMO_PLANNED_LESSONS, DEMO_PLANS, DEMO_SCHOOL, DEMO_STAFF } from "./demo-data";

/**
 * Seeds the invented demo school on first run only: if any school exists, nothing happens.
 * Returns whether it seeded.
 */
export async function seedDemo(db: Db): Promise<boolean> {
  return db.transaction(async (tx) => {
    // Two processes starting together must not both seed.
    await tx.execute("select pg_advisory_xact_lock(7531902418)");
    const [{ n }] = (await tx.select({ n: count() }).from(schools)) as [{ n: number }];
    if (n > 0) return false;

    const [school] = await tx.insert(schools).values({ name: DEMO_SCHOOL.name }).returning();
    const [department] = await tx
      .insert(departments)
      .values({ schoolId: school!.id, name: DEMO_SCHOOL.department })
      .returning();
    const staffIds = new Map<string, string>();
    for (const person of DEMO_STAFF) {
      const [row] = await tx
        .insert(staff)
        .values({
          schoolId: school!.id,
          departmentId: person.inDepartment ? department!.id : null,
          email: person.email,
          displayName: person.displayName,
          role: person.role,
        })
        .returning({ id: staff.id });
      staffIds.set(person.key, row!.id);
    }
    const classIds = new Map<string, string>();
    for (const c of DEMO_CLASSES) {
      const [row] = await tx
        .insert(classes)
        .values({
          schoolId: school!.id,
          departmentId: department!.id,
          teacherId: staffIds.get(c.teacher)!,
          name: c.name,
          yearGroup: c.yearGroup,
          subject: c.subject,
        })
        .returning({ id: classes.id });
      classIds.set(c.name, row!.id);
      await tx
        .insert(rosterEntries)
        .values(c.roster.map((displayName, position) => ({ classId: row!.id, displayName, position })));
      if (c.name === DEMO_PAST_LESSON.className) {
        await seedPastLesson(tx, row!.id, staffIds.get(c.teacher)!, c.roster);
      }
      if (c.name === DEMO_BENCH_RUNS.className) {
        await tx.insert(benchRuns).values(
          DEMO_BENCH_RUNS.runs.map((run) => ({
            classId: row!.id,
            ...run,
            note: DEMO_BENCH_RUNS.note,
            source: "typed" as const,
            createdBy: staffIds.get(c.teacher)!,
          })),
        );
      }
    }
    // Stored as the board stores a set-up: checked against the rig's schema, defaults filled in.
    const plans = await tx.insert(lessonPlans).values(
      DEMO_PLANS.plans.map((plan, i) => ({
        schoolId: school!.id,
        departmentId: department!.id,
        ownerId: staffIds.get(DEMO_PLANS.owner)!,
        title: plan.title,
        summary: plan.summary,
        shared: true,
        trials: plan.trials.map((t) => checkSetup(trialSetupSchema.parse(t))),
        // The first plan is the latest, so the list (newest first) shows them in this order.
        updatedAt: new Date(Date.now() - (i + 1) * 60 * MINUTE),
        createdAt: new Date(Date.now() - (i + 1) * 60 * MINUTE),
      })),
    ).returning({ id: lessonPlans.id });
    await tx.insert(plannedLessons).values(
      DEMO_PLANNED_LESSONS.map((p) => {
        const at = new Date();
        at.setDate(at.getDate() + p.daysAhead);
        at.setHours(p.hour, p.minute, 0, 0);
        return { classId: classIds.get(p.className)!, teacherId: staffIds.get(p.teacher)!, planId: plans[p.planIndex]!.id, plannedFor: at };
      }),
    );
    return true;
  });
}

type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
const MINUTE = 60_000;

/** The demo's finished lesson: participants from the roster, two fountain trials run, answers and explanations. */
async function seedPastLesson(tx: Tx, classId: string, teacherId: string, roster: readonly string[]) {
  const plan = DEMO_PAST_LESSON;
  const start = new Date(Date.now() - plan.daysAgo * 24 * 60 * MINUTE);
  start.setUTCHours(10, 5, 0, 0);
  const [lesson] = await tx
    .insert(lessons)
    .values({ classId, teacherId, code: plan.code, status: "ended", startedAt: start, endedAt: new Date(start.getTime() + plan.minutes * MINUTE) })
    .returning({ id: lessons.id });
  const pupils = roster.slice(0, plan.trials[0].answers.length);
  const participants = await tx
    .insert(lessonParticipants)
    .values(
      pupils.map((displayName, i) => ({
        lessonId: lesson!.id,
        displayName,
        // Nobody can resume a demo participant: the hash is of a token that was never handed out.
        resumeTokenHash: createHash("sha256").update(randomUUID()).digest("hex"),
        joinedAt: new Date(start.getTime() + (1 + i / 10) * MINUTE),
      })),
    )
    .returning({ id: lessonParticipants.id });

  let lastTrialId: string | null = null;
  for (const [t, spec] of plan.trials.entries()) {
    const params = { ...defaultParams("fountain"), potHeight: spec.potHeight };
    const ranAt = new Date(start.getTime() + (12 + 18 * t) * MINUTE);
    const [trial] = await tx
      .insert(trials)
      .values({
        lessonId: lesson!.id,
        position: t + 1,
        rig: "fountain",
        params,
        question: defaultQuestion("fountain"),
        phase: spec.revote ? "revote" : "explain",
        seed: 1,
        measured: {
          rise: { ...spec.rise, unit: "m", basis: "Demo example: the simulation's figure for this set-up, from the calibration table" },
        },
        theory: theoryFor("fountain", params, 1),
        run: { dt: 0.00025, steps: 24_000, simulatedSeconds: 6, wallSeconds: null },
        ranAt,
        createdAt: new Date(ranAt.getTime() - 8 * MINUTE),
      })
      .returning({ id: trials.id });
    lastTrialId = trial!.id;
    const rounds = [{ round: 1 as const, values: spec.answers }, ...(spec.revote ? [{ round: 2 as const, values: spec.revote }] : [])];
    for (const { round, values } of rounds) {
      const rows = values.flatMap((value, i) =>
        value === null
          ? []
          : [
              {
                trialId: trial!.id,
                participantId: participants[i]!.id,
                round,
                clientId: randomUUID(),
                value,
                reason: round === 1 ? plan.reasons[i % plan.reasons.length]! : "",
                createdAt: new Date(ranAt.getTime() - (round === 1 ? 4 : -6) * MINUTE + i * 1000),
              },
            ],
      );
      await tx.insert(predictions).values(rows);
    }
    await refreshTrialSummaries(tx, [trial!.id]);
    if (t === 0) {
      await tx.insert(explanations).values(
        plan.explanations.map((e) => ({
          trialId: trial!.id,
          participantId: participants[e.pupil]!.id,
          clientId: randomUUID(),
          text: e.text,
          shownAt: e.shown ? new Date(ranAt.getTime() + 6 * MINUTE) : null,
          createdAt: new Date(ranAt.getTime() + 3 * MINUTE),
        })),
      );
    }
  }
  await tx.update(lessons).set({ currentTrialId: lastTrialId }).where(eq(lessons.id, lesson!.id));
}
