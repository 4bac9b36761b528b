import { foldedCatalogEntry } from "./folded.params";
import { fountainCatalogEntry } from "./fountain.params";
import { hangingCatalogEntry } from "./hanging.params";
import { heapCatalogEntry } from "./heap.params";
import type { RigCatalogEntry, RigId } from "./rig";
import { scaleCatalogEntry } from "./scale.params";

/** Every rig's label, parameter schema, headline and notes, keyed by rig id; no matter-js. */
export const RIG_CATALOG = {
  fountain: fountainCatalogEntry,
  hanging: hangingCatalogEntry,
  heap: heapCatalogEntry,
  scale: scaleCatalogEntry,
  folded: foldedCatalogEntry,
} satisfies Record<RigId, RigCatalogEntry>;
