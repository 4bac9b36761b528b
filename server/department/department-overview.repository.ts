import { sql, type SQL } from "drizzle-orm";
import type { Db } from "../db/client";

type Reader = Pick<Db, "execute">;

/**
 * The school's days: `from` and `to` are calendar days (ISO) in `timeZone`, the range ends before
 * midnight starting `to`, and weeks start on Monday there. The bounds are constants, so the
 * started_at index still serves the range.
 */
export interface OverviewScope {
  departmentId: string;
  timeZone: string;
  from: string;
  /** The day after the last one shown. */
  to: string;
}

/** The department's lessons started in the range: the week each falls in (Monday, school time), teacher and class. */
const lessonsInRange = ({ departmentId, timeZone, from, to }: OverviewScope): SQL => sql`
  select l.id, l.teacher_id, l.class_id, l.participant_count, date_trunc('week', l.started_at at time zone ${timeZone})::date as week
  from lessons l
  join classes c on c.id = l.class_id
  where c.department_id = ${departmentId}
    and l.started_at >= (${from}::timestamp at time zone ${timeZone})
    and l.started_at < (${to}::timestamp at time zone ${timeZone})`;

export interface LessonCellRow {
  week: string;
  teacherId: string;
  teacherName: string;
  classId: string;
  className: string;
  lessons: number;
  trialsRun: number;
  pupils: number;
}

/** Lessons, trials run and pupils taking part per week × teacher × class. */
export async function lessonCells(db: Reader, scope: OverviewScope): Promise<LessonCellRow[]> {
  const result = await db.execute(sql`
    with l as (${lessonsInRange(scope)})
    select to_char(l.week, 'YYYY-MM-DD') as "week", l.teacher_id as "teacherId", s.display_name as "teacherName",
      l.class_id as "classId", c.name as "className", count(*)::int as "lessons",
      coalesce(sum(tr.runs), 0)::int as "trialsRun", coalesce(sum(pp.n), 0)::int as "pupils"
    from l
    join staff s on s.id = l.teacher_id
    join classes c on c.id = l.class_id
    left join (select t.lesson_id, count(*) as runs from trials t where t.ran_at is not null and t.lesson_id in (select id from l) group by 1) tr
      on tr.lesson_id = l.id
    -- Ended lessons carry their count; only lessons still open are counted here.
    left join lateral (
      select coalesce(l.participant_count, (select count(*) from lesson_participants p where p.lesson_id = l.id)) as n
    ) pp on true
    group by 1, 2, 3, 4, 5
    order by 1, 3, 5`);
  return result.rows as unknown as LessonCellRow[];
}

export interface ClosenessRow {
  week: string;
  /** Null on the per-week rows (grouping set (week)). */
  teacherId: string | null;
  classId: string | null;
  trialsCompared: number;
  predictions: number;
  within10: number;
  medianRelError: number | null;
}

/**
 * Closeness of class predictions from the trials' stored summaries, per week × teacher × class
 * and per week (the median over trials cannot be added up from the finer rows, so Postgres
 * works out both in one pass with grouping sets).
 */
export async function closenessRows(db: Reader, scope: OverviewScope): Promise<ClosenessRow[]> {
  const result = await db.execute(sql`
    with l as (${lessonsInRange(scope)})
    select to_char(l.week, 'YYYY-MM-DD') as "week", l.teacher_id as "teacherId", l.class_id as "classId",
      count(*)::int as "trialsCompared", sum(t.summary_predictions)::int as "predictions", sum(t.summary_within10)::int as "within10",
      percentile_cont(0.5) within group (order by t.summary_median_rel_error) as "medianRelError"
    from l
    join trials t on t.lesson_id = l.id
    where t.summary_predictions > 0
    group by grouping sets ((l.week, l.teacher_id, l.class_id), (l.week))`);
  return result.rows as unknown as ClosenessRow[];
}

/** Trials run per rig. */
export async function trialsByRig(db: Reader, scope: OverviewScope): Promise<{ rig: string; trialsRun: number }[]> {
  const result = await db.execute(sql`
    with l as (${lessonsInRange(scope)})
    select t.rig as "rig", count(*)::int as "trialsRun"
    from l
    join trials t on t.lesson_id = l.id
    where t.ran_at is not null
    group by t.rig
    order by 2 desc, 1`);
  return result.rows as unknown as { rig: string; trialsRun: number }[];
}
