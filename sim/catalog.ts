/**
 * The simulation's matter-free face: what the staff pages' main thread and the server need to
 * know about rigs and their parameters without building a world. The world builders (and
 * matter-js) are reached only through sim/index.ts: the board's worker, the server, the CLI and
 * tests (tests/architecture/sim-main-thread.test.ts keeps it so).
 */
export { RIG_CATALOG } from "./rigs/catalog";
export { RIG_IDS, type RigCatalogEntry, type RigId, type SceneLayout, type SceneShape } from "./rigs/rig";
export { describeParamIssues, numberMetaOf, ParamError, parseParams, type NumberMeta } from "./params";
export { LINK_SHAPES, LINK_SHAPE_LABELS, type LinkShape } from "./chain/link-shapes";
export type { ElementLook, TrialRecording } from "./run/run-trial";
export type { Series, Settled } from "./probes/series";
