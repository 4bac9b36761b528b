import type { ElementLook, SceneLayout, SceneShape, TrialRecording } from "@sim/catalog";

/** What the board asks of the simulation worker. Any new request cancels the one before. */
export type SimRequest =
  /** The rig at rest (set-up phase): scene, elements and the first frame, no run. */
  | { type: "preview"; job: number; rig: string; params: Record<string, unknown>; seed: number }
  | { type: "run"; job: number; rig: string; params: Record<string, unknown>; seed: number; frameRate?: number; maxSeconds?: number }
  | { type: "cancel"; job: number };

export interface RigPreview {
  scene: SceneLayout;
  elements: ElementLook[];
  frame: Float32Array;
  movingShapes: SceneShape[];
}

export type SimReply =
  | { type: "preview"; job: number; preview: RigPreview }
  | { type: "progress"; job: number; share: number }
  | { type: "done"; job: number; recording: TrialRecording }
  | { type: "failed"; job: number; message: string };
