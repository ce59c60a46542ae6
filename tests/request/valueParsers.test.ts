import { describe, expect, it } from 'vitest';
import * as v from '../../src/request/valueParsers.ts';
import { BadValue } from '../../src/request/BadValue.ts';

describe('seasonRange(text)', () => {
  it('reads a span, an open span and a single season', () => {
    expect(v.seasonRange('2015-2020')).toEqual({ from: 2015, to: 2020 });
    expect(v.seasonRange(' 2015 - 2020 ')).toEqual({ from: 2015, to: 2020 });
    expect(v.seasonRange('2015-')).toEqual({ from: 2015 });
    expect(v.seasonRange('-2020')).toEqual({ to: 2020 });
    expect(v.seasonRange('2018')).toEqual({ from: 2018, to: 2018 });
  });
  it('refuses two seasons run together, naming the value, and a span that runs backwards', () => {
    expect(() => v.seasonRange('20152020')).toThrow(BadValue);
    expect(() => v.seasonRange('20152020')).toThrow(/expected seasons like 2015-2020.*got "20152020"/);
    expect(() => v.seasonRange('2020-2015')).toThrow(/runs backwards/);
    expect(() => v.seasonRange('-')).toThrow(/got "-"/);
  });
});

describe('ageRange(text)', () => {
  it('reads a span, an open span and a single age', () => {
    expect(v.ageRange('21-25')).toEqual({ min: 21, max: 25 });
    expect(v.ageRange('21-')).toEqual({ min: 21 });
    expect(v.ageRange('-25')).toEqual({ max: 25 });
    expect(v.ageRange('23')).toEqual({ min: 23, max: 23 });
  });
  it('refuses ages run together and ages of three digits as malformed, naming the value', () => {
    expect(() => v.ageRange('2530')).toThrow(/expected ages like 21-25.*got "2530"/);
    expect(() => v.ageRange('100')).toThrow(/expected ages like 21-25.*got "100"/);
    expect(() => v.ageRange('30-25')).toThrow(/age range "30-25" runs backwards/);
  });
});

describe('weightOverrides(text)', () => {
  it('keys each multiplier by the name or label as typed, case folded', () => {
    expect([...v.weightOverrides('obp=2, Run speed=0,iso=.5')]).toEqual([['obp', 2], ['run speed', 0], ['iso', 0.5]]);
    expect([...v.weightOverrides('Hard contact%=1.5')]).toEqual([['hard contact%', 1.5]]);
  });
  it('refuses a dimension given twice (the last would silently win)', () => {
    expect(() => v.weightOverrides('obp=2,obp=0')).toThrow(/obp is given more than once in "obp=2,obp=0"/);
    expect(() => v.weightOverrides('obp=2,OBP=0')).toThrow(/more than once/);
  });
  it('refuses numbers that overflow or exceed the largest multiplier, and negative or written-out ones', () => {
    expect(() => v.weightOverrides(`obp=${'9'.repeat(400)}`)).toThrow(/expected a number from 0 to 1000/);
    expect(() => v.weightOverrides('obp=1001')).toThrow(/expected a number from 0 to 1000/);
    expect(() => v.weightOverrides('obp=-1')).toThrow(/expected name=multiplier/);
    expect(() => v.weightOverrides('obp=two')).toThrow(/expected name=multiplier like obp=2, got "obp=two"/);
  });
});

describe('wholeUpTo(max) and the cap on k', () => {
  it('takes 1 to max and refuses 0, max + 1 and numbers past 2^53', () => {
    const k = v.wholeUpTo(v.MAX_K);
    expect(k('1')).toBe(1);
    expect(k(String(v.MAX_K))).toBe(v.MAX_K);
    expect(() => k(String(v.MAX_K + 1))).toThrow(new RegExp(`from 1 to ${v.MAX_K}`));
    expect(() => k('0')).toThrow(/1 or more/);
    expect(() => k('9007199254740993')).toThrow(/1 or more/);
  });
});

describe('usdAmount, fraction, flag', () => {
  it('reads dollars with or without separators and refuses words', () => {
    expect(v.usdAmount('2,500,000')).toBe(2_500_000);
    expect(v.usdAmount('$2500000')).toBe(2_500_000);
    expect(v.usdAmount('2.5e6')).toBe(2_500_000);
    expect(() => v.usdAmount('lots')).toThrow(/US dollars/);
    expect(() => v.usdAmount('1e999')).toThrow(/US dollars/);
  });
  it('reads a share from 0 to 1 only', () => {
    expect(v.fraction('0.25')).toBe(0.25);
    expect(() => v.fraction('1.5')).toThrow(/from 0 to 1/);
    expect(() => v.fraction('Infinity')).toThrow(/from 0 to 1/);
  });
  it('reads a switch as on when empty, true or 1, off when false or 0', () => {
    expect([v.flag(''), v.flag('TRUE'), v.flag('1'), v.flag('false'), v.flag('0')]).toEqual([true, true, true, false, false]);
    expect(() => v.flag('yes')).toThrow(/expected true or false, got "yes"/);
  });
});
