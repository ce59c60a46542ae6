import type { Bats, Position, Throws } from '../ingest/Roster.ts';
import { isPosition, POSITIONS } from '../profiles/positionGroup.ts';
import { BadValue } from './BadValue.ts';

/**
 * Parsers of request parameter values, shared by the command line and the HTTP API. Each takes the
 * text as typed and returns the value, or throws BadValue saying what was expected and what was got.
 */

/** Largest number of comps one request may ask for (a project choice: far more than anyone reads). */
export const MAX_K = 1000;

/** Largest per-dimension multiplier (a project choice: 1000 already makes one dimension all there is). */
export const MAX_WEIGHT = 1000;

/** Most seasons one profile window may hold (a project choice: a longer window mixes a player's ages). */
export const MAX_WINDOW = 5;

export function positiveInt(value: string): number {
  const n = Number(value);
  if (!/^\d+$/.test(value.trim()) || !Number.isSafeInteger(n) || n < 1) throw new BadValue(`expected a whole number of 1 or more, got "${value}"`);
  return n;
}

/** A whole number from 1 to `max`. */
export function wholeUpTo(max: number): (value: string) => number {
  return (value) => {
    const n = positiveInt(value);
    if (n > max) throw new BadValue(`expected a whole number from 1 to ${max}, got "${value}"`);
    return n;
  };
}

export function season(value: string): number {
  if (!/^\d{4}$/.test(value.trim())) throw new BadValue(`expected a four-digit season, got "${value}"`);
  return Number(value);
}

/** "2015-2020", "2015-", "-2020" or "2018": two seasons need the dash between them. */
export function seasonRange(value: string): { from?: number; to?: number } {
  const m = /^\s*(?:(\d{4})\s*(-)\s*(\d{4})?|-\s*(\d{4})|(\d{4}))\s*$/.exec(value);
  if (!m) throw new BadValue(`expected seasons like 2015-2020, 2015-, -2020 or 2018, got "${value}"`);
  const from = m[1] ?? m[5];
  const to = m[3] ?? m[4] ?? m[5];
  return span(value, from, to, 'season', (min, max) => ({ ...(min !== undefined ? { from: min } : {}), ...(max !== undefined ? { to: max } : {}) }));
}

/** "21-25", "21-", "-25" or "23" (ages on June 30, at most two digits): two ages need the dash between them. */
export function ageRange(value: string): { min?: number; max?: number } {
  const m = /^\s*(?:(\d{1,2})\s*(-)\s*(\d{1,2})?|-\s*(\d{1,2})|(\d{1,2}))\s*$/.exec(value);
  if (!m) throw new BadValue(`expected ages like 21-25, 21-, -25 or 23 (whole years, at most two digits), got "${value}"`);
  const from = m[1] ?? m[5];
  const to = m[3] ?? m[4] ?? m[5];
  return span(value, from, to, 'age', (min, max) => ({ ...(min !== undefined ? { min } : {}), ...(max !== undefined ? { max } : {}) }));
}

function span<T>(value: string, from: string | undefined, to: string | undefined, what: string, make: (min: number | undefined, max: number | undefined) => T): T {
  const min = from === undefined ? undefined : Number(from);
  const max = to === undefined ? undefined : Number(to);
  if (min !== undefined && max !== undefined && min > max) throw new BadValue(`${what} range "${value}" runs backwards (${min} is after ${max})`);
  return make(min, max);
}

export function list(value: string): string[] {
  return value.split(',').map((s) => s.trim()).filter((s) => s.length > 0);
}

/** "2014,2016,2018": one or more four-digit seasons, given back once each, in order. */
export function seasons(value: string): number[] {
  const each = list(value).map((s) => season(s));
  if (each.length === 0) throw new BadValue(`expected seasons, e.g. 2014,2016,2018, got "${value}"`);
  return [...new Set(each)].sort((a, b) => a - b);
}

export function position(value: string): Position {
  const v = value.trim().toUpperCase();
  if (!isPosition(v)) throw new BadValue(`expected a position (${POSITIONS.join(', ')}), got "${value}"`);
  return v;
}

export function positions(value: string): Position[] {
  return list(value).map(position);
}

export function bats(value: string): Bats[] {
  return list(value).map((v) => {
    const u = v.toUpperCase();
    if (u !== 'L' && u !== 'R' && u !== 'S') throw new BadValue(`expected bats L, R or S, got "${v}"`);
    return u;
  });
}

export function throws(value: string): Throws[] {
  return list(value).map((v) => {
    const u = v.toUpperCase();
    if (u !== 'L' && u !== 'R') throw new BadValue(`expected throws L or R, got "${v}"`);
    return u;
  });
}

/** A whole number of 0 or more, or `all` (Infinity): how far a pool reaches. */
export function reach(value: string): number {
  const t = value.trim().toLowerCase();
  if (t === 'all') return Infinity;
  const n = Number(t);
  if (!/^\d+$/.test(t) || !Number.isSafeInteger(n)) throw new BadValue(`expected a whole number of 0 or more, or all, got "${value}"`);
  return n;
}

export function fraction(value: string): number {
  const n = Number(value);
  if (value.trim() === '' || !Number.isFinite(n) || n < 0 || n > 1) throw new BadValue(`expected a number from 0 to 1, got "${value}"`);
  return n;
}

/**
 * "obp=2,Run speed=0": a multiplier per dimension (0 switches a dimension off), keyed by the name or
 * label as typed (checked against the store's dimensions later). A name given twice, or a multiplier
 * that is not a finite number from 0 to MAX_WEIGHT, is refused.
 */
export function weightOverrides(value: string): Map<string, number> {
  const out = new Map<string, number>();
  for (const part of list(value)) {
    const m = /^([^=]+?)\s*=\s*(\d+(?:\.\d+)?|\.\d+)$/.exec(part);
    if (!m) throw new BadValue(`expected name=multiplier like obp=2, got "${part}"`);
    const name = (m[1] as string).trim();
    const n = Number(m[2]);
    if (!Number.isFinite(n) || n > MAX_WEIGHT) throw new BadValue(`multiplier "${m[2] as string}" for ${name}: expected a number from 0 to ${MAX_WEIGHT}`);
    const key = name.toLowerCase();
    if (out.has(key)) throw new BadValue(`${name} is given more than once in "${value}"; give each dimension once`);
    out.set(key, n);
  }
  return out;
}

/** "2500000", "2,500,000" or "2.5e6": an amount in US dollars, 0 or more. */
export function usdAmount(value: string): number {
  const text = value.trim().replace(/^\$/, '');
  const plain = /^\d{1,3}(,\d{3})+$/.test(text) ? text.replace(/,/g, '') : text;
  const n = Number(plain);
  if (plain === '' || !Number.isFinite(n) || n < 0 || !/^[\d.e+]+$/i.test(plain)) {
    throw new BadValue(`expected an amount in US dollars such as 2500000 or 2,500,000, got "${value}"`);
  }
  return n;
}

export type OutputFormat = 'table' | 'json' | 'csv';

export function format(value: string): OutputFormat {
  if (value !== 'table' && value !== 'json' && value !== 'csv') throw new BadValue(`expected table, json or csv, got "${value}"`);
  return value;
}

/** A switch: given without a value (or as true/1) it is on; false/0 turn it off. */
export function flag(value: string): boolean {
  const v = value.trim().toLowerCase();
  if (v === '' || v === 'true' || v === '1') return true;
  if (v === 'false' || v === '0') return false;
  throw new BadValue(`expected true or false, got "${value}"`);
}

/** Any non-empty text, taken as it is. */
export function text(value: string): string {
  return value;
}

/** One of a fixed list of words. */
export function oneOf<const W extends string>(words: readonly W[]): (value: string) => W {
  return (value) => {
    const w = words.find((x) => x === value);
    if (w === undefined) throw new BadValue(`expected ${words.slice(0, -1).join(', ')} or ${words[words.length - 1] ?? ''}, got "${value}"`);
    return w;
  };
}
