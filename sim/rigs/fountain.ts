import Matter from "matter-js";
import { buildChain, elementsFor } from "../chain/chain";
import { pickUpGeometry } from "../chain/link-shapes";
import { arc, type Point } from "../chain/path";
import { seededRandom } from "../core/random";
import { G_SI, metres, mm } from "../core/units";
import type { PinJoint } from "../core/world";
import { newSeries, type Settled, settleOver, settleValues } from "../probes/series";
import { fountainEnergyBudget, fountainSteady } from "../theory/fountain";
import { idealAlphaBound } from "../theory/link-push";
import { rigSetup, staticBox, staticCircle } from "./common";
import { fountainCatalogEntry, fountainSchema } from "./fountain.params";
import type { RigDefinition, SceneShape } from "./rig";

const { Body } = Matter;

/** The rim stands this far above the top of the pile (sim-notes: a few mm, rounded). */
const RIM_ABOVE_PILE_MM = 3;
const RIM_RADIUS_MM = 4;
const WALL_MM = 6;
/** A link has left the pile once its centre is this far above the rim. */
const LEFT_PILE_MARGIN_MM = 8;
/** Links this close to the floor (centre, mm) have landed. */
const LANDED_MM = 25;
/**
 * Below this height (mm) a link that has moved slower than RESTING_SPEED (m/s) for RESTING_MS
 * has landed on the heap. The time matters: a link at the top of a bounce, or in the strand
 * hanging still at the start, is slow only for a moment (under 0.5 m/s near an apex for
 * 2 × 0.5/9.81 ≈ 0.1 s), and parking it there would leave it hanging in mid-air.
 */
const RESTING_ON_HEAP_MM = 300;
const RESTING_SPEED = 0.5;
const RESTING_MS = 150;
/** Landed links kept in the world (the rest are parked where they lie). */
const KEPT_ON_FLOOR = 8;
/** The pile's support follows its target height with this lag, ms. */
const LIFT_LAG_MS = 8;
/** mm/ms = m/s. */
const MAX_LIFT_SPEED = 0.5;
/** Where the pot and floor tensions are read: this far above the pile top / the floor. */
const POT_PROBE_MM = 25;
const FLOOR_PROBE_MM = 40;

export const fountainRig: RigDefinition<typeof fountainSchema> = {
  ...fountainCatalogEntry,
  create(params, seed) {
    const random = seededRandom(seed);
    // The predicted-angle joint solve is part of the fountain's calibration: with lever arms
    // from the start of the step the chain loses less energy in its waves and rises about
    // 0.24 of the drop at this step, above what real chains do (DEVELOPERS.md, "Simulation").
    const { world, pattern, pitch, thickness } = rigSetup(params);
    const elements = elementsFor(pattern, params.links);
    const H = mm(params.potHeight);
    const lambda = params.lambda;

    // Pot: inside from xL to xR; rows of links lie across it.
    const inner = mm(params.potWidth);
    const xR = 0;
    const xL = -inner;
    const rowSpacing = thickness + 0.3;
    const pileTopY = -H;
    const rimCentre = { x: xR + WALL_MM / 2, y: pileTopY - RIM_ABOVE_PILE_MM + RIM_RADIUS_MM };
    const arcRadius = RIM_RADIUS_MM + thickness / 2 + 1.5;
    const looseRows = params.looseRows;
    const wallDepth = (looseRows + 3) * rowSpacing + 30;

    const floor = staticBox(world, 0, 50, 4000, 100, "floor");
    const rightWall = staticBox(world, rimCentre.x, rimCentre.y + wallDepth / 2, WALL_MM, wallDepth, "wall");
    const leftTop = pileTopY - 40;
    const leftWall = staticBox(world, xL - WALL_MM / 2, leftTop + (wallDepth + 40) / 2, WALL_MM, wallDepth + 40, "wall");
    const rim = staticCircle(world, rimCentre.x, rimCentre.y, RIM_RADIUS_MM, "rim");

    // Lay the chain: end on the floor, up beside the pot, over the rim, then the pile in
    // folded rows from the top down (sim-notes: an arc over the rim so nothing starts in a wall).
    const outsideX = rimCentre.x + arcRadius;
    const rowStartX = rimCentre.x - arcRadius - 1;
    const rowEndX = xL + 0.1 * pitch;
    const firstRowY = pileTopY + thickness / 2;
    const rowsNeeded = Math.ceil((elements.length * pitch) / Math.max(pitch, rowStartX - rowEndX - pitch)) + 3;
    const path: Point[] = [{ x: outsideX, y: -thickness / 2 }, { x: outsideX, y: rimCentre.y }];
    path.push(...arc(rimCentre.x, rimCentre.y, arcRadius, 0, -Math.PI, 32).slice(1));
    for (let row = 0; row < rowsNeeded; row++) {
      const y = firstRowY + row * rowSpacing;
      const jitter = random.between(0, 0.15 * pitch);
      const [from, to] = row % 2 === 0 ? [rowStartX, rowEndX + jitter] : [rowEndX, rowStartX - jitter];
      path.push({ x: from, y }, { x: to, y });
    }
    const chain = buildChain(world, path, elements, { activate: false });
    const bodies = chain.bodies;

    // Which row of the pile each element starts in (−1: outside the pot).
    const rowOf = bodies.map((body) => (body.position.y > firstRowY - rowSpacing / 2 && body.position.x < xR ? Math.round((body.position.y - firstRowY) / rowSpacing) : -1));
    const firstInPile = rowOf.findIndex((r) => r >= 0);
    const rowStart: number[] = [];
    rowOf.forEach((r, i) => {
      if (r >= 0 && rowStart[r] === undefined) rowStart[r] = i;
    });
    const rowCount = rowStart.length;
    const rowEndIndex = (r: number) => (r + 1 < rowCount ? rowStart[r + 1]! : bodies.length);
    const baseY = bodies.map((body) => body.position.y);

    // Outside the pot and the loose rows: moving. The next row: frozen, carried by the lift.
    // Deeper rows: parked (not in the world) until needed.
    let topRow = 0;
    let lift = 0;
    let liftSpeed = 0;
    const frozen: number[] = [];
    const activate = (i: number) => {
      const body = bodies[i]!;
      if (body.isStatic) {
        Body.setStatic(body, false);
        world.park(body);
      }
      // Carry the lift's motion into the link so it does not start with a jolt.
      Body.setPosition(body, { x: body.position.x, y: baseY[i]! - lift });
      body.positionPrev.y = body.position.y + liftSpeed * world.settings.dt;
      world.addDynamic(body);
    };
    const freezeRow = (r: number) => {
      frozen.length = 0;
      if (r >= rowCount) return;
      for (let i = rowStart[r]!; i < rowEndIndex(r); i++) {
        const body = bodies[i]!;
        Body.setPosition(body, { x: body.position.x, y: baseY[i]! - lift });
        Body.setStatic(body, true);
        world.addStatic(body);
        frozen.push(i);
      }
    };
    for (let i = 0; i < firstInPile; i++) activate(i);
    for (let r = 0; r < Math.min(looseRows, rowCount); r++) for (let i = rowStart[r]!; i < rowEndIndex(r); i++) activate(i);
    freezeRow(looseRows);
    // Under the frozen row, a plate across the pot moves up with it (the piston).
    const piston = staticBox(world, (xL + xR) / 2, firstRowY + (looseRows + 0.5) * rowSpacing + 2.5, inner - 0.5, 5, "pot");

    // Bookkeeping pointers along the chain: [0, landed) on the floor; [landed, firstLying) in the air.
    /** Lowest-numbered link still lying in the pot: links before it are in the air or landed. */
    let firstLying = firstInPile;
    let landed = 0;
    let parkedOnFloor = 0;
    const rimTopY = rimCentre.y - RIM_RADIUS_MM;
    const outOfPotY = rimTopY - LEFT_PILE_MARGIN_MM;

    const rise = newSeries("rise", "Rise of the chain above the rim", "m");
    const speed = newSeries("speed", "Chain speed", "m/s");
    const potTension = newSeries("potTension", "Tension just above the pile", "N");
    const floorTension = newSeries("floorTension", "Tension just above the floor", "N");
    const alphaPush = newSeries("alphaPush", "Pot push coefficient α (momentum balance)", "");
    const betaPull = newSeries("betaPull", "Floor pull coefficient β", "");
    const windowTension = { pot: 0, potSteps: 0, floor: 0, floorSteps: 0 };
    let finishedAt: number | null = null;

    const jointHeight = (joint: PinJoint) => joint.a.position.y + Math.sin(joint.a.angle) * joint.aOffset;
    /** Tension along the chain at a joint this step, N (positive: pulling the links together). */
    const tensionAt = (joint: PinJoint) => {
      const f = world.jointForceVector(joint);
      const a = joint.a.position;
      const b = joint.b!.position;
      const ux = b.x - a.x;
      const uy = -(b.y - a.y);
      const norm = Math.hypot(ux, uy) || 1;
      return (f.x * ux + f.y * uy) / norm;
    };

    const linksPerRow = Math.max(1, Math.round(bodies.length > firstInPile ? (rowEndIndex(0) - rowStart[0]!) : 1));
    const frozenFirst = () => (topRow + looseRows < rowCount ? rowStart[topRow + looseRows]! : bodies.length);
    const promote = () => {
      topRow++;
      const incoming = topRow + looseRows - 1;
      if (incoming < rowCount) {
        for (const i of frozen) world.park(bodies[i]!);
        for (let i = rowStart[incoming]!; i < rowEndIndex(incoming); i++) activate(i);
        freezeRow(incoming + 1);
      }
    };
    const inPot = (body: Matter.Body) => body.position.y > outOfPotY && body.position.x < xR;

    // On the floor, or come to rest on the heap of links already there. Asked every step about
    // the next link to land only, so one clock is enough: when that link went slow.
    let slowSince = Number.NaN;
    let slowIndex = -1;
    const hasLanded = (index: number) => {
      const body = bodies[index]!;
      if (body.position.y > -LANDED_MM) return true;
      const step = Math.hypot(body.position.x - body.positionPrev.x, body.position.y - body.positionPrev.y);
      if (body.position.y < -RESTING_ON_HEAP_MM || step / world.settings.dt >= RESTING_SPEED) {
        slowIndex = -1;
        return false;
      }
      if (slowIndex !== index) {
        slowIndex = index;
        slowSince = world.time;
      }
      return world.time - slowSince >= RESTING_MS;
    };

    const updatePile = () => {
      // Count the loose links still lying in the pot (only the last few rows can be there).
      const end = frozenFirst();
      const scanFrom = Math.max(firstInPile, end - (looseRows + 2) * linksPerRow);
      let inPile = 0;
      firstLying = end;
      for (let i = end - 1; i >= scanFrom; i--) {
        if (inPot(bodies[i]!)) {
          inPile++;
          firstLying = i;
        }
      }
      // A row's worth gone: free the frozen row and freeze the next (never let the frozen
      // row hold the chain back).
      if (topRow < rowCount && inPile <= (looseRows - 1) * linksPerRow) promote();
      // Lift the pile so its top stays at the pot height: the frozen row sits as many rows
      // below the top as there are rows' worth of loose links still lying in the pot.
      const frozenRow = Math.min(topRow + looseRows, rowCount);
      const wantedFrozenY = pileTopY + (inPile / linksPerRow + 0.5) * rowSpacing;
      const target = firstRowY + frozenRow * rowSpacing - wantedFrozenY;
      // Never down (the piston would pull away), never faster than the chain could empty it.
      liftSpeed = Math.min(MAX_LIFT_SPEED, Math.max(0, (target - lift) / LIFT_LAG_MS));
      lift += liftSpeed * world.settings.dt;
      for (const i of frozen) world.moveKinematic(bodies[i]!, bodies[i]!.position.x, baseY[i]! - lift);
      world.moveKinematic(piston.body, piston.body.position.x, firstRowY + (frozenRow + 0.5) * rowSpacing + 2.5 - lift);
      // Landed links: keep the last few moving, park the rest where they lie.
      while (landed < firstLying && hasLanded(landed)) landed++;
      while (parkedOnFloor < landed - KEPT_ON_FLOOR) {
        world.park(bodies[parkedOnFloor]!);
        const joint = chain.joints[parkedOnFloor];
        if (joint) world.releaseJoint(joint);
        parkedOnFloor++;
      }
    };

    const readTensions = () => {
      // Just above the pile on the rising side: the last links to leave.
      for (let i = firstLying - 1; i > landed && i > 0; i--) {
        const joint = chain.joints[i - 1]!;
        if (jointHeight(joint) < pileTopY - POT_PROBE_MM) {
          // Moving string: T − λgz is the same along a steady chain, so carry the reading
          // down to the top of the pile.
          windowTension.pot += tensionAt(joint) - lambda * G_SI * metres(pileTopY - jointHeight(joint));
          windowTension.potSteps++;
          break;
        }
      }
      for (let i = landed; i < firstLying - 1; i++) {
        const joint = chain.joints[i]!;
        if (jointHeight(joint) < -FLOOR_PROBE_MM) {
          windowTension.floor += tensionAt(joint) - lambda * G_SI * metres(-jointHeight(joint));
          windowTension.floorSteps++;
          break;
        }
      }
    };

    const shapes: SceneShape[] = [floor.shape, leftWall.shape, rightWall.shape, rim.shape];
    const chainLength = metres(chain.length);

    return {
      world,
      chain,
      // Enough for the whole chain to pour out at the theory's speed, plus the start.
      duration: Math.min(30, chainLength / fountainSteady({ potHeight: params.potHeight, alpha: 0, beta: 0 }).speed + 1.5),
      step() {
        world.step();
        updatePile();
        readTensions();
        if (finishedAt === null && firstLying >= bodies.length - linksPerRow) finishedAt = world.time / 1000;
      },
      sample(t) {
        // Highest point of the chain between the pile and the floor.
        let top = Number.POSITIVE_INFINITY;
        let speedSum = 0;
        let moving = 0;
        const dt = world.settings.dt;
        for (let i = landed; i < firstLying; i++) {
          const body = bodies[i]!;
          if (body.position.y < top) top = body.position.y;
          // Speed of the links themselves (beads, not the light thread between them, which
          // flaps). The chain also carries waves across itself, so this is a little more than
          // the speed along the chain; it is the speed the momentum balance needs.
          if (i > landed + 3 && i < firstLying - 3 && i % pattern.length === 0) {
            speedSum += Math.hypot(body.position.x - body.positionPrev.x, body.position.y - body.positionPrev.y) / dt;
            moving++;
          }
        }
        rise.t.push(t);
        rise.v.push(Number.isFinite(top) ? Math.max(0, metres(rimTopY - top)) : 0);
        const v = moving > 0 ? speedSum / moving : Number.NaN;
        speed.t.push(t);
        speed.v.push(v);
        const tPot = windowTension.potSteps > 0 ? windowTension.pot / windowTension.potSteps : Number.NaN;
        const tFloor = windowTension.floorSteps > 0 ? windowTension.floor / windowTension.floorSteps : Number.NaN;
        windowTension.pot = windowTension.potSteps = windowTension.floor = windowTension.floorSteps = 0;
        potTension.t.push(t);
        potTension.v.push(tPot);
        floorTension.t.push(t);
        floorTension.v.push(tFloor);
        // Momentum balance at the pot: the chain leaving carries λv² of momentum per second;
        // what the tension does not supply, the pile's push R = αλv² does.
        const flux = lambda * v * v;
        alphaPush.t.push(t);
        alphaPush.v.push(flux > 0 ? 1 - tPot / flux : Number.NaN);
        betaPull.t.push(t);
        betaPull.v.push(flux > 0 ? tFloor / flux : Number.NaN);
      },
      finished: () => finishedAt !== null,
      series: () => [rise, speed, potTension, floorTension, alphaPush, betaPull],
      measured() {
        const end = finishedAt ?? world.time / 1000;
        // Steady flow: from 40 % of the run (the chain has reached its speed) to the end.
        const from = Math.max(0.8, 0.4 * end);
        const basis = `mean from ${from.toFixed(1)} s to ${end.toFixed(1)} s of steady flow`;
        const v = settleOver(speed, from, end, basis);
        const pot = settleOver(potTension, from, end, basis);
        const flux = lambda * v.value * v.value;
        const alpha: Settled = {
          value: 1 - pot.value / flux,
          uncertainty: Math.hypot(pot.uncertainty / flux, (2 * pot.value * v.uncertainty) / (flux * v.value)),
          unit: "",
          basis: `${basis}; momentum balance at the pot: α = 1 − T_pot/(λv²)`,
        };
        const floorT = settleOver(floorTension, from, end, basis);
        const h = settleOver(rise, from, end, basis);
        return {
          rise: h,
          riseRatio: { ...h, value: h.value / params.potHeight, uncertainty: h.uncertainty / params.potHeight, unit: "" },
          speed: v,
          alphaPush: alpha,
          betaPull: { value: floorT.value / flux, uncertainty: floorT.uncertainty / flux, unit: "", basis },
          potTension: pot,
          // g·h2 = α·v² holds whatever α is (physics-reference §1): the α the rise implies.
          alphaFromRise: settleValues([(G_SI * (h.value + metres(RIM_ABOVE_PILE_MM))) / (v.value * v.value)], "", "g·h/v² from the settled rise and speed"),
        };
      },
      theory() {
        const steady = fountainSteady({ potHeight: params.potHeight, alpha: params.theoryAlpha, beta: params.theoryBeta, lambda });
        const budget = fountainEnergyBudget({ potHeight: params.potHeight, alpha: params.theoryAlpha, beta: params.theoryBeta, lambda });
        const bound = idealAlphaBound(pickUpGeometry(params));
        return {
          alpha: params.theoryAlpha,
          beta: params.theoryBeta,
          speed: steady.speed,
          // The theory's rise is above the top of the pile; the rim stands a few mm higher.
          rise: steady.rise - metres(RIM_ABOVE_PILE_MM),
          riseRatio: steady.riseRatio,
          idealAlphaBound: bound,
          idealRise: bound < 1 ? fountainSteady({ potHeight: params.potHeight, alpha: bound, beta: 0 }).rise : Number.NaN,
          powerReleased: budget.released,
          kineticFlux: budget.kineticFlux,
          lostAtPile: budget.lostAtPile,
          lostAtFloor: budget.lostAtFloor,
        };
      },
      movingShapes: () => {
        const b = piston.body.bounds;
        return [{ kind: "rect", role: "pot", x: metres((b.min.x + b.max.x) / 2), y: -metres((b.min.y + b.max.y) / 2), width: metres(b.max.x - b.min.x), height: metres(b.max.y - b.min.y), angle: 0 }];
      },
      // The chain still waiting below the frozen row is stock, not drawn.
      // Rows below the frozen one wait outside the world at their starting depth: not drawn.
      // (By row, not by a row's length in links: rows differ by a link or two, and a link of
      // the next row drawn early showed at its starting depth, in mid-air below the pot.)
      hidden: (i) => {
        const frozenRow = topRow + looseRows;
        return frozenRow < rowCount && i >= rowEndIndex(frozenRow) && !world.isActive(bodies[i]!);
      },
      scene: () => ({
        shapes,
        view: [-0.35 - params.potWidth, -0.02, 0.35, params.potHeight + 0.45],
        marks: [
          { label: "Rim", y: metres(-rimTopY) },
          { label: "Floor", y: 0 },
        ],
      }),
    };
  },
};
