import { fountainRig } from "./fountain";
import { hangingRig } from "./hanging";
import { heapRig } from "./heap";
import type { RigDefinition, RigId } from "./rig";

export const RIGS = {
  fountain: fountainRig,
  hanging: hangingRig,
  heap: heapRig,
} satisfies Partial<Record<RigId, RigDefinition>>;
