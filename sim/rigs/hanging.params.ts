import type { z } from "zod";
import { chainSchema } from "../chain/link-shapes";
import { describedNumber } from "../params";
import type { RigCatalogEntry } from "./rig";
import { stepSchema } from "./time-step";

export const hangingSchema = chainSchema
  .extend({
    span: describedNumber("Distance between the supports", "m", 0.2, 3, 1.6),
    heightDifference: describedNumber("Right support higher by", "m", -1, 1, 0),
    chainLength: describedNumber("Chain length", "m", 0.3, 5, 2),
    dt: stepSchema,
  })
  .refine((p) => p.chainLength > Math.hypot(p.span, p.heightDifference) * 1.01, {
    error: "chainLength: the chain must be at least 1 % longer than the straight line between the supports",
    path: ["chainLength"],
  });
export type HangingParams = z.output<typeof hangingSchema>;

/** The hanging rig as the set-up form and the server see it; its world builder is in ./hanging.ts. */
export const hangingCatalogEntry: RigCatalogEntry<typeof hangingSchema> = {
  id: "hanging",
  label: "Hanging chain",
  summary: "A chain hangs between two supports and settles into its curve.",
  schema: hangingSchema,
  headline: { key: "sag", label: "Sag below the lower support", unit: "m" },
};
