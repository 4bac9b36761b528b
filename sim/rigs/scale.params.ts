import type { z } from "zod";
import { chainSchema } from "../chain/link-shapes";
import { describedNumber } from "../params";
import type { RigCatalogEntry } from "./rig";
import { stepSchema } from "./time-step";

export const scaleSchema = chainSchema.extend({
  chainLength: describedNumber("Chain length", "m", 0.3, 3, 1),
  dt: stepSchema,
});
export type ScaleParams = z.output<typeof scaleSchema>;

/** The scale rig as the set-up form and the server see it; its world builder is in ./scale.ts. */
export const scaleCatalogEntry: RigCatalogEntry<typeof scaleSchema> = {
  id: "scale",
  label: "Chain falling onto a scale",
  summary: "A chain hanging just above a scale pan is let go and piles up on the pan.",
  schema: scaleSchema,
  headline: { key: "readingRatio", label: "Reading ÷ weight already on the pan", unit: "" },
};
