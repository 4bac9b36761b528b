import { buildChain, elementsFor } from "../chain/chain";
import type { Point } from "../chain/path";
import { G_SI, metres, mm } from "../core/units";
import { newSeries, type Settled, settleOver } from "../probes/series";
import { catenaryFromSpan } from "../theory/catenary";
import { rigSetup, staticCircle } from "./common";
import { hangingCatalogEntry, hangingSchema } from "./hanging.params";
import type { RigDefinition, SceneShape } from "./rig";

/** Damped settling, then an undamped window the sag is read over (sim-notes: 0.05 for ~4 s). */
const SETTLE_S = 3;
const MEASURE_S = 1;
const SETTLING_DAMPING = 0.05;

export const hangingRig: RigDefinition<typeof hangingSchema> = {
  ...hangingCatalogEntry,
  create(params) {
    const { world, pattern, pitch } = rigSetup(params);
    const links = Math.max(2, Math.round(mm(params.chainLength) / pitch));
    const elements = elementsFor(pattern, links);
    const length = elements.reduce((s, e) => s + e.pitch, 0);

    const left: Point = { x: -mm(params.span) / 2, y: 0 };
    const right: Point = { x: mm(params.span) / 2, y: -mm(params.heightDifference) };
    // Start as a V of the chain's own length, then let it settle into the curve.
    const middleX = (left.x + right.x) / 2;
    const depth = vDepth(left, right, middleX, length);
    const path: Point[] = [left, { x: middleX, y: Math.max(left.y, right.y) + depth }, right, { x: right.x + 1000, y: right.y }];
    const chain = buildChain(world, path, elements, { friction: 0 });
    for (const body of chain.bodies) body.frictionAir = SETTLING_DAMPING;
    const first = chain.bodies[0]!;
    const last = chain.bodies[chain.bodies.length - 1]!;
    world.pin(first, -chain.elements[0]!.pitch / 2, null, 0, left.x, left.y);
    const end = world.pin(last, chain.elements[chain.elements.length - 1]!.pitch / 2, null, 0, right.x, right.y);
    const shapes: SceneShape[] = [
      staticCircle(world, left.x, left.y - 6, 5, "support").shape,
      staticCircle(world, right.x, right.y - 6, 5, "support").shape,
    ];

    const sag = newSeries("sag", "Sag below the lower support", "m");
    const tension = newSeries("lowestTension", "Horizontal pull (the tension at the lowest point)", "N");
    const endTension = newSeries("endTensionX", "Pull of the right support, across", "N");
    const endTensionY = newSeries("endTensionY", "Pull of the right support, up", "N");
    const lowerSupportY = Math.max(left.y, right.y);
    let damped = true;
    let lastT = 0;
    let lastLow = { x: 0, y: 0 };
    let lastEnd = { x: 0, y: 0 };
    // The horizontal pull is the same all along a hanging chain; read it mid-chain.
    const middleJoint = Math.floor(chain.joints.length / 2);

    const lowest = () => {
      let worst = Number.NEGATIVE_INFINITY;
      for (const joint of chain.joints) worst = Math.max(worst, joint.a.position.y + Math.sin(joint.a.angle) * joint.aOffset);
      return { y: worst };
    };

    return {
      world,
      chain,
      duration: SETTLE_S + MEASURE_S,
      step() {
        if (damped && world.time >= SETTLE_S * 1000) {
          damped = false;
          for (const body of chain.bodies) body.frictionAir = 0;
        }
        world.step();
      },
      sample(t) {
        const low = lowest();
        // Mean joint forces since the last sample (impulse over time): per-step forces of a
        // position-based solve are noisy. At the lowest point the tension is horizontal.
        const impulseLow = world.jointImpulse(chain.joints[middleJoint]!);
        const impulseEnd = world.jointImpulse(end);
        const span = t - lastT;
        sag.t.push(t);
        sag.v.push(metres(low.y - lowerSupportY));
        tension.t.push(t);
        if (span > 0) {
          tension.v.push((impulseLow.x - lastLow.x) / span);
          endTension.v.push((impulseEnd.x - lastEnd.x) / span);
          endTensionY.v.push((impulseEnd.y - lastEnd.y) / span);
        } else {
          tension.v.push(Number.NaN);
          endTension.v.push(Number.NaN);
          endTensionY.v.push(Number.NaN);
        }
        endTension.t.push(t);
        endTensionY.t.push(t);
        lastT = t;
        lastLow = impulseLow;
        lastEnd = impulseEnd;
      },
      finished: () => false,
      series: () => [sag, tension, endTension, endTensionY],
      measured: () => ({
        sag: settleOver(sag, SETTLE_S, SETTLE_S + MEASURE_S, "mean over the last second, after settling"),
        lowestTension: settleOver(tension, SETTLE_S, SETTLE_S + MEASURE_S, "mean over the last second"),
        endTension: magnitude(
          settleOver(endTension, SETTLE_S, SETTLE_S + MEASURE_S, "mean over the last second"),
          settleOver(endTensionY, SETTLE_S, SETTLE_S + MEASURE_S, "mean over the last second"),
        ),
      }),
      theory: () => {
        const curve = catenaryFromSpan({ span: params.span, length: metres(length), heightDifference: params.heightDifference, lambda: params.lambda, g: G_SI });
        return { sag: curve.sag, lowestTension: curve.lowestPointTension, endTension: curve.endTensions.second, catenaryParameter: curve.a };
      },
      scene: () => ({
        shapes,
        view: [metres(left.x) - 0.1, -metres(lowerSupportY) - metres(length) / 2 - 0.1, metres(right.x) + 0.1, Math.max(0, params.heightDifference) + 0.1],
        marks: [{ label: "Supports", y: -metres(lowerSupportY) }],
      }),
    };
  },
};

function magnitude(x: Settled, y: Settled): Settled {
  const value = Math.hypot(x.value, y.value);
  return { value, uncertainty: Math.hypot(x.value * x.uncertainty, y.value * y.uncertainty) / value, unit: x.unit, basis: x.basis };
}

/** Depth of the V's tip below the lower support so the V has the chain's length. */
function vDepth(left: Point, right: Point, middleX: number, length: number) {
  const low = Math.max(left.y, right.y);
  let lo = 0;
  let hi = length;
  for (let i = 0; i < 60; i++) {
    const d = (lo + hi) / 2;
    const tip = low + d;
    const total = Math.hypot(middleX - left.x, tip - left.y) + Math.hypot(right.x - middleX, tip - right.y);
    if (total > length) hi = d;
    else lo = d;
  }
  return lo;
}
