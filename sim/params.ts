import { z } from "zod";

/** What --help and the set-up form show about a number parameter. */
export interface NumberMeta {
  label: string;
  unit: string;
  min: number;
  max: number;
  default: number;
  integer?: boolean;
}

const rangeText = (meta: NumberMeta) =>
  `${meta.label} must be ${meta.integer ? "a whole number " : ""}from ${meta.min} to ${meta.max}${meta.unit ? ` ${meta.unit}` : ""}`;

/** A number with a unit, a range and a default; out-of-range input is refused naming all three. */
export function describedNumber(label: string, unit: string, min: number, max: number, fallback: number, integer = false) {
  const meta: NumberMeta = { label, unit, min, max, default: fallback, integer };
  const message = rangeText(meta);
  let schema = z.number({ error: message }).min(min, { error: message }).max(max, { error: message });
  if (integer) schema = schema.int({ error: message });
  return schema.default(fallback).meta({ number: meta });
}

export function numberMetaOf(schema: z.ZodType): NumberMeta | undefined {
  const meta = schema.meta() as { number?: NumberMeta } | undefined;
  return meta?.number;
}

/** Turn zod issues into one line per parameter: "potHeight: Pot height must be from 0.2 to 3 m". */
export function describeParamIssues(error: z.ZodError): string[] {
  return error.issues.map((issue) => `${issue.path.join(".") || "(parameters)"}: ${issue.message}`);
}

export class ParamError extends Error {
  constructor(readonly problems: string[]) {
    super(`Bad parameters:\n${problems.map((p) => `  - ${p}`).join("\n")}`);
    this.name = "ParamError";
  }
}

export function parseParams<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const result = schema.safeParse(input);
  if (!result.success) throw new ParamError(describeParamIssues(result.error));
  return result.data;
}
