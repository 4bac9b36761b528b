import type { LessonReview, ReviewTrial } from "../contracts/lesson-review";
import { toCsv, type CsvCell } from "../http/csv";

/** Six significant figures: measured and theory values carry more digits than they mean. */
const sig = (v: number | null | undefined): number | null => (v === null || v === undefined || !Number.isFinite(v) ? null : Number(v.toPrecision(6)));
/** A relative error as a percentage with one decimal. */
const percent = (e: number | null | undefined): number | null => (e === null || e === undefined ? null : Math.round(e * 1000) / 10);
const unitSuffix = (unit: string) => (unit ? ` (${unit})` : "");

/** The lesson's number-question units in order of first use: one value column per unit, named with it. */
function unitsOf(review: LessonReview): string[] {
  const units: string[] = [];
  for (const t of review.trials) if (!units.includes(t.question.unit)) units.push(t.question.unit);
  return units;
}

interface ParamColumn {
  key: string;
  unit: string;
  header: string;
}

/** Every parameter any trial used, once, named with its unit ("height of the pot above the floor (m)"). */
function paramColumnsOf(review: LessonReview): ParamColumn[] {
  const columns: ParamColumn[] = [];
  for (const t of review.trials) {
    for (const p of t.shownParams) {
      if (columns.some((c) => c.key === p.key && c.unit === p.unit)) continue;
      columns.push({ key: p.key, unit: p.unit, header: `${p.label.charAt(0).toLowerCase()}${p.label.slice(1)}${unitSuffix(p.unit)}` });
    }
  }
  return columns;
}

/** The columns every export starts with: which trial, its rig and question, and its set-up. */
const trialHeader = (params: ParamColumn[]) => ["trial", "rig", "question", ...params.map((c) => c.header)];

const trialCells = (trial: ReviewTrial, columns: ParamColumn[]): CsvCell[] => [
  trial.position,
  trial.rigLabel,
  trial.question.prompt,
  ...columns.map((c) => {
    const p = trial.shownParams.find((x) => x.key === c.key && x.unit === c.unit);
    return p === undefined ? null : p.value;
  }),
];

/** Per unit: this trial's value in the column of its own unit, empty in the others. */
const inUnitColumns = (units: string[], unit: string, value: number | null): CsvCell[] => units.map((u) => (u === unit ? value : null));

/**
 * One row per prediction from a pupil's device (a show of hands has no pupil: its answers are
 * counted in the results export). Numbers in the question's unit, named in the column header.
 * The pupil's explanation of the trial is on each of their rows for it (so on the re-vote row too);
 * an explanation from a pupil with no prediction for the trial has a row with the round left empty.
 */
export function predictionsCsv(review: LessonReview): string {
  const units = unitsOf(review);
  const params = paramColumnsOf(review);
  const header = [
    ...trialHeader(params),
    "pupil",
    "round",
    ...units.map((u) => `prediction${unitSuffix(u)}`),
    "choice",
    "reason",
    "explanation",
    ...units.map((u) => `result${unitSuffix(u)}`),
    ...units.map((u) => `theory${unitSuffix(u)}`),
    "relative error (%)",
    "absolute relative error (%)",
    "within 10 %",
    "submitted at (UTC)",
  ];
  const rows: CsvCell[][] = [];
  for (const t of review.trials) {
    const unit = t.question.unit;
    for (const p of t.predictions) {
      rows.push([
        ...trialCells(t, params),
        p.pupil,
        p.round === 1 ? "before the run" : "re-vote",
        ...inUnitColumns(units, unit, p.value),
        p.choiceLabel,
        p.reason,
        t.explanations
          .filter((e) => e.participantId === p.participantId)
          .map((e) => e.text)
          .join(" / "),
        ...inUnitColumns(units, unit, sig(t.result?.value)),
        ...inUnitColumns(units, unit, sig(t.theory?.value)),
        percent(p.closeness?.signedRelativeError),
        percent(p.closeness?.absoluteRelativeError),
        p.closeness ? (p.closeness.within10 ? "yes" : "no") : null,
        p.submittedAt,
      ]);
    }
    // A pupil may explain without having predicted (joined late, say): their explanation gets a
    // row of its own, with no round and no prediction, so no export loses it.
    const predicted = new Set(t.predictions.map((p) => p.participantId));
    const unpaired = t.explanations.filter((e) => !predicted.has(e.participantId));
    for (const participantId of new Set(unpaired.map((e) => e.participantId))) {
      const mine = unpaired.filter((e) => e.participantId === participantId);
      rows.push([
        ...trialCells(t, params),
        mine[0]!.pupil,
        null,
        ...inUnitColumns(units, unit, null),
        null,
        null,
        mine.map((e) => e.text).join(" / "),
        ...inUnitColumns(units, unit, sig(t.result?.value)),
        ...inUnitColumns(units, unit, sig(t.theory?.value)),
        null,
        null,
        null,
        mine[0]!.submittedAt,
      ]);
    }
  }
  return toCsv(header, rows);
}

/** One row per trial: set-up, result, theory, and the class's answers in totals (devices and show of hands). */
export function resultsCsv(review: LessonReview): string {
  const units = unitsOf(review);
  const params = paramColumnsOf(review);
  const header = [
    ...trialHeader(params),
    ...units.map((u) => `result${unitSuffix(u)}`),
    ...units.map((u) => `result uncertainty${unitSuffix(u)}`),
    ...units.map((u) => `theory${unitSuffix(u)}`),
    "answers before the run",
    ...units.map((u) => `median before the run${unitSuffix(u)}`),
    ...units.map((u) => `spread before the run (interquartile range)${unitSuffix(u)}`),
    "within 10 % before the run",
    "answers in the re-vote",
    ...units.map((u) => `median in the re-vote${unitSuffix(u)}`),
    "within 10 % in the re-vote",
    "explanations",
    "run at (UTC)",
  ];
  const rows: CsvCell[][] = review.trials.map((t) => {
    const unit = t.question.unit;
    const [first, second] = [t.summary[1], t.summary[2]];
    return [
      ...trialCells(t, params),
      ...inUnitColumns(units, unit, sig(t.result?.value)),
      ...inUnitColumns(units, unit, sig(t.result?.uncertainty)),
      ...inUnitColumns(units, unit, sig(t.theory?.value)),
      first.count,
      ...inUnitColumns(units, unit, sig(first.median)),
      ...inUnitColumns(units, unit, sig(first.spread)),
      first.within10,
      second.count,
      ...inUnitColumns(units, unit, sig(second.median)),
      second.within10,
      t.explanations.length,
      t.ranAt,
    ];
  });
  return toCsv(header, rows);
}

/** "11X-Physics-2026-12-02-predictions.csv": ASCII letters, digits and dashes only, safe in any header. */
export function exportFileName(review: LessonReview, kind: "predictions" | "results"): string {
  const ascii = review.lesson.className
    .normalize("NFKD")
    // Accents come apart from their letters under NFKD: drop the marks, keep the letters.
    .replace(/\p{M}/gu, "")
    .replace(/[^A-Za-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60);
  const date = review.lesson.startedAt.slice(0, 10);
  return `${ascii || "class"}-${date}-${kind}.csv`;
}
