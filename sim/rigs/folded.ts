import { buildChain, elementsFor } from "../chain/chain";
import type { ElementSpec } from "../chain/link-shapes";
import type { Point } from "../chain/path";
import { G_SI, metres, mm } from "../core/units";
import { newSeries, type Settled } from "../probes/series";
import { foldedChainAccel, foldedChainSpeedSquared } from "../theory/folded";
import { rigSetup, staticCircle } from "./common";
import { foldedCatalogEntry, foldedSchema } from "./folded.params";
import type { RigDefinition, SceneShape } from "./rig";

/*
 * Conventions, as in sim/theory/folded.ts (Calkin & March, Am. J. Phys. 57, 154 (1989)):
 * L is the length of the whole chain (both arms and the bend), x the distance the free end has
 * fallen below its start, level with the pinned end. At x the pinned arm is (L + x)/2 long and
 * at rest, the falling arm (L − x)/2 long moving at v; energy conservation gives
 * v² = g·x(2L − x)/(L − x), which diverges as x → L.
 */

/** The run stops when the free end has fallen this share of L (the formula diverges at 1). */
export const FOLDED_STOP = 0.8;
/** speedRatio is read at this x/L (issue: 0.5). */
export const FOLDED_SPEED_AT = 0.5;
/** accelRatio is the mean acceleration while x/L goes from 0.4 to 0.6 (issue). */
export const FOLDED_ACCEL_BAND: [number, number] = [0.4, 0.6];
/**
 * The bend across the bottom is this share of the chain's length wide (so the U has the same
 * proportions at every length), and the arms at least three link thicknesses apart. Found by
 * trial (1 m rod chain, 20 mm links, 0.25 ms): the formula is for a U with no width, and a
 * bend of 20 % of the chain ran 7–10 % above it; with 5 % the free end comes within 0.3 % (v²)
 * and 1.1 % (a) of it, the same at a quarter of the step. A bend three thicknesses wide reads
 * 2.6 % low on v². With predicted-angle lever arms the links flipping over in the bend lose
 * energy (sim-notes, "The height does not converge"): 1.1 % and 3.3 % low at 0.25 ms.
 */
const BEND_SHARE = 0.05;
const ARM_GAP_THICKNESSES = 3;

export const foldedRig: RigDefinition<typeof foldedSchema> = {
  ...foldedCatalogEntry,
  create(params) {
    const { world, pattern, pitch, thickness } = rigSetup(params, { leverFromStepStart: params.leverFromStepStart });
    let links = Math.max(3, Math.round(mm(params.chainLength) / pitch));
    // One-element links: an odd count lets one link lie across the bottom with equal arms.
    if (pattern.length === 1 && links % 2 === 0) links += 1;
    const elements = elementsFor(pattern, links);
    const U = layU(elements, Math.max(BEND_SHARE * mm(params.chainLength), ARM_GAP_THICKNESSES * thickness));

    const chain = buildChain(world, U.path, elements);
    const bodies = chain.bodies;
    world.pin(bodies[0]!, -elements[0]!.pitch / 2, null, 0, 0, 0);
    const last = bodies[bodies.length - 1]!;
    const lastHalfPitch = elements[elements.length - 1]!.pitch / 2;
    const L = metres(chain.length);
    const shapes: SceneShape[] = [staticCircle(world, 0, -6, 5, "support").shape];

    /** Distance the free end has fallen, m (internal y is down; it starts at y = 0). */
    const fallen = () => metres(last.position.y + Math.sin(last.angle) * lastHalfPitch);

    // The free end's fall at every step: speed and acceleration are taken from it afterwards
    // (a centred difference needs what comes next).
    const stepT: number[] = [0];
    const stepX: number[] = [0];
    let stoppedAt: number | null = null;
    const sampleT: number[] = [];

    /** x at time t (s), linear between steps. */
    const xAt = (t: number) => interpolate(stepT, stepX, t);
    /** First time (s) the free end has fallen x (m), linear between steps. */
    const timeAt = (x: number) => {
      for (let i = 1; i < stepX.length; i++) {
        if (stepX[i]! >= x) return stepT[i - 1]! + ((x - stepX[i - 1]!) / (stepX[i]! - stepX[i - 1]!)) * (stepT[i]! - stepT[i - 1]!);
      }
      return Number.NaN;
    };
    /**
     * Speed at t, m/s, smoothed: the mean of the free end's speed over [t − w, t + w], which is
     * the centred difference (x(t + w) − x(t − w))/2w. A wide window biases it (v is convex in
     * t: the bias is about w²/6 · da/dt), so it is kept to a quarter of a link's passage.
     */
    const smoothSpeed = (t: number, w: number) => (xAt(t + w) - xAt(t - w)) / (2 * w);

    /**
     * Time for one link to go round the bend, s, while x goes through the band: the bend moves
     * down at v/2. The acceleration steps up as each link goes round (sim-notes: a/g jumps
     * ±10–15 %), so the a/g series is averaged over one passage.
     */
    const passage = () => {
      const [a, b] = FOLDED_ACCEL_BAND;
      const meanSpeed = ((b - a) * L) / (timeAt(b * L) - timeAt(a * L));
      return metres(pitch) / (meanSpeed / 2);
    };

    /** speedRatio and accelRatio with smoothing half-width w. */
    const measure = (w: number) => {
      const x5 = FOLDED_SPEED_AT * L;
      const v5 = smoothSpeed(timeAt(x5), w);
      const [a, b] = FOLDED_ACCEL_BAND;
      const t0 = timeAt(a * L);
      const t1 = timeAt(b * L);
      return {
        speedRatio: (v5 * v5) / (2 * G_SI * x5),
        accelRatio: (smoothSpeed(t1, w) - smoothSpeed(t0, w)) / (G_SI * (t1 - t0)),
      };
    };

    return {
      world,
      chain,
      // Free fall to 0.8 L would take √(1.6 L/g); the end falls faster than that.
      duration: Math.sqrt((2 * FOLDED_STOP * L) / G_SI) + 0.05,
      step() {
        world.step();
        const t = world.time / 1000;
        const x = fallen();
        stepT.push(t);
        stepX.push(x);
        if (stoppedAt === null && x >= FOLDED_STOP * L) stoppedAt = t;
      },
      sample(t) {
        sampleT.push(t);
      },
      finished: () => stoppedAt !== null,
      series() {
        const fall = newSeries("fallen", "Distance the free end has fallen", "m");
        const speed = newSeries("speed", "Speed of the free end (smoothed)", "m/s");
        const accel = newSeries("accelRatio", "Acceleration of the free end ÷ g (smoothed)", "");
        const p = stepX[stepX.length - 1]! > FOLDED_ACCEL_BAND[1] * L ? passage() : 0.01;
        const w = p / 4;
        const end = stepT[stepT.length - 1]!;
        for (const t of sampleT) {
          fall.t.push(t);
          fall.v.push(xAt(t));
          // Only where the whole window lies inside the run.
          speed.t.push(t);
          speed.v.push(t - w >= 0 && t + w <= end ? smoothSpeed(t, w) : Number.NaN);
          accel.t.push(t);
          const h = p / 2;
          accel.v.push(t - h - w >= 0 && t + h + w <= end ? (smoothSpeed(t + h, w) - smoothSpeed(t - h, w)) / (p * G_SI) : Number.NaN);
        }
        return [fall, speed, accel];
      },
      measured() {
        const w = passage() / 4;
        const best = measure(w);
        // Uncertainty: how far the value moves when the smoothing window is halved or doubled
        // (a sensitivity estimate, common practice; the run is deterministic, so there is no
        // seed-to-seed spread to quote). The step's own effect is larger: see BEND_SHARE.
        const other = [measure(w / 2), measure(2 * w)];
        const spread = (key: "speedRatio" | "accelRatio") => Math.max(...other.map((o) => Math.abs(o[key] - best[key])));
        const speedRatio: Settled = {
          value: best.speedRatio,
          uncertainty: spread("speedRatio"),
          unit: "",
          basis: `v²/(2g·x) at x = ${FOLDED_SPEED_AT} L, v averaged over ±${(w * 1000).toFixed(1)} ms`,
        };
        const accelRatio: Settled = {
          value: best.accelRatio,
          uncertainty: spread("accelRatio"),
          unit: "",
          basis: `mean a/g while x goes from ${FOLDED_ACCEL_BAND[0]} L to ${FOLDED_ACCEL_BAND[1]} L: (v(0.6 L) − v(0.4 L))/(g·Δt)`,
        };
        const [a, b] = FOLDED_ACCEL_BAND;
        return {
          speedRatio,
          accelRatio,
          bandTime: { value: timeAt(b * L) - timeAt(a * L), uncertainty: world.settings.dt / 1000, unit: "s", basis: `time for x to go from ${a} L to ${b} L` },
        };
      },
      theory() {
        const x5 = FOLDED_SPEED_AT * L;
        const [a, b] = FOLDED_ACCEL_BAND;
        const band = foldedBandMean(L, a * L, b * L);
        return {
          speedRatio: foldedChainSpeedSquared({ length: L, fallen: x5 }) / (2 * G_SI * x5),
          // The same quantity as measured: Δv/(g·Δt) between x = 0.4 L and 0.6 L, i.e. the
          // formula's a/g averaged over the time it takes (not over x, not at one point).
          accelRatio: band.accelRatio,
          accelRatioAtHalf: foldedChainAccel({ length: L, fallen: x5 }) / G_SI,
          bandTime: band.time,
        };
      },
      scene: () => ({
        shapes,
        // By the time the run stops the bend is 0.9 L down.
        view: [-0.15, -L - 0.05, metres(U.separation) + 0.15, 0.08],
        marks: [{ label: "Pinned end", y: 0 }],
      }),
    };
  },
};

/**
 * The energy-conserving U-chain between x0 and x1 (m, chain length L): time taken,
 * t = ∫dx/v (Simpson's rule; v has no zero inside for x0 > 0), and the mean a/g over that time,
 * (v(x1) − v(x0))/(g·t).
 */
export function foldedBandMean(L: number, x0: number, x1: number, g = G_SI) {
  const v = (x: number) => Math.sqrt(foldedChainSpeedSquared({ length: L, fallen: x, g }));
  const pieces = 200;
  const h = (x1 - x0) / pieces;
  let sum = 1 / v(x0) + 1 / v(x1);
  for (let i = 1; i < pieces; i++) sum += (i % 2 === 1 ? 4 : 2) / v(x0 + i * h);
  const time = (sum * h) / 3;
  return { time, accelRatio: (v(x1) - v(x0)) / (g * time) };
}

function interpolate(ts: readonly number[], values: readonly number[], t: number) {
  const last = ts.length - 1;
  if (t <= ts[0]!) return values[0]!;
  if (t >= ts[last]!) return values[last]!;
  let lo = 0;
  let hi = last;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (ts[mid]! <= t) lo = mid;
    else hi = mid;
  }
  return values[lo]! + ((t - ts[lo]!) / (ts[hi]! - ts[lo]!)) * (values[hi]! - values[lo]!);
}

/**
 * Joint points of the U (internal frame, mm, y down): the first elements hang straight down from
 * the pin at (0, 0), the last ones straight up to the free end at (separation, 0), level with the
 * pin, and a few in the middle lie in a straight line across the bottom (slanted if the arms
 * differ by part of a link). The bend is at least `minGap` mm long.
 */
function layU(elements: readonly ElementSpec[], minGap: number) {
  const n = elements.length;
  const sum = (from: number, to: number) => elements.slice(from, to).reduce((s, e) => s + e.pitch, 0);
  let choice: { k: number; m: number; slant: number } | null = null;
  for (let m = 1; m < n - 2 && choice === null; m++) {
    const middle = Math.floor((n - m) / 2);
    for (const k of [middle, middle - 1, middle + 1]) {
      if (k < 1 || k + m > n - 1) continue;
      const across = sum(k, k + m);
      const slant = sum(k + m, n) - sum(0, k);
      if (across >= minGap && Math.abs(slant) <= 0.6 * across && (choice === null || Math.abs(slant) < Math.abs(choice.slant))) choice = { k, m, slant };
    }
  }
  if (choice === null) throw new Error("The chain is too short to fold");
  const { k, m, slant } = choice;
  const depth = sum(0, k);
  const across = sum(k, k + m);
  const separation = Math.sqrt(across * across - slant * slant);
  const joints: Point[] = [{ x: 0, y: 0 }];
  let along = 0;
  elements.forEach((element, i) => {
    along += element.pitch;
    if (i < k) joints.push({ x: 0, y: along });
    else if (i < k + m) {
      const f = (along - depth) / across;
      joints.push({ x: f * separation, y: depth + f * slant });
    } else joints.push({ x: separation, y: depth + slant - (along - depth - across) });
  });
  // A hair longer than each chord, so each chord ends just short of its corner (see layAlongPath).
  const path: Point[] = [{ ...joints[0]! }];
  for (let i = 1; i < joints.length; i++) {
    const prev = path[i - 1]!;
    path.push({ x: prev.x + (joints[i]!.x - joints[i - 1]!.x) * (1 + 1e-9), y: prev.y + (joints[i]!.y - joints[i - 1]!.y) * (1 + 1e-9) });
  }
  path.push({ x: separation, y: -1000 });
  return { path, separation };
}
