import type { z } from "zod";
import { chainSchema } from "../chain/link-shapes";
import { describedNumber } from "../params";
import { CALIBRATED_PILE_NOTE, ROD_KICK_MODEL_NOTE } from "../theory/theory-notes";
import type { RigCatalogEntry } from "./rig";
import { stepSchema } from "./time-step";

export const fountainSchema = chainSchema.extend({
  potHeight: describedNumber("Height of the pot above the floor", "m", 0.2, 3, 1),
  links: describedNumber("Number of links", "", 100, 4000, 1000, true),
  potWidth: describedNumber("Inside width of the pot", "m", 0.04, 0.4, 0.11),
  /** Pile model: how many rows on top of the pile move freely (the rest wait, frozen). */
  looseRows: describedNumber("Loose rows on top of the pile", "", 2, 12, 3, true),
  // At most 0.5: beyond it the energy budget would have the pile giving the chain energy.
  theoryAlpha: describedNumber("Pot push α used by the theory line", "", 0, 0.5, 0.12),
  theoryBeta: describedNumber("Floor pull β used by the theory line", "", 0, 0.4, 0),
  dt: stepSchema,
});
export type FountainParams = z.output<typeof fountainSchema>;

/** The fountain rig as the set-up form and the server see it; its world builder is in ./fountain.ts. */
export const fountainCatalogEntry: RigCatalogEntry<typeof fountainSchema> = {
  id: "fountain",
  label: "Chain fountain",
  summary: "A long chain pours out of a raised pot, leaps above the rim and falls to the floor.",
  schema: fountainSchema,
  headline: { key: "rise", label: "Rise above the rim", unit: "m" },
  notes: [CALIBRATED_PILE_NOTE, ROD_KICK_MODEL_NOTE],
};
