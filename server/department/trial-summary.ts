import { and, eq, inArray, isNotNull, sql } from "drizzle-orm";
import { quantileSorted } from "simple-statistics";
import { isWithin10, perSiOf } from "../contracts/lesson-rules";
import type { Question } from "../contracts/lessons";
import type { Db } from "../db/client";
import { predictions, trials } from "../db/schema";

type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
type Writer = Pick<Db, "select" | "execute">;

/** What a trial keeps about its class's round-1 number predictions once it has a result. */
export interface TrialSummary {
  predictions: number;
  within10: number;
  /** Median over pupils of |prediction − result| / |result|; null with no answers or a result of 0. */
  medianRelError: number | null;
}


/**
 * The closeness figures of one trial. Values and result in the same unit. The median is R-7
 * (linear interpolation, simple-statistics `quantileSorted`), which is also what Postgres's
 * `percentile_cont(0.5)` computes, so the migration's back-fill agrees with this function.
 */
export function summariseTrial(values: readonly number[], result: number): TrialSummary {
  const finite = values.filter(Number.isFinite);
  const within10 = finite.filter((v) => isWithin10(v, result)).length;
  let medianRelError: number | null = null;
  if (finite.length > 0 && result !== 0) {
    const errors = finite.map((v) => Math.abs(v - result) / Math.abs(result)).sort((a, b) => a - b);
    medianRelError = quantileSorted(errors, 0.5);
  }
  return { predictions: finite.length, within10, medianRelError };
}

type Measured = Record<string, { value: number; unit: string }> | null;

/**
 * The recorded result in the question's unit (predictions are typed in it; results are SI), or
 * null when there is nothing to compare: no result, a multiple-choice question, an unknown unit.
 */
export function resultInQuestionUnit(question: Question, measured: Measured): number | null {
  if (question.kind !== "number" || !measured) return null;
  const settled = measured[question.quantity];
  if (!settled || !Number.isFinite(settled.value)) return null;
  const perSi = perSiOf(settled.unit, question.unit);
  return perSi === null ? null : settled.value * perSi;
}

/**
 * Works out and stores the summaries of these trials from their results and round-1 predictions.
 * Call it whenever a result is recorded (again); it is safe to call for any trial.
 */
export async function refreshTrialSummaries(db: Writer | Tx, trialIds: readonly string[]): Promise<void> {
  if (trialIds.length === 0) return;
  const rows = await db
    .select({ id: trials.id, question: trials.question, measured: trials.measured })
    .from(trials)
    .where(inArray(trials.id, [...trialIds]));
  const answers = await db
    .select({ trialId: predictions.trialId, value: predictions.value })
    .from(predictions)
    .where(and(inArray(predictions.trialId, [...trialIds]), eq(predictions.round, 1), isNotNull(predictions.value)));
  const byTrial = new Map<string, number[]>();
  for (const a of answers) {
    const list = byTrial.get(a.trialId) ?? [];
    list.push(a.value!);
    byTrial.set(a.trialId, list);
  }
  const values = rows.map((row) => {
    const result = resultInQuestionUnit(row.question, row.measured);
    const summary = result === null ? null : summariseTrial(byTrial.get(row.id) ?? [], result);
    return sql`(${row.id}::uuid, ${summary?.predictions ?? null}::integer, ${summary?.within10 ?? null}::integer, ${summary?.medianRelError ?? null}::double precision)`;
  });
  if (values.length === 0) return;
  await db.execute(sql`
    update ${trials} as t set
      summary_predictions = v.n, summary_within10 = v.within10, summary_median_rel_error = v.median_rel
    from (values ${sql.join(values, sql`, `)}) as v(id, n, within10, median_rel)
    where t.id = v.id`);
}
