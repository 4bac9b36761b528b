/**
 * What pupils can be asked to predict on each rig: the measured quantities (keys of the rig's
 * `measured` values in sim/), their SI unit, and a default question. Zod-free and sim-free, so
 * the pupil page and the server can both use it without loading the simulation.
 */
import type { RigId } from "../../sim/rigs/rig";

export interface QuestionQuantity {
  key: string;
  label: string;
  /** SI unit the simulation reports it in ("" for a ratio). */
  siUnit: string;
}

export const RIG_NAMES: Record<RigId, string> = {
  fountain: "Fountain rig",
  hanging: "Hanging rig",
  scale: "Scale rig",
  heap: "Heap rig",
  folded: "Folded-drop rig",
};

export const QUESTION_QUANTITIES: Record<RigId, readonly QuestionQuantity[]> = {
  fountain: [
    { key: "rise", label: "Rise of the chain above the rim", siUnit: "m" },
    { key: "speed", label: "Speed of the chain", siUnit: "m/s" },
    { key: "riseRatio", label: "Rise ÷ drop height", siUnit: "" },
  ],
  hanging: [
    { key: "sag", label: "Sag below the lower support", siUnit: "m" },
    { key: "endTension", label: "Pull at the higher support", siUnit: "N" },
    { key: "lowestTension", label: "Tension at the lowest point", siUnit: "N" },
  ],
  scale: [{ key: "readingRatio", label: "Scale reading ÷ weight of chain already on the pan", siUnit: "" }],
  heap: [{ key: "force", label: "Force needed to pull the chain up", siUnit: "N" }],
  folded: [
    { key: "accelRatio", label: "Acceleration of the falling end ÷ g", siUnit: "" },
    { key: "speedRatio", label: "Speed of the falling end ÷ free-fall speed", siUnit: "" },
  ],
};

/** The question a new trial of each rig starts with; the teacher can change it in "set up". */
export const DEFAULT_QUESTIONS: Record<RigId, { prompt: string; quantity: string; unit: string }> = {
  fountain: { prompt: "How high above the rim will the chain rise?", quantity: "rise", unit: "cm" },
  hanging: { prompt: "How far below the lower support will the chain sag?", quantity: "sag", unit: "cm" },
  scale: {
    prompt: "While the chain falls, the scale reads how many times the weight of chain already on the pan?",
    quantity: "readingRatio",
    unit: "",
  },
  heap: { prompt: "What force is needed to pull the chain up at this speed?", quantity: "force", unit: "N" },
  folded: {
    prompt: "The free end falls with what acceleration, as a multiple of g?",
    quantity: "accelRatio",
    unit: "",
  },
};

export function quantityOf(rig: RigId, key: string): QuestionQuantity | undefined {
  return QUESTION_QUANTITIES[rig].find((q) => q.key === key);
}
