/**
 * Speed of the fountain simulation: prints figures, asserts nothing (timed unit tests would
 * be flaky). For each chain length at the shipped step:
 * - real-time factor of a whole recorded trial (simulated s per wall s, frames at 60 Hz);
 * - our step against bare matter-js (Engine.update with stock constraints) stepping the same
 *   bodies and joints, taken from the same moment of the same run;
 * - bare matter-js with every link in the world (what parking the pile saves).
 *
 *   npm run bench:sim            (all sizes)
 *   npm run bench:sim -- 1000    (one size)
 */
import Matter from "matter-js";
import { RIGS, runTrial, SHIPPED_DT, TrialRunner } from "../../sim";

const SIZES = process.argv.slice(2).map(Number).filter((n) => n > 0);
const sizes = SIZES.length ? SIZES : [250, 500, 1000, 2000];
const TIMED_STEPS = 2000;

const now = () => performance.now();

function timeSteps(step: () => void, count: number) {
  const started = now();
  for (let i = 0; i < count; i++) step();
  return (now() - started) / count;
}

/** A fountain trial advanced to its steady flow (1 s in), deterministic for a given seed. */
function steadyFountain(links: number) {
  const runner = new TrialRunner(RIGS.fountain, { links }, { seed: 1, frameRate: 0 });
  while (runner.time < 1) runner.advance(200);
  return runner;
}

/** Matter's own engine with the runner's active bodies and its enabled joints as stock constraints. */
function bareEngineFrom(runner: TrialRunner, everyLink: boolean) {
  const { world, chain } = runner.instance;
  const engine = Matter.Engine.create({ positionIterations: 20, velocityIterations: 4, constraintIterations: 2 });
  engine.gravity.y = 9.81;
  engine.gravity.scale = 0.001;
  const bodies = everyLink ? [...world.statics.filter((b) => !chain.bodies.includes(b)), ...chain.bodies] : [...world.statics, ...world.dynamic];
  if (everyLink) for (const body of chain.bodies) if (body.isStatic) Matter.Body.setStatic(body, false);
  const inWorld = new Set(bodies);
  const constraints = chain.joints
    .filter((joint) => joint.b && inWorld.has(joint.a) && inWorld.has(joint.b) && (everyLink || joint.enabled))
    .map((joint) =>
      Matter.Constraint.create({
        bodyA: joint.a,
        pointA: { x: Math.cos(joint.a.angle) * joint.aOffset, y: Math.sin(joint.a.angle) * joint.aOffset },
        bodyB: joint.b!,
        pointB: { x: Math.cos(joint.b!.angle) * joint.bOffset, y: Math.sin(joint.b!.angle) * joint.bOffset },
        length: 0,
        stiffness: 1,
        damping: 0,
      }),
    );
  // Neighbouring links share a joint and must not collide; matter can only say so with groups,
  // which stops *all* link–link contacts, so leave filtering at matter's defaults (all collide):
  // the point here is matter's cost, not the physics.
  Matter.Composite.add(engine.world, [...bodies, ...constraints]);
  return { engine, bodies: bodies.length, constraints: constraints.length };
}

console.log(`Fountain benchmark: rod chain, pot 1 m, step ${SHIPPED_DT * 1000} ms, one core (${process.version})`);
console.log("links | real-time factor (whole trial, frames at 60 Hz) | ours ms/step | bare matter, same bodies: ms/step, ratio | bare matter, every link: ms/step | rss MB");
for (const links of sizes) {
  const trial = runTrial(RIGS.fountain, { links }, { seed: 1, frameRate: 60, now });
  const factor = trial.run.simulatedSeconds / trial.run.wallSeconds!;

  const ours = steadyFountain(links);
  const oursMs = timeSteps(() => ours.instance.step(), TIMED_STEPS);

  const same = bareEngineFrom(steadyFountain(links), false);
  const bareMs = timeSteps(() => Matter.Engine.update(same.engine, SHIPPED_DT * 1000), TIMED_STEPS);

  const every = bareEngineFrom(steadyFountain(links), true);
  const everyMs = timeSteps(() => Matter.Engine.update(every.engine, SHIPPED_DT * 1000), links >= 1000 ? 100 : 300);

  const rss = process.memoryUsage().rss / 2 ** 20;
  console.log(
    [
      String(links).padStart(5),
      `${factor.toFixed(2)}× (${trial.run.simulatedSeconds.toFixed(2)} s simulated in ${trial.run.wallSeconds!.toFixed(2)} s, ${trial.frames.length} frames)`,
      `${oursMs.toFixed(3)}`,
      `${bareMs.toFixed(3)} (${same.bodies} bodies, ${same.constraints} joints), ours/bare ${(oursMs / bareMs).toFixed(2)}`,
      `${everyMs.toFixed(3)} (${every.bodies} bodies)`,
      rss.toFixed(0),
    ].join(" | "),
  );
}
