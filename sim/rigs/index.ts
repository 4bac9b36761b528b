import type { RIG_CATALOG } from "./catalog";
import { foldedRig } from "./folded";
import { fountainRig } from "./fountain";
import { hangingRig } from "./hanging";
import { heapRig } from "./heap";
import type { RigDefinition, RigId } from "./rig";
import { scaleRig } from "./scale";

/** The catalog's rigs with their world builders (each builder spreads its catalog entry). */
export const RIGS = {
  fountain: fountainRig,
  hanging: hangingRig,
  heap: heapRig,
  scale: scaleRig,
  folded: foldedRig,
} satisfies { [K in RigId]: RigDefinition & (typeof RIG_CATALOG)[K] };

export const RIG_LIST: RigDefinition[] = Object.values(RIGS);
