/**
 * Runs a job one at a time: a wake-up that arrives while the job runs is remembered and causes one
 * more run afterwards, so nothing is missed and runs never overlap inside a process.
 */
export class SerialRunner {
  private running: Promise<void> | undefined;
  private again = false;

  constructor(
    private readonly job: () => Promise<void>,
    private readonly onError: (err: unknown) => void,
  ) {}

  wake(): void {
    if (this.running) {
      this.again = true;
      return;
    }
    this.running = this.loop().finally(() => {
      this.running = undefined;
    });
  }

  private async loop(): Promise<void> {
    do {
      this.again = false;
      try {
        await this.job();
      } catch (err) {
        this.onError(err);
      }
    } while (this.again);
  }

  /** Resolves when the current run (if any) is over. */
  async idle(): Promise<void> {
    while (this.running) await this.running;
  }
}
