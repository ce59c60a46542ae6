import { describe, expect, it } from 'vitest';
import { EventEmitter } from 'node:events';
import { PassThrough } from 'node:stream';
import { servingLine, servingUrl } from '../../src/server/servingUrl.ts';

/** A stand-in child process: a stdout stream and an `exit` event. */
function fakeChild(): { stdout: PassThrough; events: EventEmitter; once(event: 'exit', listener: (code: number | null) => void): unknown } {
  const events = new EventEmitter();
  return { stdout: new PassThrough(), events, once: (event, listener) => events.once(event, listener) };
}

describe('servingUrl', () => {
  it('finds the URL in the line kindred serve prints, even split over two chunks', async () => {
    const child = fakeChild();
    const url = servingUrl(child);
    const line = servingLine('http://127.0.0.1:40123/', '.kindred-store');
    child.stdout.write(line.slice(0, 25));
    child.stdout.write(line.slice(25));
    await expect(url).resolves.toBe('http://127.0.0.1:40123/');
  });

  it('rejects when the child ends before listening, with the reason given', async () => {
    const child = fakeChild();
    const url = servingUrl(child, () => 'kindred.store.missing');
    child.events.emit('exit', 1);
    await expect(url).rejects.toThrow('kindred serve exited with 1 before listening: kindred.store.missing');
  });
});
