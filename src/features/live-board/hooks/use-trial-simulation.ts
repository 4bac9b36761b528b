import { useEffect, useRef, useState } from "react";
import type { TrialPhase } from "@contracts/lesson-rules";
import type { TrialRecording } from "@sim/catalog";
import { createSimWorker } from "../worker/create-sim-worker";
import type { RigPreview, SimReply, SimRequest } from "../worker/sim-messages";

export interface SimulatedTrial {
  id: string;
  rig: string;
  params: Record<string, unknown>;
  phase: TrialPhase;
  seed: number;
}

export interface TrialSimulation {
  /** The rig at rest: the scene, elements and the first frame. */
  preview: RigPreview | null;
  /** The finished run, ready to play. */
  recording: TrialRecording | null;
  /** Share of the run done while it computes (0…1), else null. */
  progress: number | null;
  error: string | null;
  /** Which set-up these belong to (trial id, rig, parameters, seed). */
  setupKey: string | null;
}

const EMPTY: TrialSimulation = { preview: null, recording: null, progress: null, error: null, setupKey: null };
/** Wait this long after the last set-up change before drawing the rig anew, ms. */
const PREVIEW_DELAY_MS = 250;

export const setupKeyOf = (trial: Pick<SimulatedTrial, "id" | "rig" | "params" | "seed">) => JSON.stringify([trial.id, trial.rig, trial.params, trial.seed]);

/**
 * Runs the current trial in the simulation worker. In "set up" the rig is drawn at rest after
 * each change; as soon as the set-up is fixed (any later phase) the run starts, so it is usually
 * ready by the time the teacher presses Run. A changed set-up cancels the run before it.
 */
export function useTrialSimulation(trial: SimulatedTrial | null, options: { maxSeconds?: number } = {}): TrialSimulation {
  const worker = useRef<Worker | null>(null);
  const job = useRef(0);
  const [state, setState] = useState<TrialSimulation>(EMPTY);
  const wanted = useRef<{ key: string; previewJob: number; runJob: number }>({ key: "", previewJob: -1, runJob: -1 });

  useEffect(() => {
    const w = createSimWorker();
    worker.current = w;
    // A new worker knows nothing yet: every set-up must be asked for again.
    wanted.current = { key: "", previewJob: -1, runJob: -1 };
    w.onmessage = ({ data }: MessageEvent<SimReply>) => {
      const { key, previewJob, runJob } = wanted.current;
      if (data.job !== previewJob && data.job !== runJob) return;
      setState((s) => {
        if (s.setupKey !== key) return s;
        switch (data.type) {
          case "preview":
            return { ...s, preview: data.preview };
          case "progress":
            return { ...s, progress: data.share };
          case "done":
            return { ...s, recording: data.recording, progress: null, error: null };
          case "failed":
            return { ...s, progress: null, error: data.message };
        }
      });
    };
    w.onerror = (event) => setState((s) => ({ ...s, progress: null, error: event.message || "The simulation could not start in this browser." }));
    return () => {
      w.terminate();
      worker.current = null;
    };
  }, []);

  const key = trial ? setupKeyOf(trial) : null;
  const running = trial !== null && trial.phase !== "setup";
  const maxSeconds = options.maxSeconds;

  useEffect(() => {
    const w = worker.current;
    if (!w) return;
    if (!trial || key === null) {
      w.postMessage({ type: "cancel", job: ++job.current } satisfies SimRequest);
      wanted.current = { key: "", previewJob: -1, runJob: -1 };
      setState(EMPTY);
      return;
    }
    const sameSetup = wanted.current.key === key;
    if (!sameSetup) {
      wanted.current = { key, previewJob: -1, runJob: -1 };
      // Keep showing the old drawing until the new one is ready (no flash of nothing).
      setState((s) => ({ ...EMPTY, preview: s.preview, setupKey: key }));
    }
    const base = { rig: trial.rig, params: trial.params, seed: trial.seed };
    if (!running) {
      const timer = setTimeout(() => {
        const id = ++job.current;
        wanted.current = { ...wanted.current, previewJob: id };
        w.postMessage({ type: "preview", job: id, ...base } satisfies SimRequest);
      }, sameSetup ? 0 : PREVIEW_DELAY_MS);
      return () => clearTimeout(timer);
    }
    if (wanted.current.runJob >= 0) return; // already running or done for this set-up
    // No drawing yet (the page opened mid-trial): draw the rig at rest first, then run.
    if (wanted.current.previewJob < 0) {
      const id = ++job.current;
      wanted.current = { ...wanted.current, previewJob: id };
      w.postMessage({ type: "preview", job: id, ...base } satisfies SimRequest);
    }
    const id = ++job.current;
    wanted.current = { ...wanted.current, runJob: id };
    setState((s) => ({ ...s, progress: 0 }));
    w.postMessage({ type: "run", job: id, ...base, maxSeconds } satisfies SimRequest);
    // trial's fields are all in `key`.
  }, [key, running, maxSeconds]);

  return state;
}
