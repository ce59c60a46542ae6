import { describe, expect, it } from 'vitest';
import { AnswerCache, cacheKey } from '../../src/server/AnswerCache.ts';

describe('AnswerCache', () => {
  it('evicts the least recently used entry when full (a get counts as a use)', () => {
    const c = new AnswerCache(2);
    c.set('a', '1');
    c.set('b', '2');
    expect(c.get('a')).toBe('1');
    c.set('c', '3');
    expect(c.get('b')).toBeUndefined();
    expect(c.get('a')).toBe('1');
    expect(c.get('c')).toBe('3');
    expect(c.size).toBe(2);
  });
  it('keeps nothing with capacity 0 and refuses a negative or fractional capacity', () => {
    const c = new AnswerCache(0);
    c.set('a', '1');
    expect([c.get('a'), c.size]).toEqual([undefined, 0]);
    expect(() => new AnswerCache(-1)).toThrow(RangeError);
    expect(() => new AnswerCache(1.5)).toThrow(RangeError);
  });
});

describe('cacheKey(path, query)', () => {
  it('does not depend on the order of the parameters but on every name and value', () => {
    const a = cacheKey('/api/comps', new URLSearchParams('player=p1&k=5&age=21-'));
    const b = cacheKey('/api/comps', new URLSearchParams('age=21-&k=5&player=p1'));
    expect(a).toBe(b);
    expect(cacheKey('/api/comps', new URLSearchParams('player=p1&k=6&age=21-'))).not.toBe(a);
    expect(cacheKey('/api/prospect', new URLSearchParams('player=p1&k=5&age=21-'))).not.toBe(a);
    expect(cacheKey('/api/comps', new URLSearchParams('level=A%2B'))).not.toBe(cacheKey('/api/comps', new URLSearchParams('level=A+')));
  });
});

describe('AnswerCache limits in bytes', () => {
  it('bounds the cache in bytes, not only in entries: 40 answers of 1 MB stay within the byte cap', () => {
    const c = new AnswerCache(1000, { maxBytes: 4 * 1024 * 1024, maxEntryBytes: 2 * 1024 * 1024 });
    const big = 'x'.repeat(1024 * 1024);
    for (let i = 0; i < 40; i++) c.set(`k${i}`, big);
    expect(c.bytes).toBeLessThanOrEqual(4 * 1024 * 1024);
    expect(c.size).toBe(3);
    expect(c.get('k39')).toBe(big);
    expect(c.get('k0')).toBeUndefined();
  });
  it('never keeps an answer larger than the entry cap, and counts bytes as UTF-8', () => {
    const c = new AnswerCache(10, { maxBytes: 1000, maxEntryBytes: 100 });
    c.set('a', 'y'.repeat(200));
    expect([c.get('a'), c.size, c.bytes]).toEqual([undefined, 0, 0]);
    c.set('b', '\u00e9'.repeat(10));
    expect(c.bytes).toBe(1 + 20);
    c.set('b', 'z');
    expect(c.bytes).toBe(2);
  });
});
