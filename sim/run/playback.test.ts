import { describe, expect, it } from "vitest";
import { newSeries } from "../probes/series";
import { hangingRig } from "../rigs/hanging";
import { frameAt, recordingDuration, seriesAt } from "./playback";
import { runTrial } from "./run-trial";

const recording = (frames: number[][], frameRate = 10) => ({ frames: frames.map((f) => Float32Array.from(f)), frameRate });

describe("playback", () => {
  it("gives the recorded frame at each frame's time and blends between them", () => {
    const r = recording([
      [0, 0, 0, 1, 1, 0],
      [1, 2, 0.5, 3, 1, 0],
    ]);
    expect(Array.from(frameAt(r, 0))).toEqual([0, 0, 0, 1, 1, 0]);
    expect(Array.from(frameAt(r, 0.1))).toEqual(Array.from(r.frames[1]!));
    const half = frameAt(r, 0.05);
    expect(half[0]).toBeCloseTo(0.5, 6);
    expect(half[1]).toBeCloseTo(1, 6);
    expect(half[2]).toBeCloseTo(0.25, 6);
    expect(half[3]).toBeCloseTo(2, 6);
    expect(recordingDuration(r)).toBeCloseTo(0.1, 12);
  });

  it("turns angles the short way round and holds hidden elements at the nearer frame", () => {
    const r = recording([
      [0, 0, 3.1, Number.NaN, Number.NaN, Number.NaN],
      [0, 0, -3.1, 5, 5, 0],
    ]);
    const mid = frameAt(r, 0.05);
    // From 3.1 to −3.1 rad the short way passes through π, not through 0.
    expect(Math.abs(Math.abs(mid[2]!) - Math.PI)).toBeLessThan(0.01);
    expect(Number.isNaN(frameAt(r, 0.04)[3]!)).toBe(true);
    expect(frameAt(r, 0.06)[3]).toBe(5);
  });

  it("clamps to the recording and reuses the caller's buffer", () => {
    const run = runTrial(hangingRig, { chainLength: 1.8 }, { frameRate: 60, maxSeconds: 0.2 });
    const buffer = new Float32Array(run.frames[0]!.length);
    expect(frameAt(run, -1, buffer)).toBe(buffer);
    expect(Array.from(buffer)).toEqual(Array.from(run.frames[0]!));
    expect(Array.from(frameAt(run, 99))).toEqual(Array.from(run.frames.at(-1)!));
  });

  it("reads a probe between samples", () => {
    const s = newSeries("x", "x", "m");
    s.t.push(0, 1, 2);
    s.v.push(0, 10, 30);
    expect(seriesAt(s, 1.5)).toBe(20);
    expect(seriesAt(s, 1)).toBe(10);
    expect(Number.isNaN(seriesAt(s, 3))).toBe(true);
  });
});
