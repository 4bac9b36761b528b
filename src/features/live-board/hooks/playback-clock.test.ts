import { describe, expect, it } from "vitest";
import { hasEnded, newClock, pause, play, replay, seek, setRate, SLOW_RATE, tick, timeAt, toggle } from "./playback-clock";

describe("the playback clock", () => {
  it("runs at real speed: 1.5 s of wall time is 1.5 s of recording", () => {
    const c = play(newClock(4), 1000);
    expect(timeAt(c, 2500)).toBeCloseTo(1.5, 9);
  });

  it("runs at a quarter speed in slow motion, changing speed without a jump", () => {
    let c = play(newClock(4), 0);
    c = setRate(c, SLOW_RATE, 1000); // 1 s in
    expect(timeAt(c, 1000)).toBeCloseTo(1, 9);
    expect(timeAt(c, 3000)).toBeCloseTo(1.5, 9); // 2 s of wall time → 0.5 s
  });

  it("pauses where it is and stays there", () => {
    const c = pause(play(newClock(4), 0), 800);
    expect(c.playing).toBe(false);
    expect(timeAt(c, 5000)).toBeCloseTo(0.8, 9);
  });

  it("stops at the end, and play after the end starts again from the beginning", () => {
    let c = play(newClock(2), 0);
    expect(timeAt(c, 9000)).toBe(2);
    c = tick(c, 9000);
    expect(c.playing).toBe(false);
    expect(hasEnded(c, 9000)).toBe(true);
    c = play(c, 10_000);
    expect(timeAt(c, 10_500)).toBeCloseTo(0.5, 9);
  });

  it("toggle pauses a running clock and plays a paused one", () => {
    const running = play(newClock(3), 0);
    expect(toggle(running, 500).playing).toBe(false);
    expect(toggle(pause(running, 500), 600).playing).toBe(true);
  });

  it("seeking keeps the time inside the recording, and replay starts from zero and plays", () => {
    const c = newClock(3);
    expect(timeAt(seek(c, 7, 0), 0)).toBe(3);
    expect(timeAt(seek(c, -1, 0), 0)).toBe(0);
    const r = replay(seek(c, 2, 0), 100);
    expect(r.playing).toBe(true);
    expect(timeAt(r, 600)).toBeCloseTo(0.5, 9);
  });
});
