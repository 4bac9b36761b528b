import { eq, sql } from "drizzle-orm";
import { recordAudit } from "../audit/audit.repository";
import type { Db } from "../db/client";
import { schools } from "../db/schema";
import { AppError, notFound } from "../http/app-error";
import type { Actor } from "../staff/staff.repository";

/**
 * Sets the school's time zone (an admin's change, audited). The name has passed the contract's
 * check against the runtime's zones; Postgres must know it too, since the overview's SQL counts
 * weeks with `at time zone`.
 */
export async function updateSchoolTimeZone(db: Db, actor: Actor, timeZone: string): Promise<{ timeZone: string }> {
  const known = await db.execute(sql`select 1 from pg_timezone_names where lower(name) = lower(${timeZone}) limit 1`);
  if (known.rows.length === 0) {
    throw new AppError("validation_failed", "Some of the details need correcting.", { timeZone: ["Choose a time zone from the list."] });
  }
  await db.transaction(async (tx) => {
    const [school] = await tx.select({ timeZone: schools.timeZone }).from(schools).where(eq(schools.id, actor.schoolId)).for("update");
    if (!school) throw notFound("Your school");
    if (school.timeZone === timeZone) return;
    await tx.update(schools).set({ timeZone }).where(eq(schools.id, actor.schoolId));
    await recordAudit(tx, {
      schoolId: actor.schoolId,
      actorStaffId: actor.id,
      action: "school.time_zone_changed",
      subjectType: "school",
      subjectId: actor.schoolId,
      detail: { from: school.timeZone, to: timeZone },
    });
  });
  return { timeZone };
}
