import { z } from "zod";

/**
 * Bench data: a class's own measurements of real chain-fountain runs. Teachers type values in
 * the units they measured in; the server stores SI (metres, metres per second). The ranges
 * keep out slips of the unit (a pot height of 120 "m" meant cm) without judging the physics.
 */
export const HEIGHT_UNITS = ["m", "cm", "mm"] as const;
export type HeightUnit = (typeof HEIGHT_UNITS)[number];
export const SPEED_UNITS = ["m/s"] as const;
export type SpeedUnit = (typeof SPEED_UNITS)[number];

/** Metres in one of each unit. */
export const METRES_PER: Record<HeightUnit, number> = { m: 1, cm: 0.01, mm: 0.001 };

export const BENCH_SOURCES = ["typed", "csv", "photo"] as const;
export type BenchSource = (typeof BENCH_SOURCES)[number];

/** Accepted ranges, in SI. */
export const BENCH_RANGES = {
  potHeight: { min: 0.05, max: 5 },
  rise: { min: 0, max: 2 },
  speed: { min: 0, max: 20 },
} as const;
export const BENCH_LIMITS = { note: 200, runsPerRequest: 200 } as const;

export type BenchField = keyof typeof BENCH_RANGES;
export const BENCH_FIELD_LABELS: Record<BenchField, string> = {
  potHeight: "Pot height",
  rise: "Rise",
  speed: "Chain speed",
};

export const BENCH_VALUE_PROBLEMS = ["missing", "not_a_number", "out_of_range"] as const;
export type BenchValueProblem = (typeof BENCH_VALUE_PROBLEMS)[number];

export type BenchValueCheck =
  | { ok: true; si: number | null }
  | { ok: false; problem: BenchValueProblem; message: string };

/** Rounds away float noise from unit conversion (0.1 cm → 0.0010000000000000002 m). */
const tidy = (x: number) => Number(x.toPrecision(12));

/** Formats a range in the teacher's unit: "5–500 cm". */
export function rangeText(field: BenchField, unit: HeightUnit | SpeedUnit): string {
  const { min, max } = BENCH_RANGES[field];
  const per = unit === "m/s" ? 1 : METRES_PER[unit];
  return `${tidy(min / per)}–${tidy(max / per)} ${unit}`;
}

/**
 * One value as typed (text or number) in `unit`, checked and converted to SI. Blank is
 * allowed only where `optional`. Used by the form, the CSV preview and the API, so all three
 * say the same thing about the same value.
 */
export function checkBenchValue(
  raw: unknown,
  field: BenchField,
  unit: HeightUnit | SpeedUnit,
  optional = false,
): BenchValueCheck {
  const label = BENCH_FIELD_LABELS[field];
  const text = typeof raw === "number" ? String(raw) : typeof raw === "string" ? raw.trim() : raw == null ? "" : null;
  if (text === null) return { ok: false, problem: "not_a_number", message: `${label} must be a number.` };
  if (text === "") {
    return optional ? { ok: true, si: null } : { ok: false, problem: "missing", message: `${label} is missing.` };
  }
  // Accept a decimal comma ("1,25"), as spreadsheets in many countries write it.
  const normalised = text.replace(/^([+-]?\d+),(\d+)$/, "$1.$2");
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(normalised)) {
    return { ok: false, problem: "not_a_number", message: `${label} “${text}” is not a number.` };
  }
  const value = Number(normalised);
  const si = tidy(value * (unit === "m/s" ? 1 : METRES_PER[unit]));
  const { min, max } = BENCH_RANGES[field];
  if (!Number.isFinite(si) || si < min || si > max) {
    return { ok: false, problem: "out_of_range", message: `${label} must be between ${rangeText(field, unit)}.` };
  }
  return { ok: true, si };
}

const noteSchema = z
  .string({ error: "The note must be text." })
  .max(BENCH_LIMITS.note, `Keep the note to ${BENCH_LIMITS.note} characters or fewer.`)
  .transform((s) => s.replace(/\s+/g, " ").trim())
  .refine((s) => !/[\u0000-\u001f\u007f]/.test(s), "The note contains characters that cannot be shown.")
  .default("");

/** One run as typed: values in the chosen units. */
export const benchRunInputSchema = z
  .object({
    potHeight: z.union([z.number(), z.string()], { error: "Pot height must be a number." }).optional(),
    rise: z.union([z.number(), z.string()], { error: "Rise must be a number." }).optional(),
    speed: z.union([z.number(), z.string(), z.null()], { error: "Chain speed must be a number." }).optional(),
    heightUnit: z.enum(HEIGHT_UNITS, { error: "Choose m, cm or mm for heights." }),
    speedUnit: z.enum(SPEED_UNITS, { error: "Speeds are in m/s." }).default("m/s"),
    note: noteSchema,
  })
  .transform((run, ctx) => {
    const pot = checkBenchValue(run.potHeight, "potHeight", run.heightUnit);
    const rise = checkBenchValue(run.rise, "rise", run.heightUnit);
    const speed = checkBenchValue(run.speed, "speed", run.speedUnit, true);
    for (const [path, check] of [["potHeight", pot], ["rise", rise], ["speed", speed]] as const) {
      if (!check.ok) ctx.addIssue({ code: "custom", path: [path], message: check.message, params: { problem: check.problem } });
    }
    if (!pot.ok || !rise.ok || !speed.ok) return z.NEVER;
    return {
      potHeightM: pot.si!,
      riseM: rise.si!,
      speedMps: speed.si,
      heightUnit: run.heightUnit,
      note: run.note,
    };
  });
export type BenchRunInput = z.input<typeof benchRunInputSchema>;
export type BenchRunValues = z.output<typeof benchRunInputSchema>;

/** Typed in the form (one run) or read from a CSV file (many): saved all together or not at all. */
export const createBenchRunsInputSchema = z.object({
  source: z.enum(["typed", "csv"], { error: "Say whether the runs were typed or read from a file." }),
  runs: z
    .array(benchRunInputSchema)
    .min(1, "Add at least one run.")
    .max(BENCH_LIMITS.runsPerRequest, `Send at most ${BENCH_LIMITS.runsPerRequest} runs at once.`),
});
export type CreateBenchRunsInput = z.input<typeof createBenchRunsInputSchema>;

export const benchRunSchema = z.object({
  id: z.uuid(),
  classId: z.uuid(),
  /** Set once live lessons exist and a run is recorded in one. */
  lessonId: z.uuid().nullable(),
  potHeightM: z.number(),
  riseM: z.number(),
  speedMps: z.number().nullable(),
  /** The unit the teacher entered heights in, to show them back the same way. */
  heightUnit: z.enum(HEIGHT_UNITS),
  note: z.string(),
  source: z.enum(BENCH_SOURCES),
  /** The photo it was measured on; null for typed runs, or once that photo was deleted. */
  photoId: z.uuid().nullable(),
  createdAt: z.string(),
});
export type BenchRun = z.infer<typeof benchRunSchema>;

/** Photos of real runs: JPEG, PNG or WebP, checked by their content. */
export const PHOTO_MEDIA_TYPES = ["image/jpeg", "image/png", "image/webp"] as const;
export type PhotoMediaType = (typeof PHOTO_MEDIA_TYPES)[number];
export const PHOTO_MAX_BYTES = 8 * 1024 * 1024;
export const PHOTO_MAX_TEXT = "8 MB";

export const benchPhotoSchema = z.object({
  id: z.uuid(),
  classId: z.uuid(),
  mediaType: z.enum(PHOTO_MEDIA_TYPES),
  byteSize: z.number().int(),
  /** Where the image is served from (same origin, only to people who may read the class). */
  url: z.string(),
  createdAt: z.string(),
});
export type BenchPhoto = z.infer<typeof benchPhotoSchema>;
