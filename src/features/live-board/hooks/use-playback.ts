import { useEffect, useState, useSyncExternalStore } from "react";
import type { TrialRecording } from "@sim/catalog";
import { PlaybackController, type PlaybackSnapshot } from "./playback-controller";

/** One playback controller for the life of the board, fed the current recording. */
export function usePlaybackController(recording: TrialRecording | null): PlaybackController {
  const [controller] = useState(() => new PlaybackController());
  useEffect(() => controller.setRecording(recording), [controller, recording]);
  useEffect(() => () => controller.dispose(), [controller]);
  return controller;
}

/** The clock as the bar and the readout see it (a few updates a second while playing). */
export const usePlaybackSnapshot = (controller: PlaybackController): PlaybackSnapshot =>
  useSyncExternalStore(controller.subscribe, controller.getSnapshot);
