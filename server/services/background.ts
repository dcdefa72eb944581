/**
 * Work that outlives the request that started it (image jobs, imports, re-evaluation,
 * fixity, reset mail, the demo's images). Shutdown asks it to stop at a safe point and
 * waits for it before the database closes, so no job writes to a closed database.
 */
export class BackgroundWork {
  private readonly running = new Set<Promise<unknown>>();
  private stopRequested = false;

  /** True once shutdown began: loops stop before their next unit of work. */
  get stopping(): boolean {
    return this.stopRequested;
  }

  /** Tracks a piece of work until it settles; its rejection stays the caller's to handle. */
  track<T>(work: Promise<T>): Promise<T> {
    const settled = work.then(
      () => undefined,
      () => undefined,
    );
    this.running.add(settled);
    void settled.then(() => this.running.delete(settled));
    return work;
  }

  /** How many pieces of work are still running. */
  get size(): number {
    return this.running.size;
  }

  /**
   * Asks every job to stop at its next safe point and waits for all of them, at most
   * `withinMs`; resolves true when all stopped in time.
   */
  async stop(withinMs: number): Promise<boolean> {
    this.stopRequested = true;
    const deadline = Date.now() + withinMs;
    while (this.running.size > 0) {
      const left = deadline - Date.now();
      if (left <= 0) return false;
      let timer: NodeJS.Timeout | undefined;
      const timeout = new Promise((resolve) => (timer = setTimeout(resolve, left)));
      await Promise.race([Promise.all([...this.running]), timeout]);
      clearTimeout(timer);
    }
    return true;
  }
}
