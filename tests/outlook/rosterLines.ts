/** Hand-made roster lines for the outlook tests (invented numbers). */
import type { BattingSeason, PitchingSeason, Player, Roster } from '../../src/ingest/Roster.ts';

export function bat(playerId: string, season: number, level: string, line: Partial<BattingSeason> & { PA: number; AB: number; H: number }): BattingSeason {
  return { playerId, season, level, teams: ['Club'], doubles: 0, triples: 0, HR: 0, BB: 0, HBP: 0, SF: 0, SO: 0, ...line };
}

export function pitch(playerId: string, season: number, level: string, line: Partial<PitchingSeason> & { outs: number; BF: number }): PitchingSeason {
  return { playerId, season, level, teams: ['Club'], G: 10, GS: 10, H: 0, HR: 0, BB: 0, HBP: 0, SO: 0, ER: 0, ...line };
}

export function roster(batting: BattingSeason[], pitching: PitchingSeason[], levels: string[] = ['A', 'AA', 'Top']): Roster {
  const ids = new Set([...batting.map((b) => b.playerId), ...pitching.map((p) => p.playerId)]);
  const players = new Map<string, Player>([...ids].map((id) => [id, { playerId: id, name: `Player ${id}`, birthDate: '2000-01-01' }]));
  return {
    players,
    batting,
    fielding: [],
    pitching,
    contracts: [],
    levels,
    rowsRead: {},
    rejected: [],
    ignoredColumns: {},
    pitcherFieldingRows: 0,
    notices: [],
  };
}
