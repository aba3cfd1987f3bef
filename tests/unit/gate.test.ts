import { describe, expect, it } from 'vitest';
import { Gate } from '@/lib/auth/gate';

const tick = () => new Promise((r) => setImmediate(r));

describe('Gate', () => {
  it('runs at most its capacity at once, the rest in the order they came, and every one of them', async () => {
    const gate = new Gate(2);
    let running = 0;
    let most = 0;
    const order: number[] = [];
    const results = await Promise.all(
      Array.from({ length: 10 }, (_, i) =>
        gate.run(async () => {
          running += 1;
          most = Math.max(most, running);
          order.push(i);
          await tick();
          running -= 1;
          return i * 10;
        }),
      ),
    );
    expect(most).toBe(2);
    expect(order).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9]);
    expect(results).toEqual([0, 10, 20, 30, 40, 50, 60, 70, 80, 90]);
  });

  it('frees the place of a task that throws', async () => {
    const gate = new Gate(1);
    await expect(gate.run(async () => Promise.reject(new Error('boom')))).rejects.toThrow('boom');
    expect(await gate.run(async () => 'next')).toBe('next');
  });

  it('refuses a capacity that is not a whole number of at least one', () => {
    for (const bad of [0, -1, 1.5, Number.NaN]) expect(() => new Gate(bad)).toThrow(RangeError);
  });
});
