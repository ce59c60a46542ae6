import { describe, expect, it } from 'vitest';
import { TurnQueue } from '../../src/server/TurnQueue.ts';

/** Busy-waits `ms` milliseconds (a CPU-bound task). */
const spin = (ms: number): void => {
  const end = performance.now() + ms;
  while (performance.now() < end);
};

describe('TurnQueue', () => {
  it('settles each caller with its own task\u2019s value or error, first come first served', async () => {
    const q = new TurnQueue();
    const order: number[] = [];
    const a = q.run(() => (order.push(1), 'one'));
    const b = q.run(() => {
      order.push(2);
      throw new RangeError('two failed');
    });
    const c = q.run(async () => (order.push(3), 'three'));
    await expect(a).resolves.toBe('one');
    await expect(b).rejects.toThrow('two failed');
    await expect(c).resolves.toBe('three');
    expect(order).toEqual([1, 2, 3]);
  });

  it('gives the event loop a turn between slices: a callback queued meanwhile runs before the last task', async () => {
    const q = new TurnQueue(5);
    const events: string[] = [];
    const tasks = Array.from({ length: 20 }, (_, i) => q.run(() => (spin(2), events.push(`task ${i}`))));
    // Queued after every task: without yielding it would run only once all 20 tasks (40 ms) are done.
    setImmediate(() => events.push('event loop'));
    await Promise.all(tasks);
    const at = events.indexOf('event loop');
    expect(at).toBeGreaterThan(0);
    expect(at).toBeLessThan(events.length - 1);
    // A slice of 5 ms holds about 3 tasks of 2 ms (at least one, never all 20).
    expect(at).toBeLessThanOrEqual(6);
    expect(q.waiting).toBe(0);
  });

  it('refuses a slice that is negative or not a number', () => {
    expect(() => new TurnQueue(-1)).toThrow(RangeError);
    expect(() => new TurnQueue(Number.NaN)).toThrow(RangeError);
  });
});
