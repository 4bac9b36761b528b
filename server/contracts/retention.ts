import { z } from "zod";

/**
 * How long a school keeps pupil data. Shared by the settings page, the privacy page and the
 * purge job, so all three say and do the same thing.
 */
export const RETENTION_PERIODS = ["end_of_school_year", "days_90", "days_30"] as const;
export type RetentionPeriod = (typeof RETENTION_PERIODS)[number];
export const DEFAULT_RETENTION: RetentionPeriod = "end_of_school_year";

export const RETENTION_LABELS: Record<RetentionPeriod, string> = {
  end_of_school_year: "Until the end of the school year (31 August)",
  days_90: "For 90 days",
  days_30: "For 30 days",
};

/** The same periods as part of a sentence: "kept …". */
export const RETENTION_PHRASES: Record<RetentionPeriod, string> = {
  end_of_school_year: "until the end of the school year in which it was collected (the end of 31 August)",
  days_90: "for 90 days",
  days_30: "for 30 days",
};

const DAY_MS = 24 * 60 * 60 * 1000;

/**
 * Pupil data whose clock started before the returned moment has been kept long enough.
 * For the school year that moment is the most recent 1 September, 00:00 UTC, at or before `now`:
 * everything from a school year goes once that year is over. Day counts are exact 24-hour days.
 */
export function retentionCutoff(period: RetentionPeriod, now: Date): Date {
  if (period === "days_90") return new Date(now.getTime() - 90 * DAY_MS);
  if (period === "days_30") return new Date(now.getTime() - 30 * DAY_MS);
  const year = now.getUTCFullYear();
  const thisSeptember = Date.UTC(year, 8, 1);
  return new Date(now.getTime() >= thisSeptember ? thisSeptember : Date.UTC(year - 1, 8, 1));
}

/**
 * Kinds of pupil data a purge or a "delete now" removes: roster names, from live lessons the
 * names pupils joined with, their predictions (with reasons) and their explanations, and photos
 * of real runs (they may show pupils).
 */
export const PUPIL_DATA_KINDS = ["roster_names", "lesson_predictions", "lesson_explanations", "lesson_names", "run_photos"] as const;
export type PupilDataKind = (typeof PUPIL_DATA_KINDS)[number];
export const PUPIL_DATA_KIND_LABELS: Record<PupilDataKind, { one: string; many: string }> = {
  roster_names: { one: "roster name", many: "roster names" },
  lesson_predictions: { one: "lesson prediction", many: "lesson predictions" },
  lesson_explanations: { one: "lesson explanation", many: "lesson explanations" },
  lesson_names: { one: "name used in a lesson", many: "names used in lessons" },
  run_photos: { one: "photo of a real run", many: "photos of real runs" },
};

export const deletedCountSchema = z.object({ kind: z.enum(PUPIL_DATA_KINDS), count: z.number().int().min(0) });
export type DeletedCount = z.infer<typeof deletedCountSchema>;

export const purgeRunSchema = z.object({
  startedAt: z.string(),
  finishedAt: z.string().nullable(),
  status: z.enum(["succeeded", "failed"]),
  /** What this school lost in the run (empty when the run failed). */
  deleted: z.array(deletedCountSchema),
  /** Data from before this moment counted as past its time. */
  cutoff: z.string().nullable(),
});
export type PurgeRun = z.infer<typeof purgeRunSchema>;

export const retentionSettingsSchema = z.object({
  period: z.enum(RETENTION_PERIODS),
  lastRun: purgeRunSchema.nullable(),
  /** When the scheduled deletion runs next, if this server runs it. */
  nextRunAt: z.string().nullable(),
});
export type RetentionSettings = z.infer<typeof retentionSettingsSchema>;

export const updateRetentionInputSchema = z.object({
  period: z.enum(RETENTION_PERIODS, { error: "Choose one of the listed periods." }),
});
export type UpdateRetentionInput = z.infer<typeof updateRetentionInputSchema>;

/** What "delete this class's pupil data now" removed. */
export const pupilDataDeletionSchema = z.object({
  classId: z.uuid(),
  deleted: z.array(deletedCountSchema),
});
export type PupilDataDeletion = z.infer<typeof pupilDataDeletionSchema>;

/** A class as the school admin sees it on the pupil-data page: no pupil names, only counts. */
export const schoolClassSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  yearGroup: z.string(),
  subject: z.string(),
  teacher: z.object({ id: z.uuid(), displayName: z.string() }),
  archivedAt: z.string().nullable(),
  rosterCount: z.number().int(),
});
export type SchoolClass = z.infer<typeof schoolClassSchema>;
