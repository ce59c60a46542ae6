import { describe, expect, it } from 'vitest';
import { isRecordOf } from '../../src/ingest/RecordReader.ts';
import { FIELDING_COLUMNS } from '../../src/ingest/fieldingColumns.ts';
import { PLAYERS_COLUMNS } from '../../src/ingest/playersColumns.ts';

describe('isRecordOf(table, fields)', () => {
  it('accepts the required fields with optional ones absent, and optional ones of their kind', () => {
    expect(isRecordOf(PLAYERS_COLUMNS, { playerId: 'p1', name: 'Ann Example' })).toBe(true);
    expect(isRecordOf(PLAYERS_COLUMNS, { playerId: 'p1', name: 'Ann Example', bats: 'S', birthDate: '1998-04-12' })).toBe(true);
  });
  it('refuses a missing required field, a value of the wrong kind and a choice outside its values', () => {
    expect(isRecordOf(PLAYERS_COLUMNS, { playerId: 'p1' })).toBe(false);
    expect(isRecordOf(PLAYERS_COLUMNS, { playerId: 'p1', name: 7 })).toBe(false);
    expect(isRecordOf(PLAYERS_COLUMNS, { playerId: 'p1', name: 'Ann Example', bats: 'X' })).toBe(false);
  });
  it('needs the teams list in a season record and refuses P (read and skipped) as a fielding position', () => {
    const row = { playerId: 'p1', season: 2021, level: 'AA', pos: 'C', outs: 30, PO: 1, A: 0, E: 0 };
    expect(isRecordOf(FIELDING_COLUMNS, { ...row, teams: [] })).toBe(true);
    expect(isRecordOf(FIELDING_COLUMNS, row)).toBe(false);
    expect(isRecordOf(FIELDING_COLUMNS, { ...row, teams: [], pos: 'P' })).toBe(false);
  });
});
