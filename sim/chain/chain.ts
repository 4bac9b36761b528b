import Matter from "matter-js";
import { isParked, type PinJoint, type World, tagBody } from "../core/world";
import type { ElementSpec } from "./link-shapes";
import { layAlongPath, type Point } from "./path";

const { Bodies, Body } = Matter;

export interface Chain {
  bodies: Matter.Body[];
  elements: ElementSpec[];
  /** joints[i] joins bodies[i] (its +x end) to bodies[i + 1] (its −x end). */
  joints: PinJoint[];
  /** Total mass, kg, and length along the joints, mm. */
  mass: number;
  length: number;
}

export interface BuildOptions {
  /** Links of this chain never collide with each other (still with everything else). */
  noSelfCollision?: boolean;
  /** Add bodies to the world's active list at once (false: the rig decides, e.g. parks them). */
  activate?: boolean;
  /** Friction and restitution of link contacts; 0 restitution (plastic pick-up and landing). */
  friction?: number;
}

/** How many elements of `pattern` (repeated) fit in `count` links. */
export function elementsFor(pattern: readonly ElementSpec[], links: number): ElementSpec[] {
  const out: ElementSpec[] = [];
  for (let i = 0; i < links; i++) for (const element of pattern) out.push(element);
  return out;
}

/**
 * Build a chain whose joints lie along `path` (internal frame), element 0 at the path's
 * start. Each element becomes one matter body with physical mass and inertia, pinned to its
 * neighbours at its ends.
 */
export function buildChain(world: World, path: readonly Point[], elements: readonly ElementSpec[], options: BuildOptions = {}): Chain {
  const points = layAlongPath(
    path,
    elements.map((element) => element.pitch),
  );
  if (points.length < elements.length + 1) {
    throw new Error(`The path is too short for the chain: room for ${points.length - 1} of ${elements.length} links`);
  }
  const bodies: Matter.Body[] = [];
  let mass = 0;
  let length = 0;
  elements.forEach((element, i) => {
    const p = points[i]!;
    const q = points[i + 1]!;
    const angle = Math.atan2(q.y - p.y, q.x - p.x);
    const x = (p.x + q.x) / 2;
    const y = (p.y + q.y) / 2;
    const common = {
      angle,
      friction: options.friction ?? 0.1,
      frictionStatic: 0.5,
      frictionAir: 0,
      restitution: 0,
      slop: 0.02,
    };
    const body =
      element.kind === "ball" || element.kind === "bead"
        ? Bodies.circle(x, y, element.length / 2, common, 12)
        : Bodies.rectangle(x, y, element.length, element.thickness, common);
    Body.setMass(body, element.mass);
    Body.setInertia(body, element.inertia);
    tagBody(body, { link: i, noSelf: options.noSelfCollision === true, parked: true });
    bodies.push(body);
    mass += element.mass;
    length += element.pitch;
  });

  const joints = bodies.slice(1).map((body, i) => world.pin(bodies[i]!, elements[i]!.pitch / 2, body, -elements[i + 1]!.pitch / 2));
  if (options.activate !== false) for (const body of bodies) world.addDynamic(body);
  return { bodies, elements: [...elements], joints, mass, length };
}

/** Largest gap between joined ends, mm: a blown-up run shows here first. */
export function largestJointGap(chain: Chain): number {
  let worst = 0;
  for (const joint of chain.joints) {
    if (!joint.enabled) continue;
    const a = joint.a;
    const b = joint.b!;
    // Parked links wait outside the world; their joints are not being solved.
    if (isParked(a) || isParked(b)) continue;
    const ax = a.position.x + Math.cos(a.angle) * joint.aOffset;
    const ay = a.position.y + Math.sin(a.angle) * joint.aOffset;
    const bx = b.position.x + Math.cos(b.angle) * joint.bOffset;
    const by = b.position.y + Math.sin(b.angle) * joint.bOffset;
    worst = Math.max(worst, Math.hypot(bx - ax, by - ay));
  }
  return worst;
}
