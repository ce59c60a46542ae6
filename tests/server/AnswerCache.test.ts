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
