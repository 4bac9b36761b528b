/// <reference lib="webworker" />
/**
 * The board's simulation, off the main thread: a set-up is previewed at rest, then run ahead of
 * playback while pupils predict. The finished recording's frames are transferred, not copied.
 */
import { RIGS, TrialRunner, type RigDefinition } from "@sim/index";
import { runInSlices } from "./run-in-slices";
import type { SimReply, SimRequest } from "./sim-messages";

declare const self: DedicatedWorkerGlobalScope;

let latest = 0;

const reply = (message: SimReply, transfer: Transferable[] = []) => self.postMessage(message, transfer);
const rigOf = (id: string): RigDefinition => {
  const rig = (RIGS as Record<string, RigDefinition>)[id];
  if (!rig) throw new Error(`There is no rig called “${id}”.`);
  return rig;
};
const failureText = (error: unknown) => (error instanceof Error ? error.message : "The simulation stopped unexpectedly.");
// A macrotask: lets the next message (a cancel, a new set-up) in before the next slice.
const yieldNow = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

self.onmessage = async ({ data }: MessageEvent<SimRequest>) => {
  latest = data.job;
  if (data.type === "cancel") return;
  const job = data.job;
  try {
    if (data.type === "preview") {
      // Only the layout: result() would also work out the theory, which may refuse some α, β.
      const runner = new TrialRunner(rigOf(data.rig), data.params, { seed: data.seed, frameRate: 0 });
      const { instance } = runner;
      const frame = runner.frame();
      const elements = instance.chain.elements.map((e) => ({ kind: e.kind, length: e.length / 1000, thickness: e.thickness / 1000 }));
      reply({ type: "preview", job, preview: { scene: instance.scene(), elements, frame, movingShapes: instance.movingShapes?.() ?? [] } }, [frame.buffer]);
      return;
    }
    const runner = new TrialRunner(rigOf(data.rig), data.params, {
      seed: data.seed,
      frameRate: data.frameRate ?? 60,
      maxSeconds: data.maxSeconds,
      now: () => performance.now(),
    });
    const outcome = await runInSlices(runner, {
      isCancelled: () => latest !== job,
      onProgress: (share) => reply({ type: "progress", job, share }),
      yieldNow,
      now: () => performance.now(),
    });
    if (outcome === "cancelled") return;
    const recording = runner.result();
    reply({ type: "done", job, recording }, recording.frames.map((f) => f.buffer));
  } catch (error) {
    if (latest === job) reply({ type: "failed", job, message: failureText(error) });
  }
};
