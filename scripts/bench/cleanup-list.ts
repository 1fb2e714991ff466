/**
 * What to undo, newest first: each part of the bench's stack adds its stop as soon as it has
 * started, so a failure or a signal half-way through still stops everything started so far.
 */
export class CleanupList {
  private steps: Array<() => Promise<unknown>> = [];
  private running: Promise<void> | null = null;

  add(step: () => Promise<unknown>): void {
    this.steps.push(step);
  }

  /** Run every step once (a second call waits for the first); errors are logged, not thrown. */
  run(): Promise<void> {
    this.running ??= (async () => {
      for (const step of this.steps.reverse()) {
        try {
          await step();
        } catch (error) {
          console.error("[bench] while stopping:", error);
        }
      }
      this.steps = [];
    })();
    return this.running;
  }
}
