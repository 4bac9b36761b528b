import { linearRegression, linearRegressionLine, rSquared } from "simple-statistics";
import { beforeAll, describe, expect, it } from "vitest";
import { ParamError } from "../params";
import { runTrial, TrialRunner, type TrialRecording } from "../run/run-trial";
import { UnstableRunError } from "./common";
import { fountainRig } from "./fountain";

/**
 * The chain fountain, checked against what published work says must happen
 * (Biggins & Warner, Proc. R. Soc. A 470: 20130689 (2014); Biggins, EPL 106, 44001 (2014)):
 * rods and tubes on a string fountain, heavy beads on slack threads do not, and the rise
 * grows in proportion to the drop, h2 ∝ h1. The height itself is calibrated (time step and
 * pile model; see DEVELOPERS.md "Simulation"), so its regression pin below is a pin, not a
 * law of physics.
 */
const HEIGHTS = [0.5, 1, 1.5, 2];
/** Enough links for about four seconds of steady flow at each height. */
const linksFor = (potHeight: number) => Math.round(250 * Math.sqrt(9.81 * potHeight * 1.14));

const runs: Record<string, TrialRecording[]> = {};

beforeAll(() => {
  for (const linkShape of ["rod", "tube"]) {
    runs[linkShape] = HEIGHTS.map((potHeight) => runTrial(fountainRig, { linkShape, potHeight, links: linksFor(potHeight) }, { frameRate: 0 }));
  }
}, 300_000);

describe.each(["rod", "tube"])("a %s chain fountains", (shape) => {
  it("rises between 0.05 and 0.5 of the drop at every height", () => {
    for (const run of runs[shape]!) {
      const ratio = run.measured.riseRatio!.value;
      expect(ratio, `potHeight ${String(run.params.potHeight)}`).toBeGreaterThan(0.05);
      expect(ratio).toBeLessThan(0.5);
    }
  });

  it("rises in proportion to the drop: linear in pot height with R² ≥ 0.95", () => {
    const points = runs[shape]!.map((run) => [run.params.potHeight as number, run.measured.rise!.value]);
    const line = linearRegressionLine(linearRegression(points));
    expect(rSquared(points, line)).toBeGreaterThanOrEqual(0.95);
  });

  it("obeys the momentum balance at the pot whatever its α: g·h ≈ α·v² within a factor of two", () => {
    // physics-reference §1 [paper]: g·h2 = α·v² for the steady fountain. In a 2D simulation the
    // arch is wider than a vertical column, so the push measured by the momentum balance
    // exceeds the one the rise implies (sim-notes saw about twice); both must be positive.
    for (const run of runs[shape]!) {
      const fromBalance = run.measured.alphaPush!.value;
      const fromRise = run.measured.alphaFromRise!.value;
      expect(fromBalance).toBeGreaterThan(0);
      expect(fromRise).toBeGreaterThan(0);
      expect(fromBalance / fromRise).toBeGreaterThan(0.5);
      expect(fromBalance / fromRise).toBeLessThan(2.5);
    }
  });

  it("flows at about the steady-flow speed, v² = g·h1/(1 − α − β), for the α and β it measures", () => {
    for (const run of runs[shape]!) {
      const h1 = run.params.potHeight as number;
      const v = run.measured.speed!.value;
      const predicted = Math.sqrt((9.81 * h1) / (1 - run.measured.alphaPush!.value - run.measured.betaPull!.value));
      expect(Math.abs(v - predicted) / predicted).toBeLessThan(0.15);
    }
  });
});

describe("the shipped rod set-up", () => {
  it("rises between 0.08 and 0.2 of the drop, pinned near the value recorded when it was calibrated", () => {
    // Published measurements put real chains near h2/h1 ≈ 0.1 [memory, physics-reference §1];
    // an examiners' fit gives α ≈ 0.12, β ≈ 0, i.e. h2/h1 = 0.136 (Singapore Physics Olympiad
    // Training, examiner's report, 2018 selection test, problem 1). Recorded at calibration:
    // 0.143 ± 0.008 at 1 m (seed 1, 836 links); the pin allows for run-to-run noise.
    const run = runs.rod![1]!;
    expect(run.params.potHeight).toBe(1);
    const ratio = run.measured.riseRatio!.value;
    expect(ratio).toBeGreaterThan(0.08);
    expect(ratio).toBeLessThan(0.2);
    expect(Math.abs(ratio - 0.143)).toBeLessThan(0.025);
  });
});

describe("heavy beads on slack threads", () => {
  it("flow but hardly rise: rise/drop ≤ 0.03 and at most a quarter of the rods' at the same height", () => {
    // Biggins, EPL 106, 44001 (2014): chains of heavy beads on long flexible threads do not
    // fountain (a bead is lifted from straight above its contact, so the pile cannot push).
    const potHeight = 1.5;
    const beads = runTrial(fountainRig, { linkShape: "bead-thread", potHeight, links: 500 }, { frameRate: 0 });
    const rods = runs.rod![2]!;
    expect(rods.params.potHeight).toBe(potHeight);
    expect(beads.measured.speed!.value).toBeGreaterThan(2);
    const ratio = beads.measured.riseRatio!.value;
    expect(ratio).toBeLessThanOrEqual(0.03);
    expect(ratio).toBeLessThanOrEqual(rods.measured.riseRatio!.value / 4);
  }, 120_000);
});

describe("running a trial", () => {
  it("is deterministic: same parameters and seed give an identical trace; another seed does not", () => {
    const trace = (seed: number) => runTrial(fountainRig, { links: 250 }, { seed, frameRate: 60, maxSeconds: 0.4 });
    const a = trace(7);
    const b = trace(7);
    const c = trace(8);
    expect(a.frames.length).toBeGreaterThan(20);
    expect(a.frames.map((f) => Array.from(f))).toEqual(b.frames.map((f) => Array.from(f)));
    expect(a.frames.at(-1)).not.toEqual(c.frames.at(-1));
  }, 60_000);

  it("records frames at 60 Hz with every element (hidden stock as NaN) and probe series", () => {
    const run = runTrial(fountainRig, { links: 300 }, { frameRate: 60, maxSeconds: 0.5 });
    expect(run.frames.length).toBe(Math.floor(0.5 * 60) + 1);
    for (const frame of run.frames) expect(frame.length).toBe(run.elements.length * 3);
    const last = run.frames.at(-1)!;
    expect(Array.from(last).some(Number.isNaN)).toBe(true);
    expect(Array.from(last).filter(Number.isFinite).length).toBeGreaterThan(100);
    expect(run.series.find((s) => s.name === "rise")!.t.length).toBeGreaterThan(200);
  }, 60_000);

  it("leaves no link hanging still in mid-air: links are parked only once they rest on the floor or the heap", () => {
    // The whole 1000-link run. Before the fix, the lower end of the strand hanging at the start
    // was parked as "landed" and stood in the air above the heap to the end (links 3 to 6, at
    // 0.07 to 0.13 m); a link at the top of a bounce could be parked the same way.
    const run = runTrial(fountainRig, { links: 1000 }, { seed: 4, frameRate: 10 });
    const last = run.frames.at(-1)!;
    const halfSecondBefore = run.frames.at(-6)!;
    const potHeight = run.params.potHeight as number;
    const stillInMidAir: number[] = [];
    for (let i = 0; i < last.length / 3; i++) {
      const [x, y] = [last[i * 3]!, last[i * 3 + 1]!];
      if (!Number.isFinite(y)) continue;
      const still = x === halfSecondBefore[i * 3] && y === halfSecondBefore[i * 3 + 1];
      // Above the floor heap (a few cm) and below the pot's pile.
      if (still && y > 0.06 && y < potHeight - 0.05) stillInMidAir.push(i);
    }
    expect(stillInMidAir).toEqual([]);
    // The check sees parked links at all: most of the chain lies still on the floor by the end.
    let stillOnFloor = 0;
    for (let i = 0; i < last.length / 3; i++) if (last[i * 3 + 1]! < 0.06 && last[i * 3] === halfSecondBefore[i * 3]) stillOnFloor++;
    expect(stillOnFloor).toBeGreaterThan(500);

    // A link of the pile is first drawn in the pot, never at the depth it waited at (below the
    // pot, in mid-air: once in the board's own 1000-link drawing, seed 4, at 4.0 s).
    const firstSeenLow: string[] = [];
    for (let k = 1; k < run.frames.length; k++) {
      const [before, now] = [run.frames[k - 1]!, run.frames[k]!];
      for (let i = 0; i < now.length / 3; i++) {
        const y = now[i * 3 + 1]!;
        if (Number.isNaN(before[i * 3 + 1]!) && Number.isFinite(y) && y < potHeight - 0.1) firstSeenLow.push(`#${i} at ${y.toFixed(3)} m, frame ${k}`);
      }
    }
    expect(firstSeenLow).toEqual([]);
  }, 120_000);

  it("refuses bad parameters with the parameter's name, unit and range", () => {
    let error: unknown;
    try {
      new TrialRunner(fountainRig, { potHeight: 5, linkShape: "chain" });
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(ParamError);
    const problems = (error as ParamError).problems.join("\n");
    expect(problems).toMatch(/potHeight: .*0\.2 to 3 m/);
    expect(problems).toMatch(/linkShape: .*rod, tube, ball, bead-thread/);
    expect(() => new TrialRunner(fountainRig, { links: 10.5 })).toThrow(/links: .*whole number/);
  });

  it("stops and reports a run that comes apart instead of returning numbers", () => {
    const runner = new TrialRunner(fountainRig, { links: 250 }, { frameRate: 0 });
    runner.advance(400);
    // Tear the chain as a blown-up solve would: one link jumps far from its neighbours.
    const moving = runner.instance.world.dynamic;
    const link = moving[Math.floor(moving.length / 2)]!;
    link.position.x += 500;
    expect(() => runner.advance(400)).toThrow(UnstableRunError);
  });
});
