import { count } from "drizzle-orm";
import type { Db } from "../client";
import { benchRuns, classes, departments, rosterEntries, schools, staff } from "../schema";
import { DEMO_BENCH_RUNS, DEMO_CLASSES, DEMO_SCHOOL, DEMO_STAFF } from "./demo-data";

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
      await tx
        .insert(rosterEntries)
        .values(c.roster.map((displayName, position) => ({ classId: row!.id, displayName, position })));
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
    return true;
  });
}
