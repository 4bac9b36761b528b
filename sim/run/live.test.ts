import { describe, expect, it } from "vitest";
import { fountainRig } from "../rigs/fountain";
import { LIVE_DT, LiveSimulation } from "./live";

describe("live mode", () => {
  it("advances by the caller's frame time with a coarser step and hands back drawable frames", () => {
    const live = new LiveSimulation(fountainRig, { links: 200 }, 2);
    let frame = live.advance(1 / 60);
    expect(live.time).toBeCloseTo(1 / 60, 3);
    for (let i = 0; i < 30; i++) frame = live.advance(1 / 60);
    expect(live.time).toBeCloseTo(31 / 60, 2);
    expect(frame.length).toBe(200 * 3);
    const drawn = Array.from(frame).filter(Number.isFinite);
    expect(drawn.length).toBeGreaterThan(100);
    // The chain has started to pour: links have moved since the set-up.
    const start = new LiveSimulation(fountainRig, { links: 200 }, 2).advance(LIVE_DT);
    let moved = 0;
    for (let i = 0; i < frame.length; i += 3) if (Number.isFinite(frame[i]!) && Number.isFinite(start[i]!)) moved += Math.hypot(frame[i]! - start[i]!, frame[i + 1]! - start[i + 1]!);
    expect(moved).toBeGreaterThan(1);
  });

  it("caps the work of one call so a slow device drops time instead of freezing", () => {
    const live = new LiveSimulation(fountainRig, { links: 200 }, 2);
    live.advance(5);
    expect(live.time).toBeLessThan(0.25);
  });
});
