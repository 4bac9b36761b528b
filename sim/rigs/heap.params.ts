import type { z } from "zod";
import { chainSchema } from "../chain/link-shapes";
import { describedNumber } from "../params";
import type { RigCatalogEntry } from "./rig";
import { stepSchema } from "./time-step";

export const heapSchema = chainSchema.extend({
  speed: describedNumber("Lifting speed", "m/s", 0.2, 3, 1),
  liftHeight: describedNumber("Lift the end to", "m", 0.4, 2, 1.1),
  dt: stepSchema,
});
export type HeapParams = z.output<typeof heapSchema>;

/** The heap rig as the set-up form and the server see it; its world builder is in ./heap.ts. */
export const heapCatalogEntry: RigCatalogEntry<typeof heapSchema> = {
  id: "heap",
  label: "Lifting a chain off a heap",
  summary: "One end of a heaped chain is pulled straight up at a steady speed.",
  schema: heapSchema,
  headline: { key: "force", label: "Pulling force", unit: "N" },
};
