import { foldedRig } from "./folded";
import { fountainRig } from "./fountain";
import { hangingRig } from "./hanging";
import { heapRig } from "./heap";
import type { RigDefinition, RigId } from "./rig";
import { scaleRig } from "./scale";

export const RIGS = {
  fountain: fountainRig,
  hanging: hangingRig,
  heap: heapRig,
  scale: scaleRig,
  folded: foldedRig,
} satisfies Partial<Record<RigId, RigDefinition>>;

export const RIG_LIST: RigDefinition[] = Object.values(RIGS);
