/** The part of sim's TrialRunner that slicing needs (a fake in tests). */
export interface SteppedRun {
  readonly done: boolean;
  /** Runs up to `steps` steps; returns the share of the trial done (0…1). */
  advance(steps: number): number;
}

export interface SliceOptions {
  isCancelled: () => boolean;
  onProgress: (share: number) => void;
  /** Lets the worker read its messages (a cancel, a new set-up) between slices. */
  yieldNow: () => Promise<void>;
  now: () => number;
  /** Work this long before yielding, ms. */
  sliceMs?: number;
  /** Steps per call of advance (small enough to check the clock often). */
  stepsPerCall?: number;
}

/** Runs a trial to the end in time slices, so the worker stays cancellable and reports progress. */
export async function runInSlices(run: SteppedRun, options: SliceOptions): Promise<"done" | "cancelled"> {
  const sliceMs = options.sliceMs ?? 40;
  const stepsPerCall = options.stepsPerCall ?? 100;
  while (!run.done) {
    if (options.isCancelled()) return "cancelled";
    const started = options.now();
    let share = 0;
    do share = run.advance(stepsPerCall);
    while (!run.done && options.now() - started < sliceMs);
    options.onProgress(share);
    await options.yieldNow();
  }
  return options.isCancelled() ? "cancelled" : "done";
}
