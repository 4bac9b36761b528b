import Matter from "matter-js";
import { G_INTERNAL } from "./units";

const { Pairs, Resolver, Collision, Vertices, Axes, Bounds } = Matter;
type MBody = Matter.Body;

// matter-js 0.20's own signatures (the published types describe 0.17).
const bodyUpdate = Matter.Body.update as unknown as (body: MBody, deltaTime: number) => void;
const solvePosition = Resolver.solvePosition as unknown as (pairs: Matter.Pair[], delta: number, damping: number) => void;

/**
 * One end of a pin joint: a point on a body's long axis (offset in mm from its centre,
 * positive towards the body's +x axis), or a point fixed in the world that a rig may move.
 */
export interface PinJoint {
  a: MBody;
  aOffset: number;
  /** null: `a` is pinned to the world point (px, py). */
  b: MBody | null;
  bOffset: number;
  px: number;
  py: number;
  /**
   * Vector sum of the position corrections this step, kg·mm, pulling `a` towards `b`
   * (see units.newtonsFromCorrection). Summed as vectors: iterations that overshoot and
   * come back cancel instead of adding up.
   */
  cx: number;
  cy: number;
  /** Running totals of cx, cy over all steps, for mean forces over a window. */
  totalX: number;
  totalY: number;
  enabled: boolean;
}

export interface WorldSettings {
  /** Fixed step, ms. */
  dt: number;
  jointIterations: number;
  positionIterations: number;
  velocityIterations: number;
  /**
   * Take each joint's lever arms (how a correction turns a body) from the body's angle at the
   * start of the step instead of its predicted angle. A fast-turning link then loses about ten
   * times less energy: a 30-link chain swinging down from level lost 3.7 % of mgL/2 in its
   * first second at 0.25 ms with predicted angles, 0.4 % with these (world.test.ts).
   */
  leverFromStepStart?: boolean;
}

/** What bodies may touch: links carry their index along the chain in plugin.link. */
interface LinkTag {
  link?: number;
  /** Links of a chain that do not collide with each other at all (e.g. on a scale pan). */
  noSelf?: boolean;
  /** Parked bodies are outside the world; joints treat them as immovable. */
  parked?: boolean;
  /** Dense index for the joint solver's scratch arrays. */
  slot?: number;
}

const tagOf = (body: MBody) => body.plugin as LinkTag;

/**
 * A matter-js world stepped by our own loop.
 *
 * Why not Engine.update: matter's stock constraints are tuned per 16.7 ms and ignore the
 * rotational part of a joint's effective mass, so at the small steps a chain needs they
 * stretch or blow up (see DEVELOPERS.md, "Simulation"). The loop below keeps matter's
 * integrator, narrow phase and contact resolver in matter's own order, and replaces the
 * constraint solve with a position-based pin joint and the broadphase with one that skips
 * neighbouring links and works on an explicit list of active bodies.
 */
export class World {
  readonly settings: WorldSettings;
  /** Moving bodies taking part in the step. */
  readonly dynamic: MBody[] = [];
  /** Static and kinematic bodies (walls, floor, frozen links). */
  readonly statics: MBody[] = [];
  readonly joints: PinJoint[] = [];
  time = 0;
  steps = 0;

  private readonly pairs = Pairs.create({});
  private readonly sorted: MBody[] = [];
  private sortedDirty = true;
  /** Joints with at least one end in the world: the only ones a step needs to visit. */
  private activeJoints: PinJoint[] = [];
  private jointsDirty = true;
  private readonly collisions: Matter.Collision[] = [];

  constructor(settings: WorldSettings) {
    this.settings = settings;
  }

  addDynamic(body: MBody) {
    tagOf(body).parked = false;
    this.dynamic.push(body);
    this.sortedDirty = true;
    this.jointsDirty = true;
  }

  addStatic(body: MBody) {
    this.statics.push(body);
    this.sortedDirty = true;
    this.jointsDirty = true;
  }

  /** Take a body out of the step; joints to it then hold it fixed (or are disabled by the rig). */
  park(body: MBody) {
    removeFrom(this.dynamic, body) || removeFrom(this.statics, body);
    tagOf(body).parked = true;
    this.sortedDirty = true;
    this.jointsDirty = true;
  }

  isActive(body: MBody) {
    return !tagOf(body).parked;
  }

  pin(a: MBody, aOffset: number, b: MBody | null, bOffset: number, px = 0, py = 0): PinJoint {
    this.register(a);
    if (b) this.register(b);
    const joint: PinJoint = { a, aOffset, b, bOffset, px, py, cx: 0, cy: 0, totalX: 0, totalY: 0, enabled: true };
    this.joints.push(joint);
    this.jointsDirty = true;
    return joint;
  }

  /** Advance one fixed step. */
  step() {
    const { dt, jointIterations, positionIterations, velocityIterations } = this.settings;
    const dynamic = this.dynamic;
    this.time += dt;
    this.steps += 1;

    if (this.jointsDirty) this.collectActiveJoints();
    for (const joint of this.activeJoints) {
      joint.cx = 0;
      joint.cy = 0;
    }

    if (this.settings.leverFromStepStart) {
      for (let i = 0; i < dynamic.length; i++) {
        const body = dynamic[i]!;
        const slot = tagOf(body).slot;
        if (slot !== undefined) {
          this.startCos[slot] = Math.cos(body.angle);
          this.startSin[slot] = Math.sin(body.angle);
        }
      }
    }
    // Gravity and Verlet integration (matter's own Body.update; frictionAir is 0 on links).
    for (let i = 0; i < dynamic.length; i++) {
      const body = dynamic[i]!;
      body.force.y += body.mass * G_INTERNAL;
      bodyUpdate(body, dt);
    }

    this.solveJoints(jointIterations);

    const collisions = this.detect();
    Pairs.update(this.pairs, collisions, this.time);

    const positionDamping = Math.min(1, Math.max(0, 20 / positionIterations));
    const pairList = this.pairs.list;
    Resolver.preSolvePosition(pairList);
    for (let i = 0; i < positionIterations; i++) solvePosition(pairList, dt, positionDamping);
    Resolver.postSolvePosition(dynamic);

    this.solveJoints(jointIterations);

    Resolver.preSolveVelocity(pairList);
    for (let i = 0; i < velocityIterations; i++) Resolver.solveVelocity(pairList, dt);

    for (let i = 0; i < dynamic.length; i++) {
      const body = dynamic[i]!;
      body.force.x = 0;
      body.force.y = 0;
      body.torque = 0;
    }
  }

  /** Release a joint for good (e.g. a link left lying on the floor lets go of the moving chain). */
  releaseJoint(joint: PinJoint) {
    joint.enabled = false;
    this.jointsDirty = true;
  }

  private collectActiveJoints() {
    const inWorld = (body: MBody | null) => body !== null && !tagOf(body).parked;
    this.activeJoints = this.joints.filter((joint) => joint.enabled && (inWorld(joint.a) || inWorld(joint.b) || joint.b === null));
    // A joint that drops out gave no impulse this step: clear what its last step left.
    for (const joint of this.joints) {
      joint.cx = 0;
      joint.cy = 0;
    }
    this.jointsDirty = false;
  }

  /** Joint force (N) of the last step: corrections spread over the step. */
  jointForce(joint: PinJoint) {
    const dt = this.settings.dt;
    return (Math.hypot(joint.cx, joint.cy) / (dt * dt)) * 1000;
  }

  /** Impulse a joint has given `a` since the start, N·s (SI axes: y up). */
  jointImpulse(joint: PinJoint) {
    const dt = this.settings.dt;
    return { x: joint.totalX / dt, y: -joint.totalY / dt };
  }

  /** Joint force on `a` as a vector (N, SI axes: y up). */
  jointForceVector(joint: PinJoint) {
    const dt = this.settings.dt;
    const scale = 1000 / (dt * dt);
    return { x: joint.cx * scale, y: -joint.cy * scale };
  }

  /**
   * Position-based pin joints: move both ends together along the gap, sharing the move by
   * each body's inverse mass *and* inverse rotational inertia about the joint, so a light
   * link swings instead of dragging its neighbour (matter's stock solve leaves the rotational
   * term out). Axis directions are taken once per pass and advanced by small rotations, so
   * the inner loop has no trigonometry.
   */
  private solveJoints(iterations: number) {
    const joints = this.activeJoints;
    const lever = this.settings.leverFromStepStart === true;
    const pass = ++this.pass;
    const touched = this.touched;
    touched.length = 0;
    const scratch = this.scratch;

    const slotOf = (body: MBody) => {
      const slot = tagOf(body).slot!;
      if (this.passOf[slot] !== pass) {
        this.passOf[slot] = pass;
        const at = slot * 5;
        scratch[at] = Math.cos(body.angle);
        scratch[at + 1] = Math.sin(body.angle);
        scratch[at + 2] = body.position.x;
        scratch[at + 3] = body.position.y;
        scratch[at + 4] = body.angle;
        touched.push(body);
      }
      return slot * 5;
    };

    for (let iteration = 0; iteration < iterations; iteration++) {
      for (let j = 0; j < joints.length; j++) {
        const joint = joints[j]!;
        if (!joint.enabled) continue;
        const a = joint.a;
        const b = joint.b;
        const aFixed = a.isStatic || tagOf(a).parked === true;
        const bFixed = b === null || b.isStatic || tagOf(b).parked === true;
        if (aFixed && bFixed) continue;

        const sa = slotOf(a);
        const rax = scratch[sa]! * joint.aOffset;
        const ray = scratch[sa + 1]! * joint.aOffset;
        const pax = a.position.x + rax;
        const pay = a.position.y + ray;
        let rbx = 0;
        let rby = 0;
        let pbx = joint.px;
        let pby = joint.py;
        let sb = -1;
        if (b !== null) {
          sb = slotOf(b);
          rbx = scratch[sb]! * joint.bOffset;
          rby = scratch[sb + 1]! * joint.bOffset;
          pbx = b.position.x + rbx;
          pby = b.position.y + rby;
        }
        const dx = pbx - pax;
        const dy = pby - pay;
        const gap = Math.sqrt(dx * dx + dy * dy);
        if (gap < 1e-12) continue;
        const nx = dx / gap;
        const ny = dy / gap;
        let raCrossN = rax * ny - ray * nx;
        let rbCrossN = rbx * ny - rby * nx;
        if (lever) {
          const slotA = sa / 5;
          raCrossN = (this.startCos[slotA]! * ny - this.startSin[slotA]! * nx) * joint.aOffset;
          if (b !== null) {
            const slotB = sb / 5;
            rbCrossN = (this.startCos[slotB]! * ny - this.startSin[slotB]! * nx) * joint.bOffset;
          }
        }
        const wa = aFixed ? 0 : a.inverseMass + a.inverseInertia * raCrossN * raCrossN;
        const wb = bFixed ? 0 : b!.inverseMass + b!.inverseInertia * rbCrossN * rbCrossN;
        const lambda = gap / (wa + wb);
        joint.cx += lambda * nx;
        joint.cy += lambda * ny;
        joint.totalX += lambda * nx;
        joint.totalY += lambda * ny;
        if (!aFixed) {
          a.position.x += a.inverseMass * lambda * nx;
          a.position.y += a.inverseMass * lambda * ny;
          const turn = a.inverseInertia * raCrossN * lambda;
          a.angle += turn;
          rotateAxis(scratch, sa, turn);
        }
        if (!bFixed) {
          b!.position.x -= b!.inverseMass * lambda * nx;
          b!.position.y -= b!.inverseMass * lambda * ny;
          const turn = -b!.inverseInertia * rbCrossN * lambda;
          b!.angle += turn;
          rotateAxis(scratch, sb, turn);
        }
      }
    }

    // Bring vertices, axes and bounds along with the moved bodies.
    const shift = this.shift;
    for (let i = 0; i < touched.length; i++) {
      const body = touched[i]!;
      if (body.isStatic || tagOf(body).parked) continue;
      const at = tagOf(body).slot! * 5;
      shift.x = body.position.x - scratch[at + 2]!;
      shift.y = body.position.y - scratch[at + 3]!;
      const turn = body.angle - scratch[at + 4]!;
      if (shift.x === 0 && shift.y === 0 && turn === 0) continue;
      Vertices.translate(body.vertices, shift, 1);
      if (turn !== 0) {
        Vertices.rotate(body.vertices, turn, body.position);
        Axes.rotate(body.axes, turn);
      }
      Bounds.update(body.bounds, body.vertices, body.velocity);
    }
  }

  /** Give a body a dense slot for the joint solver's scratch arrays (before any pass uses it). */
  private register(body: MBody) {
    const tag = tagOf(body);
    if (tag.slot !== undefined) return;
    tag.slot = this.nextSlot++;
    if (tag.slot >= this.passOf.length) this.grow(tag.slot + 1);
  }

  private grow(size: number) {
    const capacity = Math.max(size, this.passOf.length * 2, 64);
    const passOf = new Int32Array(capacity);
    passOf.set(this.passOf);
    this.passOf = passOf;
    const scratch = new Float64Array(capacity * 5);
    scratch.set(this.scratch);
    this.scratch = scratch;
    const startCos = new Float64Array(capacity);
    startCos.set(this.startCos);
    this.startCos = startCos;
    const startSin = new Float64Array(capacity);
    startSin.set(this.startSin);
    this.startSin = startSin;
  }

  private pass = 0;
  private nextSlot = 0;
  private passOf = new Int32Array(0);
  /** Per body slot: axis cos, axis sin, x, y and angle at the start of the pass. */
  private scratch = new Float64Array(0);
  private startCos = new Float64Array(0);
  private startSin = new Float64Array(0);
  private readonly touched: MBody[] = [];
  private readonly shift = { x: 0, y: 0 };

  /**
   * Sweep along x over the active bodies. The order barely changes between steps, so an
   * insertion sort of last step's order is close to linear. Neighbouring links never
   * collide (they share a joint); every other pair may.
   */
  private detect() {
    const sorted = this.sorted;
    if (this.sortedDirty) {
      sorted.length = 0;
      for (const body of this.statics) sorted.push(body);
      for (const body of this.dynamic) sorted.push(body);
      this.sortedDirty = false;
    }
    for (let i = 1; i < sorted.length; i++) {
      const body = sorted[i]!;
      const key = body.bounds.min.x;
      let j = i - 1;
      while (j >= 0 && sorted[j]!.bounds.min.x > key) {
        sorted[j + 1] = sorted[j]!;
        j--;
      }
      sorted[j + 1] = body;
    }

    const collisions = this.collisions;
    let count = 0;
    for (let i = 0; i < sorted.length; i++) {
      const a = sorted[i]!;
      const boundsA = a.bounds;
      const maxX = boundsA.max.x;
      const aStatic = a.isStatic;
      const aTag = tagOf(a);
      for (let j = i + 1; j < sorted.length; j++) {
        const b = sorted[j]!;
        const boundsB = b.bounds;
        if (boundsB.min.x > maxX) break;
        if (boundsA.max.y < boundsB.min.y || boundsA.min.y > boundsB.max.y) continue;
        if (aStatic && b.isStatic) continue;
        const bTag = tagOf(b);
        if (aTag.link !== undefined && bTag.link !== undefined) {
          const apart = aTag.link - bTag.link;
          if (apart <= 1 && apart >= -1) continue;
          if (aTag.noSelf || bTag.noSelf) continue;
        }
        const collision = Collision.collides(a, b, this.pairs);
        if (collision) collisions[count++] = collision;
      }
    }
    collisions.length = count;
    return collisions;
  }

  /** Move a static body to a new place, with a velocity contacts can see (kinematic). */
  moveKinematic(body: MBody, x: number, y: number) {
    const dx = x - body.position.x;
    const dy = y - body.position.y;
    body.positionPrev.x = body.position.x;
    body.positionPrev.y = body.position.y;
    body.position.x = x;
    body.position.y = y;
    this.shift.x = dx;
    this.shift.y = dy;
    Vertices.translate(body.vertices, this.shift, 1);
    Bounds.update(body.bounds, body.vertices, this.shift);
  }
}

function rotateAxis(scratch: Float64Array, at: number, turn: number) {
  const c = scratch[at]!;
  const s = scratch[at + 1]!;
  // Small-angle rotation, renormalised: exact enough for the sub-degree turns of one pass.
  let nc = c - s * turn;
  let ns = s + c * turn;
  const norm = 1 / Math.sqrt(nc * nc + ns * ns);
  nc *= norm;
  ns *= norm;
  scratch[at] = nc;
  scratch[at + 1] = ns;
}

function removeFrom(list: MBody[], body: MBody) {
  const index = list.indexOf(body);
  if (index < 0) return false;
  list.splice(index, 1);
  return true;
}

export function tagBody(body: MBody, tag: LinkTag) {
  body.plugin = { ...(body.plugin as object), ...tag };
}

export function linkIndexOf(body: MBody) {
  return tagOf(body).link;
}

export function isParked(body: MBody) {
  return tagOf(body).parked === true;
}
