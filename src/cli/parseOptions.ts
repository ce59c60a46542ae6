import { InvalidArgumentError } from 'commander';
import type { Bats, Position, Throws } from '../ingest/types.ts';
import { isPosition } from '../profiles/positionGroup.ts';

/** Commander option parsers: each throws InvalidArgumentError (exit code 2) with what was expected. */

export function positiveInt(value: string): number {
  const n = Number(value);
  if (!/^\d+$/.test(value.trim()) || !Number.isSafeInteger(n) || n < 1) throw new InvalidArgumentError(`expected a whole number of 1 or more, got "${value}"`);
  return n;
}

export function season(value: string): number {
  if (!/^\d{4}$/.test(value.trim())) throw new InvalidArgumentError(`expected a four-digit season, got "${value}"`);
  return Number(value);
}

/** "2015-2020", "2015-", "-2020" or "2018". */
export function seasonRange(value: string): { from?: number; to?: number } {
  const m = /^\s*(\d{4})?\s*(-)?\s*(\d{4})?\s*$/.exec(value);
  if (!m || (!m[1] && !m[3])) throw new InvalidArgumentError(`expected seasons like 2015-2020, 2015-, -2020 or 2018, got "${value}"`);
  const from = m[1] ? Number(m[1]) : undefined;
  const to = m[3] ? Number(m[3]) : m[2] ? undefined : from;
  if (from !== undefined && to !== undefined && from > to) throw new InvalidArgumentError(`season range "${value}" runs backwards`);
  return { ...(from !== undefined ? { from } : {}), ...(to !== undefined ? { to } : {}) };
}

/** "21-25", "21-", "-25" or "23". */
export function ageRange(value: string): { min?: number; max?: number } {
  const m = /^\s*(\d{1,2})?\s*(-)?\s*(\d{1,2})?\s*$/.exec(value);
  if (!m || (!m[1] && !m[3])) throw new InvalidArgumentError(`expected ages like 21-25, 21-, -25 or 23, got "${value}"`);
  const min = m[1] ? Number(m[1]) : undefined;
  const max = m[3] ? Number(m[3]) : m[2] ? undefined : min;
  if (min !== undefined && max !== undefined && min > max) throw new InvalidArgumentError(`age range "${value}" runs backwards`);
  return { ...(min !== undefined ? { min } : {}), ...(max !== undefined ? { max } : {}) };
}

export function list(value: string): string[] {
  return value.split(',').map((s) => s.trim()).filter((s) => s.length > 0);
}

export function position(value: string): Position {
  const v = value.trim().toUpperCase();
  if (!isPosition(v)) throw new InvalidArgumentError(`expected a position (C, 1B, 2B, 3B, SS, LF, CF, RF, DH, SP, RP), got "${value}"`);
  return v;
}

export function positions(value: string): Position[] {
  return list(value).map(position);
}

export function bats(value: string): Bats[] {
  return list(value).map((v) => {
    const u = v.toUpperCase();
    if (u !== 'L' && u !== 'R' && u !== 'S') throw new InvalidArgumentError(`expected bats L, R or S, got "${v}"`);
    return u;
  });
}

export function throws(value: string): Throws[] {
  return list(value).map((v) => {
    const u = v.toUpperCase();
    if (u !== 'L' && u !== 'R') throw new InvalidArgumentError(`expected throws L or R, got "${v}"`);
    return u;
  });
}

export function fraction(value: string): number {
  const n = Number(value);
  if (value.trim() === '' || !Number.isFinite(n) || n < 0 || n > 1) throw new InvalidArgumentError(`expected a number from 0 to 1, got "${value}"`);
  return n;
}

/** "obp=2,iso=0.5": a multiplier per dimension (0 switches a dimension off). */
export function weightOverrides(value: string): Map<string, number> {
  const out = new Map<string, number>();
  for (const part of list(value)) {
    const m = /^([a-z0-9_]+)\s*=\s*(\d+(?:\.\d+)?|\.\d+)$/i.exec(part);
    if (!m) throw new InvalidArgumentError(`expected name=multiplier like obp=2, got "${part}"`);
    out.set((m[1] as string).toLowerCase(), Number(m[2]));
  }
  return out;
}

export type OutputFormat = 'table' | 'json' | 'csv';

export function format(value: string): OutputFormat {
  if (value !== 'table' && value !== 'json' && value !== 'csv') throw new InvalidArgumentError(`expected table, json or csv, got "${value}"`);
  return value;
}
