import type { TrialResultInput } from "@contracts/lessons";
import type { TrialRecording } from "@sim/catalog";

/**
 * A trial's seed: a fixed function of its id (FNV-1a, 31 bits), so a board that reloads, or a
 * second board, replays exactly the same run. A seed the server has stored wins.
 */
export function seedForTrial(trialId: string, stored: number | null = null): number {
  if (stored !== null) return stored;
  let hash = 0x811c9dc5;
  for (let i = 0; i < trialId.length; i++) {
    hash ^= trialId.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193);
  }
  return (hash >>> 0) & 0x7fffffff;
}

const MAX_BASIS = 300;

/**
 * What the board tells the server about a finished run. Values the run could not settle (NaN:
 * too few samples) are left out rather than sent as numbers they are not.
 */
export function trialResultPayload(trialId: string, recording: TrialRecording): TrialResultInput {
  const measured: TrialResultInput["measured"] = {};
  for (const [key, settled] of Object.entries(recording.measured)) {
    if (!Number.isFinite(settled.value) || !Number.isFinite(settled.uncertainty)) continue;
    measured[key] = {
      value: settled.value,
      uncertainty: Math.max(0, settled.uncertainty),
      unit: settled.unit,
      basis: settled.basis.length > MAX_BASIS ? `${settled.basis.slice(0, MAX_BASIS - 1)}…` : settled.basis,
    };
  }
  return {
    trialId,
    seed: recording.seed,
    measured,
    run: {
      dt: recording.run.dt,
      steps: recording.run.steps,
      simulatedSeconds: recording.run.simulatedSeconds,
      wallSeconds: recording.run.wallSeconds,
    },
  };
}
