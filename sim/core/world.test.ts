import { describe, expect, it } from "vitest";
import { buildChain, elementsFor } from "../chain/chain";
import { chainSchema, elementPattern } from "../chain/link-shapes";
import { createWorld } from "../rigs/common";
import { G_INTERNAL } from "./units";

/**
 * A frictionless chain swinging down from level, pinned at one end, must keep its energy:
 * kinetic (translation and rotation) plus potential is conserved [textbook mechanics]. A
 * position-based joint solve loses some in fast-turning links; this pins how much.
 */
function energyLossAfterOneSecond(leverFromStepStart: boolean, dt = 0.00025) {
  const world = createWorld(dt, { leverFromStepStart });
  const elements = elementsFor(elementPattern(chainSchema.parse({})), 30);
  const chain = buildChain(world, [{ x: 0, y: 0 }, { x: 1000, y: 0 }], elements, { friction: 0 });
  world.pin(chain.bodies[0]!, -elements[0]!.pitch / 2, null, 0, 0, 0);
  const step = world.settings.dt;
  const energy = () =>
    chain.bodies.reduce((sum, b) => {
      const vx = (b.position.x - b.positionPrev.x) / step;
      const vy = (b.position.y - b.positionPrev.y) / step;
      const omega = (b.angle - b.anglePrev) / step;
      return sum + 0.5 * b.mass * (vx * vx + vy * vy) + 0.5 * b.inertia * omega * omega - b.mass * G_INTERNAL * b.position.y;
    }, 0);
  const start = energy();
  for (let i = 0; i < Math.round(1 / dt); i++) world.step();
  // As a share of the energy released by the fall of the chain's middle, m·g·L/2.
  return (start - energy()) / (chain.mass * G_INTERNAL * (chain.length / 2));
}

describe("pin-joint solve", () => {
  it("keeps a swinging chain's energy to within 1 % over a second with lever arms from the step's start", () => {
    const loss = energyLossAfterOneSecond(true);
    expect(loss).toBeGreaterThan(-0.01);
    expect(loss).toBeLessThan(0.01);
  });

  it("loses several times more with predicted-angle lever arms (the fountain's calibrated solve)", () => {
    expect(energyLossAfterOneSecond(false)).toBeGreaterThan(3 * Math.abs(energyLossAfterOneSecond(true)));
  });

  it("holds its joints closed: the largest gap stays under 0.25 mm (1.25 % of a link)", () => {
    const world = createWorld(0.00025);
    const elements = elementsFor(elementPattern(chainSchema.parse({})), 30);
    const chain = buildChain(world, [{ x: 0, y: 0 }, { x: 1000, y: 0 }], elements, { friction: 0 });
    world.pin(chain.bodies[0]!, -10, null, 0, 0, 0);
    let worst = 0;
    for (let i = 0; i < 2000; i++) {
      world.step();
      for (const joint of chain.joints) {
        const a = joint.a;
        const b = joint.b!;
        const gap = Math.hypot(
          b.position.x + Math.cos(b.angle) * joint.bOffset - (a.position.x + Math.cos(a.angle) * joint.aOffset),
          b.position.y + Math.sin(b.angle) * joint.bOffset - (a.position.y + Math.sin(a.angle) * joint.aOffset),
        );
        worst = Math.max(worst, gap);
      }
    }
    expect(worst).toBeLessThan(0.25);
  });
});
