import type { Series } from "../probes/series";
import type { TrialRecording } from "./run-trial";

/** How long a recording lasts, s (its last frame's time). */
export const recordingDuration = (recording: Pick<TrialRecording, "frames" | "frameRate">) =>
  Math.max(0, (recording.frames.length - 1) / recording.frameRate);

/**
 * The chain at any moment of a recording, for playback at any speed and for scrubbing:
 * positions are interpolated linearly between the two recorded frames around t (angles the
 * short way round), so slow motion stays smooth at 60 Hz frames. Elements hidden in either
 * frame take the nearer frame's value. Writes into `out` when given (no garbage per frame).
 */
export function frameAt(recording: Pick<TrialRecording, "frames" | "frameRate">, t: number, out?: Float32Array): Float32Array {
  const { frames, frameRate } = recording;
  if (frames.length === 0) throw new Error("This recording has no frames");
  const first = frames[0]!;
  const target = out ?? new Float32Array(first.length);
  const position = Math.min(Math.max(t * frameRate, 0), frames.length - 1);
  const index = Math.min(Math.floor(position), frames.length - 2);
  if (index < 0) {
    target.set(first);
    return target;
  }
  const a = frames[index]!;
  const b = frames[index + 1]!;
  const share = position - index;
  for (let i = 0; i < a.length; i += 3) {
    const ax = a[i]!;
    const bx = b[i]!;
    if (Number.isNaN(ax) || Number.isNaN(bx)) {
      const nearer = share < 0.5 ? a : b;
      target[i] = nearer[i]!;
      target[i + 1] = nearer[i + 1]!;
      target[i + 2] = nearer[i + 2]!;
      continue;
    }
    target[i] = ax + (bx - ax) * share;
    target[i + 1] = a[i + 1]! + (b[i + 1]! - a[i + 1]!) * share;
    let turn = b[i + 2]! - a[i + 2]!;
    turn -= 2 * Math.PI * Math.round(turn / (2 * Math.PI));
    target[i + 2] = a[i + 2]! + turn * share;
  }
  return target;
}

/** A probe's value at time t (linear between samples; NaN outside the run). */
export function seriesAt(series: Series, t: number): number {
  const { t: times, v } = series;
  if (times.length === 0 || t < times[0]! || t > times[times.length - 1]!) return Number.NaN;
  let lo = 0;
  let hi = times.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (times[mid]! <= t) lo = mid;
    else hi = mid;
  }
  const span = times[hi]! - times[lo]!;
  if (span <= 0) return v[lo]!;
  return v[lo]! + ((v[hi]! - v[lo]!) * (t - times[lo]!)) / span;
}
