/**
 * A bare page for tests/e2e/board-drawing.test.ts only (never imported by the app): runs one
 * trial through the real worker hook and draws it with RigStage, and lets the test draw any
 * moment and time the drawing. Set-up from the query string: ?rig=fountain&params={...}&seed=1&maxSeconds=1.
 */
import { StrictMode, useEffect, useRef } from "react";
import { createRoot } from "react-dom/client";
import type { TrialRecording } from "@sim/catalog";
import { frameAt } from "@sim/run/playback";
import "@/styles/app.css";
import { RigStage, type RigStageHandle } from "../components/rig-stage";
import { useTrialSimulation } from "../hooks/use-trial-simulation";

interface HarnessApi {
  status: "running" | "ready" | "failed";
  error?: string;
  previewDrawn: boolean;
  duration: number;
  frames: number;
  elements: number;
  /** Draws the chain at time t (s) and returns the drawing time, ms. */
  drawAt(t: number): number;
  /** How many elements are drawn (not hidden) at time t. */
  drawnAt(t: number): number;
}

declare global {
  interface Window {
    harness?: HarnessApi;
  }
}

const query = new URLSearchParams(location.search);
const trial = {
  id: "harness",
  rig: query.get("rig") ?? "fountain",
  params: JSON.parse(query.get("params") ?? "{}") as Record<string, unknown>,
  seed: Number(query.get("seed") ?? 1),
  phase: (query.get("phase") ?? "observe") as "setup" | "observe",
};
const maxSeconds = query.has("maxSeconds") ? Number(query.get("maxSeconds")) : undefined;

function Harness() {
  const sim = useTrialSimulation(trial, { maxSeconds });
  const stage = useRef<RigStageHandle>(null);
  const recording: TrialRecording | null = sim.recording;

  useEffect(() => {
    const buffer = recording ? new Float32Array(recording.frames[0]!.length) : null;
    window.harness = {
      status: sim.error ? "failed" : recording ? "ready" : "running",
      error: sim.error ?? undefined,
      previewDrawn: sim.preview !== null,
      duration: recording ? (recording.frames.length - 1) / recording.frameRate : 0,
      frames: recording?.frames.length ?? 0,
      elements: (recording ?? sim.preview)?.elements.length ?? 0,
      drawAt(t) {
        if (!recording || !buffer || !stage.current) return Number.NaN;
        frameAt(recording, t, buffer);
        const index = Math.min(recording.movingShapes.length - 1, Math.round(t * recording.frameRate));
        return stage.current.draw(buffer, index >= 0 ? recording.movingShapes[index]! : []);
      },
      drawnAt(t) {
        if (!recording) return 0;
        const frame = frameAt(recording, t);
        let drawn = 0;
        for (let i = 0; i < frame.length; i += 3) if (!Number.isNaN(frame[i]!)) drawn++;
        return drawn;
      },
    };
  }, [recording, sim.error, sim.preview]);

  const look = recording ?? sim.preview;
  return (
    <div data-theme="board" className="h-dvh bg-paper p-4 text-ink">
      {look ? (
        <RigStage
          ref={stage}
          scene={look.scene}
          elements={look.elements}
          frame={recording ? recording.frames[0] : sim.preview?.frame}
          moving={recording ? recording.movingShapes[0] : sim.preview?.movingShapes}
          label="The rig under test"
          className="h-full w-full"
        />
      ) : (
        <p>Setting up…</p>
      )}
    </div>
  );
}

createRoot(document.getElementById("root")!).render(
  <StrictMode>
    <Harness />
  </StrictMode>,
);
