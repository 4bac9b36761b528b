import type { SceneShape, TrialRecording } from "@sim/catalog";
import { frameAt, recordingDuration } from "@sim/run/playback";
import { newClock, pause, play, replay, seek, setRate, SLOW_RATE, tick, timeAt, toggle, type ClockState } from "./playback-clock";

export interface PlaybackSnapshot {
  ready: boolean;
  t: number;
  duration: number;
  playing: boolean;
  slow: boolean;
  ended: boolean;
}

export type FrameDrawer = (frame: Float32Array, moving: readonly SceneShape[]) => void;

/** How often the bar and the readout hear about the moving clock, ms (the drawing itself runs every frame). */
const NOTIFY_EVERY_MS = 66;

/**
 * Plays a recording: keeps the clock, draws the interpolated frame on every animation frame
 * (straight into the stage, no React render), and tells subscribers (the bar, the readout) a
 * few times a second. An external store for useSyncExternalStore.
 */
export class PlaybackController {
  private recording: TrialRecording | null = null;
  private clock: ClockState = newClock(0);
  private buffer: Float32Array | null = null;
  private drawer: FrameDrawer | null = null;
  private listeners = new Set<() => void>();
  private snapshot: PlaybackSnapshot = { ready: false, t: 0, duration: 0, playing: false, slow: false, ended: false };
  private raf = 0;
  private lastNotify = 0;

  constructor(private readonly now: () => number = () => performance.now()) {}

  subscribe = (listener: () => void) => {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  };

  getSnapshot = () => this.snapshot;

  setDrawer(drawer: FrameDrawer | null) {
    this.drawer = drawer;
    this.drawNow();
  }

  /** A new recording starts paused at its beginning (or none: nothing to play). */
  setRecording(recording: TrialRecording | null) {
    if (recording === this.recording) return;
    this.recording = recording;
    this.buffer = recording && recording.frames.length > 0 ? new Float32Array(recording.frames[0]!.length) : null;
    const slow = this.clock.rate !== 1;
    this.clock = { ...newClock(recording && this.buffer ? recordingDuration(recording) : 0), rate: slow ? SLOW_RATE : 1 };
    this.stopLoop();
    this.changed(true);
    this.drawNow();
  }

  play() {
    this.apply(play);
  }
  pause() {
    this.apply(pause);
  }
  toggle() {
    this.apply(toggle);
  }
  replay() {
    this.apply(replay);
  }
  setSlow(slow: boolean) {
    this.apply((c, now) => setRate(c, slow ? SLOW_RATE : 1, now));
  }
  toggleSlow() {
    this.setSlow(this.clock.rate === 1);
  }
  seek(t: number) {
    this.apply((c, now) => seek(c, t, now));
  }
  /** Steps by a number of recorded frames (← / → while paused). */
  step(frames: number) {
    if (!this.recording) return;
    const rate = this.recording.frameRate;
    this.apply((c, now) => seek(pause(c, now), timeAt(c, now) + frames / rate, now));
  }

  dispose() {
    this.stopLoop();
    this.listeners.clear();
    this.drawer = null;
  }

  private apply(change: (clock: ClockState, now: number) => ClockState) {
    if (!this.recording || !this.buffer) return;
    this.clock = change(this.clock, this.now());
    this.changed(true);
    this.drawNow();
    if (this.clock.playing) this.startLoop();
    else this.stopLoop();
  }

  private startLoop() {
    if (this.raf || typeof requestAnimationFrame === "undefined") return;
    const loop = () => {
      this.raf = 0;
      this.clock = tick(this.clock, this.now());
      this.drawNow();
      this.changed(!this.clock.playing);
      if (this.clock.playing) this.raf = requestAnimationFrame(loop);
    };
    this.raf = requestAnimationFrame(loop);
  }

  private stopLoop() {
    if (this.raf) cancelAnimationFrame(this.raf);
    this.raf = 0;
  }

  private drawNow() {
    const recording = this.recording;
    if (!recording || !this.buffer || !this.drawer) return;
    const t = timeAt(this.clock, this.now());
    frameAt(recording, t, this.buffer);
    const index = Math.min(recording.movingShapes.length - 1, Math.round(t * recording.frameRate));
    this.drawer(this.buffer, index >= 0 ? recording.movingShapes[index]! : []);
  }

  private changed(force: boolean) {
    const now = this.now();
    if (!force && now - this.lastNotify < NOTIFY_EVERY_MS) return;
    this.lastNotify = now;
    const t = timeAt(this.clock, now);
    this.snapshot = {
      ready: this.recording !== null && this.buffer !== null,
      t,
      duration: this.clock.duration,
      playing: this.clock.playing,
      slow: this.clock.rate !== 1,
      ended: this.clock.duration > 0 && t >= this.clock.duration,
    };
    for (const listener of this.listeners) listener();
  }
}
