import {
  addDays,
  defaultOverviewRange,
  weeksOverlapping,
  type DepartmentOverview,
  type WeeklyCloseness,
  type WeeklySeries,
  overviewQuerySchema,
} from "../contracts/department-overview";
import type { z } from "zod";
import { isoDayIn } from "../contracts/school";
import type { Db } from "../db/client";
import { toCsv } from "../http/csv";
import { closenessRows, lessonCells, trialsByRig, type ClosenessRow, type LessonCellRow } from "./department-overview.repository";

type Query = z.output<typeof overviewQuerySchema>;

/** The range asked for, with the defaults filled in: a missing end is today (the school's day), a missing start 12 weeks back. */
export function resolveRange(query: Query, timeZone: string, now: Date = new Date()): { from: string; to: string } {
  const today = isoDayIn(now, timeZone);
  const to = query.to ?? (query.from && query.from > today ? query.from : today);
  const from = query.from ?? defaultOverviewRange(to).from;
  return { from, to };
}

interface Loaded {
  from: string;
  to: string;
  weeks: string[];
  cells: LessonCellRow[];
  closeness: ClosenessRow[];
  rigs: { rig: string; trialsRun: number }[];
}

/** Whose lessons, and in which school's days. */
export interface OverviewOf {
  departmentId: string;
  timeZone: string;
}

async function load(db: Db, of: OverviewOf, query: Query, now?: Date): Promise<Loaded> {
  const { from, to } = resolveRange(query, of.timeZone, now);
  const scope = { ...of, from, to: addDays(to, 1) };
  // Three small aggregate queries side by side on the pool.
  const [cells, closeness, rigs] = await Promise.all([lessonCells(db, scope), closenessRows(db, scope), trialsByRig(db, scope)]);
  return { from, to, weeks: weeksOverlapping(from, to), cells, closeness, rigs };
}

function series(weeks: string[], cells: LessonCellRow[], key: (c: LessonCellRow) => { id: string; name: string }): WeeklySeries[] {
  const index = new Map(weeks.map((w, i) => [w, i]));
  const byId = new Map<string, WeeklySeries>();
  for (const cell of cells) {
    const { id, name } = key(cell);
    let row = byId.get(id);
    if (!row) byId.set(id, (row = { id, name, perWeek: weeks.map(() => 0), total: 0 }));
    row.perWeek[index.get(cell.week)!]! += cell.lessons;
    row.total += cell.lessons;
  }
  return [...byId.values()].sort((a, b) => a.name.localeCompare(b.name, "en"));
}

/** The overview for one department (totals only: no pupil names, answers or ids). */
export async function departmentOverview(db: Db, of: OverviewOf, query: Query, now?: Date): Promise<DepartmentOverview> {
  const { from, to, weeks, cells, closeness, rigs } = await load(db, of, query, now);
  const index = new Map(weeks.map((w, i) => [w, i]));
  const pupilsPerWeek = weeks.map(() => 0);
  for (const cell of cells) pupilsPerWeek[index.get(cell.week)!]! += cell.pupils;

  const teacherNameOfClass = new Map(cells.map((c) => [c.classId, c.teacherName]));
  const byClass = series(weeks, cells, (c) => ({ id: c.classId, name: c.className }));

  const weekly = new Map(closeness.filter((r) => r.teacherId === null).map((r) => [r.week, r]));
  const closenessByWeek: WeeklyCloseness[] = weeks.map((week) => {
    const row = weekly.get(week);
    return {
      week,
      trialsCompared: row?.trialsCompared ?? 0,
      predictions: row?.predictions ?? 0,
      shareWithin10: row && row.predictions > 0 ? row.within10 / row.predictions : null,
      medianRelativeError: row?.medianRelError ?? null,
    };
  });

  return {
    from,
    to,
    timeZone: of.timeZone,
    weeks,
    totals: {
      lessons: cells.reduce((n, c) => n + c.lessons, 0),
      trialsRun: cells.reduce((n, c) => n + c.trialsRun, 0),
      pupilsTakingPart: cells.reduce((n, c) => n + c.pupils, 0),
      classesActive: new Set(cells.map((c) => c.classId)).size,
      teachersActive: new Set(cells.map((c) => c.teacherId)).size,
    },
    lessonsByTeacher: series(weeks, cells, (c) => ({ id: c.teacherId, name: c.teacherName })),
    lessonsByClass: byClass.map((row) => ({ ...row, teacherName: teacherNameOfClass.get(row.id) ?? "" })),
    pupilsPerWeek,
    trialsByRig: rigs,
    closeness: closenessByWeek,
  };
}

export const overviewCsvHeader = (timeZone: string) => [
  `Week starting (Monday, ${timeZone})`,
  "Teacher",
  "Class",
  "Lessons",
  "Trials run",
  "Pupils taking part",
  "Round-1 number predictions compared",
  "Within 10 % of result (%)",
  "Median relative error (%)",
];

const percent = (value: number | null) => (value === null ? "" : (value * 100).toFixed(1));

/** The overview as CSV: one row per week × teacher × class with lessons, totals only. */
export async function departmentOverviewCsv(db: Db, of: OverviewOf, query: Query, now?: Date): Promise<{ from: string; to: string; csv: string }> {
  const { from, to, cells, closeness } = await load(db, of, query, now);
  const fine = new Map(closeness.filter((r) => r.teacherId !== null).map((r) => [`${r.week}|${r.teacherId}|${r.classId}`, r]));
  const rows = cells.map((cell) => {
    const c = fine.get(`${cell.week}|${cell.teacherId}|${cell.classId}`);
    return [
      cell.week,
      cell.teacherName,
      cell.className,
      cell.lessons,
      cell.trialsRun,
      cell.pupils,
      c?.predictions ?? 0,
      percent(c && c.predictions > 0 ? c.within10 / c.predictions : null),
      percent(c?.medianRelError ?? null),
    ];
  });
  const csv = toCsv(overviewCsvHeader(of.timeZone), rows);
  return { from, to, csv };
}
