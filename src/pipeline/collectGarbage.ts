import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';

let collect: (() => void) | null | undefined;

/**
 * Runs a full garbage collection now, where the build knows a large part of the heap has just become
 * garbage (the parsed roster, once the profiles are made). Why: V8 collects the old generation when
 * the heap grows, not when objects die, so at 1,000,000 player-seasons about a gigabyte of dead roster
 * records was still in the heap when the index phase began allocating (vectors, native index memory
 * in the worker threads), and the build's peak memory was the sum of both. V8's `gc` function is
 * exposed for the one call (the documented `--expose-gc` flag, set at run time through node:v8) and
 * hidden again; where that fails the call does nothing and the build only peaks higher.
 */
export function collectGarbage(): void {
  if (collect === undefined) {
    try {
      setFlagsFromString('--expose-gc');
      const gc: unknown = runInNewContext('gc');
      collect = typeof gc === 'function' ? () => void gc() : null;
    } catch {
      collect = null;
    } finally {
      setFlagsFromString('--no-expose-gc');
    }
  }
  collect?.();
}
