import { z } from "zod";

/** Trimmed text with its own messages for blank and too long. */
const text = (label: string, max: number, example: string) =>
  z
    .string({ error: `Give the ${label}.` })
    .transform((s) => s.replace(/\s+/g, " ").trim())
    .pipe(
      z
        .string()
        .min(1, `Give the ${label}, for example ${example}.`)
        .max(max, `Keep the ${label} to ${max} characters or fewer.`)
        .refine((s) => !/[\u0000-\u001f\u007f]/.test(s), `The ${label} contains characters that cannot be shown.`),
    );

export const CLASS_LIMITS = { name: 60, yearGroup: 20, subject: 40 } as const;

export const classNameSchema = text("class name", CLASS_LIMITS.name, "“10P Physics”");
export const yearGroupSchema = text("year group", CLASS_LIMITS.yearGroup, "“Year 10”");
export const subjectSchema = text("subject", CLASS_LIMITS.subject, "“Physics”");

export const createClassInputSchema = z.object({
  name: classNameSchema,
  yearGroup: yearGroupSchema,
  subject: subjectSchema,
});
export type CreateClassInput = z.input<typeof createClassInputSchema>;
export type CreateClassValues = z.output<typeof createClassInputSchema>;

export const updateClassInputSchema = createClassInputSchema
  .partial()
  .refine((v) => Object.keys(v).length > 0, "Change at least one of name, year group or subject.");
export type UpdateClassInput = z.input<typeof updateClassInputSchema>;
export type UpdateClassValues = z.output<typeof updateClassInputSchema>;

export const classSummarySchema = z.object({
  id: z.uuid(),
  name: z.string(),
  yearGroup: z.string(),
  subject: z.string(),
  archivedAt: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
  teacher: z.object({ id: z.uuid(), displayName: z.string() }),
  rosterCount: z.number().int(),
  /** `owner`: the teacher's own class; `department`: seen read-only by the head of department. */
  access: z.enum(["owner", "department"]),
});
export type ClassSummary = z.infer<typeof classSummarySchema>;

export const classListQuerySchema = z.object({
  archived: z.enum(["exclude", "include", "only"]).default("exclude"),
});
export type ClassListQuery = z.input<typeof classListQuerySchema>;
export type ArchivedFilter = z.output<typeof classListQuerySchema>["archived"];
