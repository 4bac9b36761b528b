/**
 * A school year of invented live lessons for the department overview's benchmark: one invented
 * school with two departments, 12 teachers (the two heads teach too), 40 classes, ≈ 4,000
 * lessons and ≈ 150,000 predictions, from a seeded generator so the same seed gives the same
 * lessons, pupils, answers and results (row ids and resume-token hashes are random).
 *
 * Results are invented numbers in a plausible range for each rig, not simulation output.
 * Rows go in with one `insert … select * from unnest(…)` per table and chunk.
 *
 * `DATABASE_URL=postgres://… npx tsx scripts/seed-year.ts [--seed 2026] [--start 2025-09-01]`
 * (the database must be migrated; the bench, `npm run bench:overview`, calls `seedYear` itself).
 */
import { randomBytes, randomUUID } from "node:crypto";
import { fileURLToPath } from "node:url";
import { parseArgs } from "node:util";
import pg from "pg";
import { seededRandom, type Random } from "../sim/core/random";
import type { RigId } from "../sim/rigs/rig";
import { DEFAULT_QUESTIONS } from "../server/contracts/lesson-questions";
import { addDays, parseIsoDay } from "../server/contracts/department-overview";
import type { Question } from "../server/contracts/lessons";
import { defaultParams } from "../server/lessons/lessons.service";
import { resultInQuestionUnit, summariseTrial } from "../server/department/trial-summary";

export const YEAR_SCHOOL = "Harrowmere Grange School";
const DOMAIN = "harrowmere.example";

/** Invented staff: [display name, department index]; the first of each department is its head. */
const STAFF: readonly [string, 0 | 1][] = [
  ["Ines Calloway", 0],
  ["Rufus Pemberly", 0],
  ["Dalia Fenwick", 0],
  ["Osric Hale", 0],
  ["Noor Ashgrove", 0],
  ["Tobias Wrenfield", 0],
  ["Mireille Coombe", 0],
  ["Kwame Ellery", 0],
  ["Saoirse Lindell", 1],
  ["Anton Brackley", 1],
  ["Yara Holloway", 1],
  ["Piet Marlowe", 1],
];
const DEPARTMENTS = ["Science", "Engineering"] as const;
const FIRST_NAMES = [
  "Abe", "Bryn", "Cleo", "Dev", "Esme", "Fox", "Gia", "Hugo", "Ivy", "Jax", "Kit", "Luz", "Milo", "Nia", "Orla", "Pim",
  "Reza", "Suki", "Theo", "Uri", "Vida", "Wes", "Xan", "Yuki", "Zed", "Arlo", "Bex", "Cai", "Dot", "Eli", "Fen", "Gwen",
];
const INITIALS = "ABCDEFGHJKLMNPRSTVW";

/** Weeks with no lessons (half terms and holidays), as offsets from the first Monday. */
const HOLIDAY_WEEKS = new Set([8, 16, 17, 24, 31, 32, 38]);
const TEACHING_WEEKS = 46;

/** How often each rig is used (fountains most), and an invented range for its result (SI). */
const RIG_MIX: readonly { rig: RigId; weight: number; result: [number, number] }[] = [
  { rig: "fountain", weight: 0.4, result: [0.08, 0.3] },
  { rig: "hanging", weight: 0.2, result: [0.1, 0.4] },
  { rig: "scale", weight: 0.15, result: [2.6, 3.2] },
  { rig: "heap", weight: 0.15, result: [0.5, 3] },
  { rig: "folded", weight: 0.1, result: [1.1, 1.6] },
];
const SI_UNIT: Record<RigId, string> = { fountain: "m", hanging: "m", scale: "", heap: "N", folded: "" };

export interface SeedYearOptions {
  seed?: number;
  /** The first Monday of the school year (YYYY-MM-DD). */
  start?: string;
  /** Lessons per class and teaching week, on average. */
  lessonsPerClassWeek?: number;
  log?: (line: string) => void;
}

export interface SeededYear {
  schoolId: string;
  departments: { id: string; name: string; head: { email: string; name: string } }[];
  first: string;
  last: string;
  counts: { lessons: number; participants: number; trials: number; predictions: number };
  ms: number;
}

function pick<T>(random: Random, items: readonly T[]): T {
  return items[Math.floor(random.next() * items.length)]!;
}

function pickRig(random: Random): (typeof RIG_MIX)[number] {
  let u = random.next();
  for (const mix of RIG_MIX) if ((u -= mix.weight) < 0) return mix;
  return RIG_MIX[RIG_MIX.length - 1]!;
}

/** A standard normal number (Box–Muller). */
function normal(random: Random): number {
  return Math.sqrt(-2 * Math.log(1 - random.next())) * Math.cos(2 * Math.PI * random.next());
}

/** Column arrays for one table, flushed with `insert … select * from unnest(…)`. */
class Bulk {
  private columns: unknown[][];
  rows = 0;
  constructor(
    private table: string,
    private names: string[],
    private types: string[],
  ) {
    this.columns = names.map(() => []);
  }
  push(...values: unknown[]) {
    values.forEach((v, i) => this.columns[i]!.push(v));
    this.rows++;
  }
  async flush(client: pg.PoolClient | pg.Client, chunk = 20_000) {
    const total = this.columns[0]!.length;
    const list = this.names.map((n) => `"${n}"`).join(", ");
    const params = this.types.map((t, i) => `$${i + 1}::${t}[]`).join(", ");
    for (let at = 0; at < total; at += chunk)
      await client.query(`insert into "${this.table}" (${list}) select * from unnest(${params})`, this.columns.map((c) => c.slice(at, at + chunk)));
    this.columns = this.names.map(() => []);
  }
}

export async function seedYear(pool: pg.Pool, options: SeedYearOptions = {}): Promise<SeededYear> {
  const t0 = performance.now();
  const log = options.log ?? console.log;
  const random = seededRandom(options.seed ?? 2026);
  const start = options.start ?? "2025-09-01";
  if (parseIsoDay(start)?.getUTCDay() !== 1) throw new Error(`--start must be a Monday, got ${start}`);
  const perClassWeek = options.lessonsPerClassWeek ?? 2.6;

  const client = await pool.connect();
  try {
    const existing = await client.query("select 1 from schools where name = $1", [YEAR_SCHOOL]);
    if (existing.rowCount) throw new Error(`${YEAR_SCHOOL} is already in this database: seed a fresh one.`);
    await client.query("begin");
    const schoolId = randomUUID();
    await client.query("insert into schools (id, name) values ($1, $2)", [schoolId, YEAR_SCHOOL]);
    const departments = DEPARTMENTS.map((name) => ({ id: randomUUID(), name }));
    for (const d of departments) await client.query("insert into departments (id, school_id, name) values ($1, $2, $3)", [d.id, schoolId, d.name]);

    const staffRows = STAFF.map(([name, dept], i) => ({
      id: randomUUID(),
      name,
      dept,
      email: `${name.toLowerCase().replace(/[^a-z]+/g, ".")}@${DOMAIN}`,
      role: i === 0 || STAFF[i - 1]![1] !== dept ? "head_of_department" : "teacher",
    }));
    const staffBulk = new Bulk("staff", ["id", "school_id", "department_id", "email", "display_name", "role"], ["uuid", "uuid", "uuid", "text", "text", "staff_role"]);
    for (const s of staffRows) staffBulk.push(s.id, schoolId, departments[s.dept]!.id, s.email, s.name, s.role);
    await staffBulk.flush(client);

    // 40 classes: Science's eight teachers have 3 or 4 each (28), Engineering's four have 3 each (12).
    const classRows: { id: string; teacher: (typeof staffRows)[number]; name: string; size: number; roster: string[] }[] = [];
    const classBulk = new Bulk("classes", ["id", "school_id", "department_id", "teacher_id", "name", "year_group", "subject"], ["uuid", "uuid", "uuid", "uuid", "text", "text", "text"]);
    staffRows.forEach((teacher, t) => {
      const count = teacher.dept === 0 ? (t % 2 === 0 ? 4 : 3) : 3;
      for (let c = 0; c < count; c++) {
        const year = 7 + ((t + c * 3) % 7);
        const set = "ABCDEFGHJK"[(t * 4 + c) % 10]!;
        const subject = teacher.dept === 0 ? (year >= 12 ? "Physics" : "Science") : "Engineering";
        const name = `${year}${set} ${subject}`;
        const size = 18 + Math.floor(random.next() * 13);
        const roster = Array.from(new Set(Array.from({ length: size * 2 }, () => `${pick(random, FIRST_NAMES)} ${pick(random, [...INITIALS])}.`))).slice(0, size);
        const id = randomUUID();
        classRows.push({ id, teacher, name, size: roster.length, roster });
        classBulk.push(id, schoolId, departments[teacher.dept]!.id, teacher.id, name, `Year ${year}`, subject);
      }
    });
    await classBulk.flush(client);

    const lessonBulk = new Bulk(
      "lessons",
      ["id", "class_id", "teacher_id", "code", "status", "started_at", "ended_at", "participant_count"],
      ["uuid", "uuid", "uuid", "varchar", "text", "timestamptz", "timestamptz", "int4"],
    );
    const participantBulk = new Bulk(
      "lesson_participants",
      ["id", "lesson_id", "display_name", "resume_token_hash", "joined_at"],
      ["uuid", "uuid", "text", "text", "timestamptz"],
    );
    const trialBulk = new Bulk(
      "trials",
      ["id", "lesson_id", "position", "rig", "params", "question", "phase", "seed", "measured", "ran_at", "summary_predictions", "summary_within10", "summary_median_rel_error"],
      ["uuid", "uuid", "int4", "text", "jsonb", "jsonb", "text", "int4", "jsonb", "timestamptz", "int4", "int4", "float8"],
    );
    const predictionBulk = new Bulk(
      "predictions",
      ["id", "trial_id", "participant_id", "round", "client_id", "value", "choice", "reason", "created_at", "updated_at"],
      ["uuid", "uuid", "uuid", "int4", "uuid", "float8", "int4", "text", "timestamptz", "timestamptz"],
    );

    const weeks = Array.from({ length: TEACHING_WEEKS }, (_, w) => w).filter((w) => !HOLIDAY_WEEKS.has(w));
    const firstDay = start;
    let lastDay = start;
    for (const [weekIndex, w] of weeks.entries()) {
      const monday = addDays(start, 7 * w);
      // Classes get closer as the year goes on: answers spread less around the result.
      const spread = 0.45 - 0.25 * (weekIndex / weeks.length);
      for (const cls of classRows) {
        const n = Math.floor(perClassWeek + random.next());
        for (let k = 0; k < n; k++) {
          const day = addDays(monday, Math.floor(random.next() * 5));
          if (day > lastDay) lastDay = day;
          const startedAt = new Date(parseIsoDay(day)!.getTime() + (8 * 60 + 50 + Math.floor(random.next() * 6) * 60) * 60_000);
          const lessonId = randomUUID();
          const present = cls.roster.filter(() => random.next() < 0.88);
          // Ended, as the board ends them: with the count of pupils who took part.
          lessonBulk.push(lessonId, cls.id, cls.teacher.id, "YEAR00", "ended", startedAt, new Date(startedAt.getTime() + 50 * 60_000), present.length);
          const pupilIds = present.map((name, p) => {
            const id = randomUUID();
            participantBulk.push(id, lessonId, name, randomBytes(32).toString("hex"), new Date(startedAt.getTime() + (60 + p * 5) * 1000));
            return id;
          });
          const trialCount = 1 + Math.floor(random.next() * 3);
          for (let position = 1; position <= trialCount; position++) {
            const { rig, result: range } = pickRig(random);
            const defaults = DEFAULT_QUESTIONS[rig];
            const isChoice = random.next() < 0.15;
            const question: Question = isChoice
              ? { kind: "choice", prompt: defaults.prompt, quantity: defaults.quantity, unit: defaults.unit, askReason: true, askExplanation: true, revote: true, choices: [{ label: "Less than the last one", min: null, max: null }, { label: "More than the last one", min: null, max: null }] }
              : { kind: "number", prompt: defaults.prompt, quantity: defaults.quantity, unit: defaults.unit, askReason: true, askExplanation: true, revote: random.next() < 0.2 };
            const ran = random.next() < 0.88;
            const trialId = randomUUID();
            const siValue = range[0] + (range[1] - range[0]) * random.next();
            const measured = ran ? { [defaults.quantity]: { value: siValue, uncertainty: siValue * 0.03, unit: SI_UNIT[rig], basis: "Invented for the year of bench data" } } : null;
            const ranAt = ran ? new Date(startedAt.getTime() + (10 + 12 * position) * 60_000) : null;
            const result = resultInQuestionUnit(question, measured);
            const values: number[] = [];
            const answerAt = new Date(startedAt.getTime() + (6 + 12 * position) * 60_000);
            for (const pupilId of pupilIds) {
              if (random.next() > 0.75) continue;
              if (isChoice) {
                predictionBulk.push(randomUUID(), trialId, pupilId, 1, randomUUID(), null, random.next() < 0.5 ? 0 : 1, "", answerAt, answerAt);
                continue;
              }
              // Around the result (or an invented one for a trial never run), with a bias to guess low.
              const centre = result ?? (range[0] + range[1]) / 2;
              const raw = centre * Math.exp(-0.1 + spread * normal(random));
              const value = Math.round(raw * 10) / 10;
              values.push(value);
              predictionBulk.push(randomUUID(), trialId, pupilId, 1, randomUUID(), value, null, "", answerAt, answerAt);
              if (question.revote && ran && random.next() < 0.8) {
                const again = Math.round(centre * Math.exp(spread * 0.5 * normal(random)) * 10) / 10;
                const later = new Date(answerAt.getTime() + 15 * 60_000);
                predictionBulk.push(randomUUID(), trialId, pupilId, 2, randomUUID(), again, null, "", later, later);
              }
            }
            const summary = result === null ? null : summariseTrial(values, result);
            trialBulk.push(
              trialId, lessonId, position, rig, JSON.stringify(defaultParams(rig)), JSON.stringify(question),
              ran ? (question.revote ? "revote" : "explain") : "predict", ran ? 1 : null, measured ? JSON.stringify(measured) : null, ranAt,
              summary?.predictions ?? null, summary?.within10 ?? null, summary?.medianRelError ?? null,
            );
          }
        }
      }
    }
    const counts = { lessons: lessonBulk.rows, participants: participantBulk.rows, trials: trialBulk.rows, predictions: predictionBulk.rows };
    log(`  generated ${counts.lessons} lessons, ${counts.participants} pupils taking part, ${counts.trials} trials, ${counts.predictions} predictions in ${(performance.now() - t0).toFixed(0)} ms; inserting…`);
    await lessonBulk.flush(client);
    await participantBulk.flush(client);
    await trialBulk.flush(client);
    await predictionBulk.flush(client);
    await client.query("commit");
    // As autovacuum leaves a table in use: statistics and visibility map up to date.
    await client.query("vacuum analyze");
    const heads = staffRows.filter((s) => s.role === "head_of_department");
    return {
      schoolId,
      departments: departments.map((d, i) => ({ ...d, head: { email: heads[i]!.email, name: heads[i]!.name } })),
      first: firstDay,
      last: lastDay,
      counts,
      ms: performance.now() - t0,
    };
  } catch (error) {
    await client.query("rollback").catch(() => {});
    throw error;
  } finally {
    client.release();
  }
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const { values } = parseArgs({ options: { seed: { type: "string", default: "2026" }, start: { type: "string", default: "2025-09-01" } } });
  const url = process.env.DATABASE_URL;
  if (!url) {
    console.error("Set DATABASE_URL to a migrated Linkleap database.");
    process.exit(2);
  }
  const pool = new pg.Pool({ connectionString: url });
  seedYear(pool, { seed: Number(values.seed), start: values.start })
    .then((year) => {
      console.log(`Seeded ${YEAR_SCHOOL} (${year.first} to ${year.last}) in ${(year.ms / 1000).toFixed(1)} s:`, year.counts);
      for (const d of year.departments) console.log(`  ${d.name}: head of department ${d.head.name} <${d.head.email}>`);
    })
    .finally(() => pool.end())
    .catch((error) => {
      console.error(error);
      process.exitCode = 1;
    });
}
