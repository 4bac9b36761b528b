/**
 * Pupils joining at the very moment the teacher ends the lesson. The lesson's stored pupil count
 * (kept for the department overview) must match the pupils who really got in, and a join that
 * loses the race is told the lesson has ended instead of being let into an ended lesson.
 */
import { eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { joinLessonInputSchema } from "../../server/contracts/lessons";
import { lessonParticipants, lessons } from "../../server/db/schema";
import { AppError } from "../../server/http/app-error";
import { endLesson, joinLesson } from "../../server/lessons/lessons.service";
import { seedFixture } from "../support/fixtures";
import { useTestStack } from "../support/test-stack";

const ctx = useTestStack(seedFixture);

const ROUNDS = 8;
const PUPILS = 24;

describe("joining while the lesson ends", () => {
  it("counts exactly the pupils who got in, and refuses the rest as 'lesson ended'", async () => {
    const db = ctx.database.db;
    const teacher = { staffId: ctx.fixture.staffIds.teacherA, participant: null };
    let refusedInAll = 0;
    for (let round = 0; round < ROUNDS; round++) {
      const code = `RACE${"ACEFHJKM"[round]}${"NPRTWXY3"[round]}`;
      const [lesson] = await db
        .insert(lessons)
        .values({ classId: ctx.fixture.classA, teacherId: ctx.fixture.staffIds.teacherA, code })
        .returning({ id: lessons.id });
      const lessonId = lesson!.id;
      const join = (i: number) => joinLesson(db, joinLessonInputSchema.parse({ code, name: `Pupil ${round}-${i}` }));
      // Half the joins start before the end and half after, all in flight at once.
      const joins = Array.from({ length: PUPILS / 2 }, (_, i) => join(i));
      const ended = endLesson(db, teacher, lessonId);
      joins.push(...Array.from({ length: PUPILS / 2 }, (_, i) => join(PUPILS / 2 + i)));
      const outcomes = await Promise.allSettled(joins);
      expect((await ended).justEnded).toBe(true);

      const admitted = outcomes.filter((o) => o.status === "fulfilled").length;
      for (const o of outcomes) {
        if (o.status === "rejected") {
          expect(o.reason).toBeInstanceOf(AppError);
          // An ended lesson's code no longer finds an open lesson: either refusal means "ended".
          expect((o.reason as AppError).code).toBe("lesson_ended");
        }
      }
      refusedInAll += PUPILS - admitted;
      const [row] = await db
        .select({ stored: lessons.participantCount, real: sql<number>`(select count(*)::int from ${lessonParticipants} where ${lessonParticipants.lessonId} = ${lessonId})` })
        .from(lessons)
        .where(eq(lessons.id, lessonId));
      expect({ round, stored: row!.stored, real: row!.real }).toEqual({ round, stored: admitted, real: admitted });
    }
    // The race was really run: some joins lost it (and some won, above).
    expect(refusedInAll).toBeGreaterThan(0);
  });
});
