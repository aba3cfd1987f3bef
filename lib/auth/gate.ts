/**
 * At most `capacity` calls of `run` at once; the rest wait their turn in order. Sign-in uses it so a flood's
 * attempts queue in memory (already bounded by the hashing pool's admission) instead of each holding a database
 * connection while it waits for the advisory lock on its address or e-mail.
 */
export class Gate {
  private free: number;
  private readonly waiting: (() => void)[] = [];

  constructor(capacity: number) {
    if (!Number.isInteger(capacity) || capacity < 1) throw new RangeError(`a gate needs a whole capacity of at least 1, not ${capacity}`);
    this.free = capacity;
  }

  async run<T>(task: () => Promise<T>): Promise<T> {
    if (this.free > 0) this.free -= 1;
    else await new Promise<void>((resolve) => this.waiting.push(resolve));
    try {
      return await task();
    } finally {
      const next = this.waiting.shift();
      if (next) next();
      else this.free += 1;
    }
  }
}
