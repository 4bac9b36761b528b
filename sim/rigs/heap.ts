import { buildChain, elementsFor } from "../chain/chain";
import type { Point } from "../chain/path";
import { seededRandom } from "../core/random";
import { G_SI, metres, mm } from "../core/units";
import { newSeries, type Settled } from "../probes/series";
import { heapLiftForce } from "../theory/heap";
import { rigSetup, staticBox } from "./common";
import { heapCatalogEntry, heapSchema } from "./heap.params";
import type { RigDefinition, SceneShape } from "./rig";

/** The force is averaged while the end rises over this band (issue: 0.2 m to 1.0 m). */
export const HEAP_BAND: [number, number] = [0.2, 1.0];
/** The lift speeds up smoothly over this time, s, instead of jerking the chain. */
const RAMP_S = 0.04;
const HEAP_WIDTH_MM = 60;

export const heapRig: RigDefinition<typeof heapSchema> = {
  ...heapCatalogEntry,
  create(params, seed) {
    const random = seededRandom(seed);
    const { world, pattern, pitch, thickness } = rigSetup(params);
    // Enough chain for the whole lift plus a margin left on the heap.
    const links = Math.ceil((mm(params.liftHeight) + 300) / pitch);
    const elements = elementsFor(pattern, links);

    const floor = staticBox(world, 0, 50, 2000, 100, "floor");
    // The heap: the chain folded back and forth on the floor. Its links do not collide with
    // each other (a 2D heap that collides jams; sim-notes: the lift force then comes within
    // 2 % of the textbook value with self-collision off, 9 % with it on).
    const startY = -thickness / 2;
    const path: Point[] = [{ x: 0, y: -thickness / 2 - 1 }];
    const rows = Math.ceil((links * pitch) / (HEAP_WIDTH_MM - pitch)) + 2;
    for (let row = 0; row < rows; row++) {
      const jitter = random.between(0, 0.2 * pitch);
      const x = row % 2 === 0 ? -HEAP_WIDTH_MM / 2 + jitter : HEAP_WIDTH_MM / 2 - jitter;
      path.push({ x, y: startY - (row % 2) * 0.5 });
    }
    const chain = buildChain(world, path, elements, { noSelfCollision: true, friction: 0 });
    const first = chain.bodies[0]!;
    const endX = 0;
    const endY = startY;
    const puller = world.pin(first, -elements[0]!.pitch / 2, null, 0, endX, endY);
    const v = params.speed;

    const force = newSeries("force", "Pulling force", "N");
    const height = newSeries("height", "Height of the lifted end", "m");
    let lastImpulse = 0;
    let lastT = 0;
    const heapTop = 0;
    /** Impulse and time at the start and end of the band, for the band's mean force. */
    const band: { t0?: number; i0?: number; t1?: number; i1?: number } = {};
    let lifted = 0;

    const liftedBy = (t: number) => (t < RAMP_S ? (v * t * t) / (2 * RAMP_S) : v * (t - RAMP_S / 2));
    const endHeight = () => metres(-puller.py) - heapTop;
    const shapes: SceneShape[] = [floor.shape];

    return {
      world,
      chain,
      duration: (params.liftHeight + (v * RAMP_S) / 2) / v,
      step() {
        lifted = mm(liftedBy(world.time / 1000));
        puller.py = endY - lifted;
        world.step();
        const y = endHeight();
        const impulse = world.jointImpulse(puller).y;
        if (band.t0 === undefined && y >= HEAP_BAND[0]) {
          band.t0 = world.time / 1000;
          band.i0 = impulse;
        }
        if (band.t1 === undefined && y >= HEAP_BAND[1]) {
          band.t1 = world.time / 1000;
          band.i1 = impulse;
        }
      },
      sample(t) {
        // Mean force since the last sample: the pull is a train of pick-up spikes.
        const impulse = world.jointImpulse(puller).y;
        force.t.push(t);
        force.v.push(t > lastT ? (impulse - lastImpulse) / (t - lastT) : Number.NaN);
        height.t.push(t);
        height.v.push(endHeight());
        lastImpulse = impulse;
        lastT = t;
      },
      finished: () => false,
      series: () => [force, height],
      measured() {
        const basis = `mean force while the end rose from ${HEAP_BAND[0]} m to ${HEAP_BAND[1]} m (impulse over time)`;
        let value = Number.NaN;
        if (band.t0 !== undefined && band.t1 !== undefined) value = (band.i1! - band.i0!) / (band.t1 - band.t0);
        // Uncertainty: spread of the 500 Hz window means inside the band, as a standard error of
        // five blocks (common practice).
        const inside = force.v.filter((_, i) => {
          const y = height.v[i]!;
          return y >= HEAP_BAND[0] && y <= HEAP_BAND[1];
        });
        const ys = height.v.filter((y) => y >= HEAP_BAND[0] && y <= HEAP_BAND[1]);
        const meanY = ys.reduce((s, y) => s + y, 0) / Math.max(1, ys.length);
        const theoryAtSamples = ys.map((y) => params.lambda * (G_SI * y + v * v));
        const residual = inside.map((f, i) => f - theoryAtSamples[i]!);
        const blocks = 5;
        const means: number[] = [];
        for (let b = 0; b < blocks; b++) {
          const part = residual.slice(Math.floor((b * residual.length) / blocks), Math.floor(((b + 1) * residual.length) / blocks));
          if (part.length) means.push(part.reduce((s, x) => s + x, 0) / part.length);
        }
        const mean = means.reduce((s, x) => s + x, 0) / Math.max(1, means.length);
        const spread = Math.sqrt(means.reduce((s, x) => s + (x - mean) ** 2, 0) / Math.max(1, means.length - 1) / Math.max(1, means.length));
        const result: Settled = { value, uncertainty: spread, unit: "N", basis };
        return { force: result, meanHeight: { value: meanY, uncertainty: 0, unit: "m", basis: "mean height of the end over the band" } };
      },
      theory() {
        const meanHeight = (HEAP_BAND[0] + HEAP_BAND[1]) / 2;
        return {
          // λg·ȳ + λv² with ȳ the mean height over the band (the force is linear in y).
          force: heapLiftForce({ lambda: params.lambda, height: meanHeight, speed: v, g: G_SI }),
          forceAtTop: heapLiftForce({ lambda: params.lambda, height: HEAP_BAND[1], speed: v, g: G_SI }),
          momentumFluxShare: (params.lambda * v * v) / heapLiftForce({ lambda: params.lambda, height: meanHeight, speed: v, g: G_SI }),
        };
      },
      scene: () => ({ shapes, view: [-0.3, -0.02, 0.3, params.liftHeight + 0.1], marks: [{ label: "Floor", y: 0 }] }),
      movingShapes: () => [{ kind: "circle", role: "hook", x: metres(puller.px), y: metres(-puller.py) + 0.006, radius: 0.006 }],
    };
  },
};
