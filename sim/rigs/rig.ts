import type { z } from "zod";
import type { Chain } from "../chain/chain";
import type { World } from "../core/world";
import type { Series, Settled } from "../probes/series";

export const RIG_IDS = ["fountain", "hanging", "scale", "heap", "folded"] as const;
export type RigId = (typeof RIG_IDS)[number];

/** A fixed shape of the scene, SI units, y up: drawn behind the chain. */
export type SceneShape =
  | { kind: "rect"; role: "floor" | "wall" | "pot" | "pan" | "support" | "table"; x: number; y: number; width: number; height: number; angle: number }
  | { kind: "circle"; role: "rim" | "support" | "hook"; x: number; y: number; radius: number };

export interface SceneLayout {
  shapes: SceneShape[];
  /** Region worth showing, metres: [xMin, yMin, xMax, yMax]. */
  view: [number, number, number, number];
  /** Heights worth labelling (e.g. the rim, the floor), metres. */
  marks: { label: string; y: number }[];
}

/** A running trial of one rig: the rig moves its own fixtures and samples its probes. */
export interface RigInstance {
  world: World;
  chain: Chain;
  /** How long the trial runs, s (simulated). */
  duration: number;
  /** Advance one fixed step (fixtures, world, bookkeeping). */
  step(): void;
  /** Sample the probes at simulated time t (called at the probe rate). */
  sample(t: number): void;
  /** True once the trial has nothing more to show (e.g. the chain has all left the pot). */
  finished(): boolean;
  series(): Series[];
  /** Settled values of what pupils predict, with uncertainties. */
  measured(): Record<string, Settled>;
  theory(): Record<string, number>;
  scene(): SceneLayout;
  /** A body moved by the rig that should be drawn with the chain (the scale pan, the puller). */
  movingShapes?(): SceneShape[];
  /** Elements not to draw right now (e.g. chain still waiting deep in the pot). */
  hidden?(index: number): boolean;
}

/**
 * What the set-up form, the theory panel and the server need to know about a rig without
 * building a world: kept apart from the builder so the staff pages' main thread never loads
 * matter-js (sim/catalog.ts).
 */
export interface RigCatalogEntry<S extends z.ZodType = z.ZodType> {
  id: RigId;
  label: string;
  /** One line for pupils: what happens in this rig. */
  summary: string;
  schema: S;
  /** Plain notes to show wherever this rig's results are shown. */
  notes?: string[];
  /** The value pupils are usually asked to predict, by default. */
  headline: { key: string; label: string; unit: string };
}

/** A catalog entry with its world builder (sim/index.ts: the worker, the server, the CLI, tests). */
export interface RigDefinition<S extends z.ZodType = z.ZodType> extends RigCatalogEntry<S> {
  create(params: z.output<S>, seed: number): RigInstance;
}
