/**
 * The head of department's weekly digest over real SMTP and real Postgres: totals of last week's
 * lessons per teacher and class, once per head and week, never a pupil's name, and nothing for a
 * department that ran no lessons that week.
 */
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import type { Db } from "../../server/db/client";
import { lessonParticipants, lessons, trials, weeklyDigestSends } from "../../server/db/schema";
import { sendWeeklyDigests } from "../../server/digest/digest.service";
import { createMailer } from "../../server/mail/mailer";
import { PEOPLE, seedFixture, type Fixture } from "../support/fixtures";
import { freePort, useTestStack } from "../support/test-stack";

/** A Wednesday: the digest reports Monday 23 to Sunday 29 November 2026. */
const NOW = new Date("2026-12-02T07:00:00Z");
const PUPIL_NAMES = ["Wren A.", "Tobin K.", "Isla M."];

async function seed(db: Db): Promise<Fixture> {
  const f = await seedFixture(db);
  const addLesson = async (classId: string, teacherId: string, startedAt: Date, code: string, pupils: string[], trialsRun: number) => {
    const [lesson] = await db
      .insert(lessons)
      .values({ classId, teacherId, code, status: "ended", startedAt, endedAt: new Date(startedAt.getTime() + 3_000_000) })
      .returning();
    for (const [i, name] of pupils.entries())
      await db.insert(lessonParticipants).values({ lessonId: lesson!.id, displayName: name, resumeTokenHash: `${code}-${i}` });
    for (let i = 0; i < trialsRun + 1; i++)
      await db.insert(trials).values({
        lessonId: lesson!.id,
        position: i + 1,
        rig: "fountain",
        params: {},
        question: { kind: "number", prompt: "How high?", quantity: "rise", unit: "cm", askReason: true, askExplanation: true, revote: true },
        // The last trial was set up but never run.
        ranAt: i < trialsRun ? startedAt : null,
      });
  };
  // In the reported week: two of teacher A's, one of teacher B's.
  await addLesson(f.classA, f.staffIds.teacherA, new Date("2026-11-23T09:00:00Z"), "AAAAAA", PUPIL_NAMES, 2);
  await addLesson(f.classA, f.staffIds.teacherA, new Date("2026-11-27T13:00:00Z"), "AAAAAC", PUPIL_NAMES.slice(0, 2), 1);
  await addLesson(f.classB, f.staffIds.teacherB, new Date("2026-11-29T23:59:00Z"), "AAAAAE", [], 0);
  // Outside it: the week before, and this week.
  await addLesson(f.classA, f.staffIds.teacherA, new Date("2026-11-22T23:59:00Z"), "AAAAAF", PUPIL_NAMES, 3);
  await addLesson(f.classA, f.staffIds.teacherA, new Date("2026-11-30T00:00:00Z"), "AAAAAH", PUPIL_NAMES, 3);
  // Summer, when London is on BST (UTC+1): Monday 1 June 00:30 BST is in the week of 1 June;
  // Monday 8 June 00:30 BST is not.
  await addLesson(f.classA, f.staffIds.teacherA, new Date("2026-05-31T23:30:00Z"), "AAAAAJ", PUPIL_NAMES.slice(0, 1), 1);
  await addLesson(f.classA, f.staffIds.teacherA, new Date("2026-06-07T23:30:00Z"), "AAAAAK", PUPIL_NAMES, 2);
  return f;
}

const ctx = useTestStack(seed);

describe("weekly digest for heads of department", () => {
  it("sends each head last week's totals for their department, without pupil names, once", async () => {
    const { db } = ctx.database;
    const arrived = ctx.stack.mail.waitFor((m) => m.to.includes(PEOPLE.head.email));
    const first = await sendWeeklyDigests(db, { mailer: ctx.stack.mailer, publicUrl: ctx.stack.url, now: NOW });
    const mail = await arrived;

    expect(mail.subject).toBe("Linkleap weekly: Science, week of 23 November 2026");
    expect(mail.text).toContain("Science ran 3 live lessons in the week of 23 November 2026: 3 trials run, 5 pupil places taken.");
    expect(mail.text).toContain(`${PEOPLE.teacherA.name}, `);
    expect(mail.text).toContain("2 lessons, 3 trials run, 5 pupils taking part.");
    expect(mail.text).toContain("1 lesson, 0 trials run, 0 pupils taking part.");
    expect(mail.text).toContain(`${ctx.stack.url}/department`);
    for (const name of PUPIL_NAMES) {
      expect(mail.text).not.toContain(name);
      expect(mail.html).not.toContain(name);
    }
    // Two heads in the first school (none elsewhere): Science is sent; Mathematics ran no lessons, so no mail.
    expect(first).toEqual({ sent: 1, skipped: 0, failed: 0, quiet: 1 });

    const again = await sendWeeklyDigests(db, { mailer: ctx.stack.mailer, publicUrl: ctx.stack.url, now: NOW });
    expect(again).toEqual({ sent: 0, skipped: 2, failed: 0, quiet: 0 });
    expect((await ctx.stack.mail.messages()).filter((m) => m.to.includes(PEOPLE.otherHead.email))).toEqual([]);
    expect((await ctx.stack.mail.messages()).filter((m) => m.to.includes(PEOPLE.head.email))).toHaveLength(1);
  });

  it("when the mail server is down, nothing is marked sent, so the next run tries again", async () => {
    const { db } = ctx.database;
    const nextWeek = new Date("2026-12-09T07:00:00Z");
    const deadMailer = createMailer({ host: "127.0.0.1", port: await freePort(), secure: false, from: "x@example.test" });
    const failed = await sendWeeklyDigests(db, { mailer: deadMailer, publicUrl: ctx.stack.url, now: nextWeek });
    deadMailer.close();
    // Science (a lesson on 30 November) fails; Mathematics is quiet and needs no mail server.
    expect(failed).toEqual({ sent: 0, skipped: 0, failed: 1, quiet: 1 });
    const claimed = await db.select().from(weeklyDigestSends).where(eq(weeklyDigestSends.weekStart, new Date("2026-11-30T00:00:00Z")));
    expect(claimed.map((c) => c.staffId)).toEqual([ctx.fixture.staffIds.otherHead]);

    const retried = await sendWeeklyDigests(db, { mailer: ctx.stack.mailer, publicUrl: ctx.stack.url, now: nextWeek });
    expect(retried).toEqual({ sent: 1, skipped: 1, failed: 0, quiet: 0 });
  });

  it("counts the week in the school's time zone (Europe/London, on BST in June)", async () => {
    const { db } = ctx.database;
    const arrived = ctx.stack.mail.waitFor((m) => m.to.includes(PEOPLE.head.email) && m.subject.includes("1 June 2026"));
    const result = await sendWeeklyDigests(db, { mailer: ctx.stack.mailer, publicUrl: ctx.stack.url, now: new Date("2026-06-10T07:00:00Z") });
    expect(result).toEqual({ sent: 1, skipped: 0, failed: 0, quiet: 1 });
    const mail = await arrived;
    expect(mail.subject).toBe("Linkleap weekly: Science, week of 1 June 2026");
    expect(mail.text).toContain("Science ran 1 live lesson in the week of 1 June 2026: 1 trial run, 1 pupil place taken.");
    // The week is claimed from Monday 00:00 BST, which is Sunday 23:00 UTC.
    const claimed = await db.select().from(weeklyDigestSends).where(eq(weeklyDigestSends.weekStart, new Date("2026-05-31T23:00:00Z")));
    expect(claimed).toHaveLength(2);
  });
});
