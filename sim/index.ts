/** Public face of the simulation: rigs with their world builders, runs, theory. Pure TypeScript (browser worker, Node, tests). */
export { RIGS, RIG_LIST } from "./rigs";
export { RIG_CATALOG } from "./rigs/catalog";
export type { RigCatalogEntry, RigDefinition, RigId, RigInstance, SceneLayout, SceneShape } from "./rigs/rig";
export { RIG_IDS } from "./rigs/rig";
export { runTrial, TrialRunner, type TrialOptions, type TrialRecording, type ElementLook } from "./run/run-trial";
export { LiveSimulation } from "./run/live";
export { frameAt, recordingDuration, seriesAt } from "./run/playback";
export { UnstableRunError } from "./rigs/common";
export { SHIPPED_DT } from "./rigs/time-step";
export { describeParamIssues, numberMetaOf, ParamError, parseParams, type NumberMeta } from "./params";
export { LINK_SHAPES, LINK_SHAPE_LABELS, type LinkShape } from "./chain/link-shapes";
export type { Series, Settled } from "./probes/series";
