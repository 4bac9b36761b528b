/** Things to stop, in reverse order of starting. Filled while starting, so Ctrl-C mid-start stops what is up. */
export class StopList {
  private stops: (() => Promise<unknown>)[] = [];
  constructor(private readonly log: (line: string) => void = console.error) {}

  push(stop: () => Promise<unknown>): void {
    this.stops.push(stop);
  }

  async run(): Promise<void> {
    for (const stop of this.stops.splice(0).reverse()) {
      await stop().catch((error) => this.log(`while stopping: ${String(error)}`));
    }
  }
}

/**
 * Stops cleanly on Ctrl-C (SIGINT) or SIGTERM: runs `stop` once, then exits. A second signal
 * while stopping is ignored, so a double Ctrl-C cannot leave Postgres half shut down.
 */
export function stopOnSignals(stop: () => Promise<void>, label = "Linkleap"): void {
  let stopping = false;
  const onSignal = (signal: NodeJS.Signals) => {
    if (stopping) return;
    stopping = true;
    console.log(`\n${signal}: stopping ${label}…`);
    stop()
      .then(() => process.exit(0))
      .catch((error) => {
        console.error(error);
        process.exit(1);
      });
  };
  process.on("SIGINT", onSignal);
  process.on("SIGTERM", onSignal);
}
