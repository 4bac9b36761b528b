import Matter from "matter-js";
import { z } from "zod";
import { type ChainSpec, elementPattern, jointIterationsFor } from "../chain/link-shapes";
import { World, type WorldSettings } from "../core/world";
import { metres, mm, ms } from "../core/units";
import type { SceneShape } from "./rig";

const { Bodies } = Matter;

/**
 * Solver settings shared by the rigs: predicted-angle lever arms, the solve the fountain, heap
 * and scale were checked with. The folded drop, whose links flip over fast in the bend, takes
 * its lever arms from the start of the step instead (World.settings.leverFromStepStart).
 */
export const worldSettingsFor = (dt: number, overrides: Partial<WorldSettings> = {}): WorldSettings => ({
  dt: ms(dt),
  jointIterations: 2,
  positionIterations: 20,
  velocityIterations: 4,
  ...overrides,
});

export const createWorld = (dt: number, overrides: Partial<WorldSettings> = {}) => new World(worldSettingsFor(dt, overrides));

/**
 * What every rig starts from: a world with the step and joint iterations the chain needs, the
 * chain's repeating element pattern, its pitch (joint to joint, mm) and its thickest element (mm).
 */
export function rigSetup(params: ChainSpec & { dt: number }, overrides: Partial<WorldSettings> = {}) {
  const world = createWorld(params.dt, { jointIterations: jointIterationsFor(params), ...overrides });
  const pattern = elementPattern(params);
  const pitch = pattern.reduce((sum, element) => sum + element.pitch, 0);
  const thickness = Math.max(...pattern.map((element) => element.thickness));
  return { world, pattern, pitch, thickness };
}

/** A static box in the internal frame, returned with its drawing in SI (y up). */
export function staticBox(world: World, x: number, y: number, width: number, height: number, role: Extract<SceneShape, { kind: "rect" }>["role"], angle = 0) {
  const body = Bodies.rectangle(x, y, width, height, { isStatic: true, angle, friction: 0.1, restitution: 0, slop: 0.02 });
  world.addStatic(body);
  const shape: SceneShape = { kind: "rect", role, x: metres(x), y: -metres(y), width: metres(width), height: metres(height), angle: -angle };
  return { body, shape };
}

export function staticCircle(world: World, x: number, y: number, radius: number, role: Extract<SceneShape, { kind: "circle" }>["role"]) {
  const body = Bodies.circle(x, y, radius, { isStatic: true, friction: 0.1, restitution: 0, slop: 0.02 }, 24);
  world.addStatic(body);
  const shape: SceneShape = { kind: "circle", role, x: metres(x), y: -metres(y), radius: metres(radius) };
  return { body, shape };
}

/** Internal (mm, y down) → SI height (m, y up). */
export const heightOf = (yInternal: number) => -metres(yInternal);
export const internalY = (height: number) => -mm(height);

export const seedSchema = z.number().int().min(0).max(2 ** 31 - 1);

/** Refuse a run that has gone wrong rather than return nonsense. */
export class UnstableRunError extends Error {
  constructor(
    readonly reason: string,
    readonly time: number,
  ) {
    super(`The simulation went unstable at t = ${time.toFixed(3)} s: ${reason}. Try a smaller time step.`);
    this.name = "UnstableRunError";
  }
}
