/** Public face of the simulation: rigs, runs, theory. Pure TypeScript (browser worker, Node, tests). */
export { RIGS, RIG_LIST } from "./rigs";
export type { RigDefinition, RigId, RigInstance, SceneLayout, SceneShape } from "./rigs/rig";
export { RIG_IDS } from "./rigs/rig";
export { runTrial, TrialRunner, type TrialOptions, type TrialRecording, type ElementLook } from "./run/run-trial";
export { LiveSimulation } from "./run/live";
export { frameAt, recordingDuration, seriesAt } from "./run/playback";
export { SHIPPED_DT, UnstableRunError } from "./rigs/common";
export { describeParamIssues, numberMetaOf, ParamError, parseParams, type NumberMeta } from "./params";
export { LINK_SHAPES, LINK_SHAPE_LABELS, type LinkShape } from "./chain/link-shapes";
export type { Series, Settled } from "./probes/series";
