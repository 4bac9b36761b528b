/**
 * The playback clock as plain data: where in the recording we are (s of simulated time), how
 * fast it runs (1 real speed, 0.25 slow motion) and whether it runs. Pure: every change takes
 * the wall time `now` (ms) from the caller, so it is tested without timers.
 */
export interface ClockState {
  duration: number;
  playing: boolean;
  rate: number;
  /** Recording time at the anchor, s. */
  anchorTime: number;
  /** Wall time of the anchor, ms. */
  anchorNow: number;
}

export const SLOW_RATE = 0.25;

export const newClock = (duration: number): ClockState => ({ duration, playing: false, rate: 1, anchorTime: 0, anchorNow: 0 });

const clamp = (t: number, duration: number) => Math.min(Math.max(t, 0), duration);

/** Recording time at wall time `now`; it stops at the end. */
export const timeAt = (clock: ClockState, now: number) =>
  clock.playing ? clamp(clock.anchorTime + ((now - clock.anchorNow) / 1000) * clock.rate, clock.duration) : clock.anchorTime;

export const hasEnded = (clock: ClockState, now: number) => clock.duration > 0 && timeAt(clock, now) >= clock.duration;

/** Play from here; at the end, play starts again from the beginning. */
export function play(clock: ClockState, now: number): ClockState {
  const t = hasEnded(clock, now) ? 0 : timeAt(clock, now);
  return { ...clock, playing: true, anchorTime: t, anchorNow: now };
}

export const pause = (clock: ClockState, now: number): ClockState => ({ ...clock, playing: false, anchorTime: timeAt(clock, now), anchorNow: now });

export const toggle = (clock: ClockState, now: number) => (clock.playing && !hasEnded(clock, now) ? pause(clock, now) : play(clock, now));

/** Change speed without a jump: the clock is re-anchored where it is now. */
export const setRate = (clock: ClockState, rate: number, now: number): ClockState => ({ ...clock, rate, anchorTime: timeAt(clock, now), anchorNow: now });

export const seek = (clock: ClockState, t: number, now: number): ClockState => ({ ...clock, anchorTime: clamp(t, clock.duration), anchorNow: now });

export const replay = (clock: ClockState, now: number): ClockState => ({ ...clock, playing: true, anchorTime: 0, anchorNow: now });

/** Called every animation frame: a clock that reached the end stops there. */
export const tick = (clock: ClockState, now: number): ClockState =>
  clock.playing && hasEnded(clock, now) ? { ...clock, playing: false, anchorTime: clock.duration, anchorNow: now } : clock;
