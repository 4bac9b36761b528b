import { buildChain, elementsFor } from "../chain/chain";
import type { Point } from "../chain/path";
import { seededRandom } from "../core/random";
import { G_SI, metres, mm } from "../core/units";
import { newSeries, type Settled } from "../probes/series";
import { FALLING_CHAIN_READING_RATIO, fallingChainScaleReading } from "../theory/scale";
import { rigSetup, staticBox } from "./common";
import { scaleCatalogEntry, scaleSchema } from "./scale.params";
import type { RigDefinition, SceneShape } from "./rig";

/**
 * Initial zigzag: each link leans this many degrees from the vertical, alternately left and
 * right (seeded), so each link folds over as it lands. A perfectly straight chain lands end-on
 * and the pan holds the column up: sim-notes saw it fall at 0.65 g; with this world's joints a
 * straight 1 m chain took 7.5 % longer than free fall and read 2.87 × the weight on the pan.
 */
export const ZIGZAG_DEGREES: [number, number] = [3, 15];
/** Gap between the lowest link's end and the pan, mm, beyond the link's half-thickness. */
const GAP_MM = 1;
const PAN_WIDTH_MM = 300;
const PAN_THICKNESS_MM = 20;
/** After the top has landed, keep running this long (s) to show the reading drop to λgL. */
const AFTER_S = 0.1;
/** The reading ratio is taken over this share of the fall, by time (issue: the middle half). */
export const SCALE_WINDOW: [number, number] = [0.25, 0.75];

export const scaleRig: RigDefinition<typeof scaleSchema> = {
  ...scaleCatalogEntry,
  create(params, seed) {
    const random = seededRandom(seed);
    const { world, pattern, pitch, thickness } = rigSetup(params);
    const links = Math.max(2, Math.round(mm(params.chainLength) / pitch));
    const elements = elementsFor(pattern, links);

    // The pan's top face is at y = 0 (internal, y down); the floor lies under the pan.
    const floor = staticBox(world, 0, PAN_THICKNESS_MM + 50, 2 * PAN_WIDTH_MM, 100, "floor");
    const pan = staticBox(world, 0, PAN_THICKNESS_MM / 2, PAN_WIDTH_MM, PAN_THICKNESS_MM, "pan");

    // Joint points from the top down, each element leaning alternately left and right.
    const leans = elements.map((_, i) => (i % 2 === 0 ? 1 : -1) * random.between(ZIGZAG_DEGREES[0], ZIGZAG_DEGREES[1]) * (Math.PI / 180));
    const height = elements.reduce((s, e, i) => s + e.pitch * Math.cos(leans[i]!), 0);
    const gap = thickness / 2 + GAP_MM;
    const joints: Point[] = [{ x: 0, y: -(gap + height) }];
    elements.forEach((element, i) => {
      const from = joints[i]!;
      // A hair longer than the pitch, so each chord ends just short of the corner (see layAlongPath).
      const reach = element.pitch * (1 + 1e-9);
      joints.push({ x: from.x + reach * Math.sin(leans[i]!), y: from.y + reach * Math.cos(leans[i]!) });
    });
    joints.push({ x: joints[joints.length - 1]!.x, y: 1000 });
    // Links never collide with each other (sim-notes: a 2D pile that collides bounces and jams,
    // ratios 2.3–4.3), only with the pan.
    const chain = buildChain(world, joints, elements, { noSelfCollision: true });
    const bodies = chain.bodies;
    const first = bodies[0]!;
    const firstHalfPitch = elements[0]!.pitch / 2;
    const lambda = chain.mass / metres(chain.length);
    const L = metres(chain.length);
    const weight = chain.mass * G_SI;

    /** Height of the chain's top end above the pan, mm. */
    const topHeight = () => -(first.position.y - Math.sin(first.angle) * firstHalfPitch);
    const startHeight = topHeight();
    // The fall is over when the top end is one link above the pan: the last link has reached
    // it. (Landed links topple slowly onto the pan, the last one too; waiting for it to lie
    // flat would time the toppling, not the fall.)
    const landedHeight = elements[0]!.pitch;
    /**
     * Length of chain on the pan, m: the distance the top has fallen (the textbook's x), scaled
     * so it runs from 0 when the lower end reaches the pan to L when the last link reaches it.
     * (A zigzag chain stands a little shorter than its length.)
     */
    const onPan = () => L * Math.min(1, Math.max(0, (startHeight - topHeight() - gap) / (startHeight - gap - landedHeight)));

    /** The chain's vertical momentum, kg·m/s, up (mm/ms = m/s). */
    const momentumUp = () => {
      let p = 0;
      const dt = world.settings.dt;
      for (const body of bodies) p -= (body.mass * (body.position.y - body.positionPrev.y)) / dt;
      return p;
    };

    // Per step: time, impulse the pan has given the chain since release (momentum balance:
    // the pan and gravity are the only outside forces, so J = P_up(t) − P_up(0) + Mg·t; matter's
    // own contact impulses are cleared for fast contacts), and ∫x dt.
    const stepT: number[] = [0];
    const stepJ: number[] = [0];
    const stepX: number[] = [0];
    let integralX = 0;
    let lastX = 0;
    let landedAt: number | null = null;

    const reading = newSeries("reading", "Scale reading", "N");
    const fallen = newSeries("fallen", "Length of chain on the pan", "m");
    const ratio = newSeries("readingRatio", "Reading ÷ weight on the pan", "");
    let lastSampleT = 0;
    let lastSampleJ = 0;

    const shapes: SceneShape[] = [floor.shape, pan.shape];
    const freeFallTime = Math.sqrt((2 * metres(startHeight - landedHeight)) / G_SI);

    /** J and ∫x dt at time t (s), linear between steps. */
    const at = (list: number[], t: number) => {
      let lo = 0;
      let hi = stepT.length - 1;
      if (t <= stepT[0]!) return list[0]!;
      if (t >= stepT[hi]!) return list[hi]!;
      while (hi - lo > 1) {
        const mid = (lo + hi) >> 1;
        if (stepT[mid]! <= t) lo = mid;
        else hi = mid;
      }
      const f = (t - stepT[lo]!) / (stepT[hi]! - stepT[lo]!);
      return list[lo]! + f * (list[hi]! - list[lo]!);
    };
    /** Pan impulse over [t0, t1] ÷ ∫λg·x dt over the same window. */
    const ratioOver = (t0: number, t1: number) => (at(stepJ, t1) - at(stepJ, t0)) / (lambda * G_SI * (at(stepX, t1) - at(stepX, t0)));

    return {
      world,
      chain,
      duration: 1.3 * freeFallTime + AFTER_S,
      step() {
        world.step();
        const t = world.time / 1000;
        const x = onPan();
        integralX += ((x + lastX) / 2) * (world.settings.dt / 1000);
        lastX = x;
        stepT.push(t);
        stepJ.push(momentumUp() + weight * t);
        stepX.push(integralX);
        if (landedAt === null && topHeight() <= landedHeight) landedAt = t;
      },
      sample(t) {
        const j = stepJ[stepJ.length - 1]!;
        const x = onPan();
        // Mean force since the last sample: links land in bursts, so a per-step force is noise.
        const r = t > lastSampleT ? (j - lastSampleJ) / (t - lastSampleT) : Number.NaN;
        reading.t.push(t);
        reading.v.push(r);
        fallen.t.push(t);
        fallen.v.push(x);
        ratio.t.push(t);
        ratio.v.push(x > 0.02 * L && (landedAt === null || t <= landedAt) ? r / (lambda * G_SI * x) : Number.NaN);
        lastSampleT = t;
        lastSampleJ = j;
      },
      finished: () => landedAt !== null && world.time / 1000 >= landedAt + AFTER_S,
      series: () => [reading, fallen, ratio],
      measured() {
        const fall = landedAt ?? Number.NaN;
        const [from, to] = [SCALE_WINDOW[0] * fall, SCALE_WINDOW[1] * fall];
        const value = ratioOver(from, to);
        // Uncertainty: the same ratio over five equal parts of the window, as a standard error
        // of the five (block averaging, common practice). The parts differ by bursts of landings.
        const parts: number[] = [];
        for (let b = 0; b < 5; b++) parts.push(ratioOver(from + ((to - from) * b) / 5, from + ((to - from) * (b + 1)) / 5));
        const mean = parts.reduce((s, p) => s + p, 0) / parts.length;
        const spread = Math.sqrt(parts.reduce((s, p) => s + (p - mean) ** 2, 0) / (parts.length - 1) / parts.length);
        const readingRatio: Settled = {
          value,
          uncertainty: spread,
          unit: "",
          basis: `pan impulse ÷ ∫λg·x dt from ${from.toFixed(3)} s to ${to.toFixed(3)} s (the middle half of the fall), from the chain's momentum balance`,
        };
        const dtS = world.settings.dt / 1000;
        return {
          readingRatio,
          fallTime: { value: fall, uncertainty: dtS, unit: "s", basis: "from release until the last link reaches the pan" },
          fallTimeRatio: { value: fall / freeFallTime, uncertainty: dtS / freeFallTime, unit: "", basis: "fall time ÷ free-fall time over the same drop" },
        };
      },
      theory: () => ({
        readingRatio: FALLING_CHAIN_READING_RATIO,
        // Free fall of the top end over the same drop (the textbook's assumption).
        fallTime: freeFallTime,
        fallTimeRatio: 1,
        readingAtHalf: fallingChainScaleReading({ lambda, length: L, fallen: L / 2 }),
        weight: fallingChainScaleReading({ lambda, length: L, fallen: L }),
      }),
      scene: () => ({
        shapes,
        view: [-metres(PAN_WIDTH_MM), -metres(PAN_THICKNESS_MM) - 0.05, metres(PAN_WIDTH_MM), metres(startHeight) + 0.1],
        marks: [{ label: "Pan", y: 0 }],
      }),
    };
  },
};
