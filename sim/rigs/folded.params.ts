import { z } from "zod";
import { chainSchema } from "../chain/link-shapes";
import { describedNumber } from "../params";
import type { RigCatalogEntry } from "./rig";
import { stepSchema } from "./time-step";

export const foldedSchema = chainSchema.extend({
  chainLength: describedNumber("Chain length", "m", 0.3, 3, 1),
  dt: stepSchema,
  /**
   * Joint lever arms from the start of each step (default): links flip over fast in the bend,
   * and the predicted-angle solve loses energy there (sim/core/world.test.ts). Off only to
   * show that loss.
   */
  leverFromStepStart: z.boolean().default(true),
});
export type FoldedParams = z.output<typeof foldedSchema>;

/** The folded rig as the set-up form and the server see it; its world builder is in ./folded.ts. */
export const foldedCatalogEntry: RigCatalogEntry<typeof foldedSchema> = {
  id: "folded",
  label: "Folded chain drop",
  summary: "A chain hangs in a U from one fixed end; the other end, held level with it, is let go.",
  schema: foldedSchema,
  headline: { key: "accelRatio", label: "Free end's acceleration ÷ g (x from 0.4 L to 0.6 L)", unit: "" },
};
