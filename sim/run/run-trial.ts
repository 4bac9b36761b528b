import { largestJointGap } from "../chain/chain";
import type { ElementSpec } from "../chain/link-shapes";
import { metres, seconds } from "../core/units";
import { parseParams } from "../params";
import type { Series, Settled } from "../probes/series";
import { UnstableRunError } from "../rigs/common";
import type { RigDefinition, RigInstance, SceneLayout, SceneShape } from "../rigs/rig";

/** What the board needs to draw each element: its kind and size (SI). */
export interface ElementLook {
  kind: ElementSpec["kind"];
  length: number;
  thickness: number;
}

/**
 * A recorded trial: frames for drawing at a fixed rate, probe series, settled values.
 * frames[f] holds x, y (m, y up) and angle (rad, anticlockwise) of every element at
 * frame f (NaN: not drawn), as a Float32Array so a worker can hand it over without copying.
 */
export interface TrialRecording {
  rig: string;
  params: Record<string, unknown>;
  seed: number;
  frameRate: number;
  elements: ElementLook[];
  scene: SceneLayout;
  frames: Float32Array[];
  /** Rig fixtures that move (scale pan, puller), per frame. */
  movingShapes: SceneShape[][];
  series: Series[];
  measured: Record<string, Settled>;
  theory: Record<string, number>;
  run: { dt: number; steps: number; simulatedSeconds: number; wallSeconds: number | null };
}

export interface TrialOptions {
  seed?: number;
  /** Drawing frames per simulated second (0: record none). */
  frameRate?: number;
  /** Probe samples per simulated second. */
  probeRate?: number;
  /** A clock for the wall time (performance.now in browsers and Node); sim/ has none of its own. */
  now?: () => number;
  /** Stop early after this much simulated time, s. */
  maxSeconds?: number;
}

/** Gap between joined links, as a share of the link pitch, beyond which a run is refused. */
const MAX_GAP_SHARE = 0.25;

/**
 * Step a trial in slices, so a worker can report progress and stay cancellable.
 * `advance` runs up to maxSteps steps and returns the share of the trial done.
 */
export class TrialRunner {
  readonly instance: RigInstance;
  private readonly definition: RigDefinition;
  private readonly params: Record<string, unknown>;
  private readonly seed: number;
  private readonly frameRate: number;
  private readonly probeRate: number;
  private readonly now: (() => number) | null;
  private readonly frames: Float32Array[] = [];
  private readonly moving: SceneShape[][] = [];
  private nextFrame = 0;
  private nextProbe = 0;
  private wall = 0;
  private readonly duration: number;
  private readonly minPitch: number;
  done = false;

  constructor(definition: RigDefinition, input: unknown, options: TrialOptions = {}) {
    this.definition = definition;
    this.params = parseParams(definition.schema, input ?? {}) as Record<string, unknown>;
    this.seed = options.seed ?? 1;
    this.frameRate = options.frameRate ?? 60;
    this.probeRate = options.probeRate ?? 500;
    this.now = options.now ?? null;
    this.instance = definition.create(this.params, this.seed);
    this.duration = Math.min(this.instance.duration, options.maxSeconds ?? Number.POSITIVE_INFINITY);
    this.minPitch = Math.min(...this.instance.chain.elements.map((e) => e.pitch));
  }

  get time() {
    return seconds(this.instance.world.time);
  }

  advance(maxSteps: number): number {
    const started = this.now?.() ?? 0;
    const instance = this.instance;
    for (let i = 0; i < maxSteps && !this.done; i++) {
      const t = this.time;
      if (this.frameRate > 0 && t >= this.nextFrame / this.frameRate - 1e-9) {
        this.frames.push(snapshot(instance));
        if (instance.movingShapes) this.moving.push(instance.movingShapes());
        this.nextFrame++;
      }
      if (t >= this.nextProbe / this.probeRate - 1e-9) {
        instance.sample(t);
        this.nextProbe++;
        this.checkHealth(t);
      }
      instance.step();
      if (this.time >= this.duration - 1e-9 || instance.finished()) {
        this.checkHealth(this.time);
        this.done = true;
        // The last moment is a frame too, so playback ends where the run did.
        if (this.frameRate > 0 && this.time >= this.nextFrame / this.frameRate - 1e-9) {
          this.frames.push(snapshot(instance));
          if (instance.movingShapes) this.moving.push(instance.movingShapes());
          this.nextFrame++;
        }
      }
    }
    if (this.now) this.wall += (this.now() - started) / 1000;
    return Math.min(1, this.time / this.duration);
  }

  private checkHealth(t: number) {
    const gap = largestJointGap(this.instance.chain);
    if (!Number.isFinite(gap) || gap > MAX_GAP_SHARE * this.minPitch) {
      throw new UnstableRunError(`two links came ${Number.isFinite(gap) ? `${gap.toFixed(2)} mm` : "infinitely far"} apart at a joint`, t);
    }
    for (const body of this.instance.chain.bodies) {
      const speed = Math.hypot(body.position.x - body.positionPrev.x, body.position.y - body.positionPrev.y) / this.instance.world.settings.dt;
      // 100 m/s is far beyond any drop the rigs allow (√(2g·3 m) ≈ 8 m/s).
      if (!Number.isFinite(speed) || speed > 100) throw new UnstableRunError(`a link reached ${speed.toFixed(0)} m/s`, t);
    }
  }

  /** The current positions, in the frame layout of TrialRecording.frames. */
  frame(): Float32Array {
    return snapshot(this.instance);
  }

  result(): TrialRecording {
    const instance = this.instance;
    return {
      rig: this.definition.id,
      params: this.params,
      seed: this.seed,
      frameRate: this.frameRate,
      elements: instance.chain.elements.map((e) => ({ kind: e.kind, length: metres(e.length), thickness: metres(e.thickness) })),
      scene: instance.scene(),
      frames: this.frames,
      movingShapes: this.moving,
      series: instance.series(),
      measured: instance.measured(),
      theory: instance.theory(),
      run: {
        dt: seconds(instance.world.settings.dt),
        steps: instance.world.steps,
        simulatedSeconds: this.time,
        wallSeconds: this.now ? this.wall : null,
      },
    };
  }
}

/** Run a whole trial as fast as possible and record it ("runs ahead, plays back"). */
export function runTrial(definition: RigDefinition, input: unknown, options: TrialOptions = {}): TrialRecording {
  const runner = new TrialRunner(definition, input, options);
  while (!runner.done) runner.advance(4000);
  return runner.result();
}

function snapshot(instance: RigInstance): Float32Array {
  const bodies = instance.chain.bodies;
  const out = new Float32Array(bodies.length * 3);
  for (let i = 0; i < bodies.length; i++) {
    const body = bodies[i]!;
    if (instance.hidden?.(i)) {
      out[i * 3] = out[i * 3 + 1] = out[i * 3 + 2] = Number.NaN;
      continue;
    }
    out[i * 3] = metres(body.position.x);
    out[i * 3 + 1] = -metres(body.position.y);
    out[i * 3 + 2] = -body.angle;
  }
  return out;
}
