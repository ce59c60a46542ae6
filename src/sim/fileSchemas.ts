/**
 * The columns of each written file, in the canonical roster format, with
 * the form each number takes in the text.
 */
import { KindredError } from '../errors/KindredError.ts';
import type { ColumnSpec } from './ColumnTable.ts';

function spec(text: string): ColumnSpec[] {
  return text.split(',').map((pair) => {
    const [name, format] = pair.trim().split(':');
    return { name: name ?? '', format: format === undefined ? 'int' : parseFormat(format) };
  });
}

function parseFormat(text: string): ColumnSpec['format'] {
  switch (text) {
    case 'player': case 'level': case 'team': case 'pos': case 'int':
    case 'fixed1': case 'fixed2': case 'thirds': case 'thousandsUsd':
      return text;
    default:
      throw new KindredError('kindred.usage.badOption', `unknown column format ${JSON.stringify(text)}: expected player, level, team, pos, int, fixed1, fixed2, thirds or thousandsUsd`);
  }
}

export const BATTING_COLUMNS = spec(
  'player_id:player, season, level:level, team:team, G, PA, AB, H, 2B, 3B, HR, BB, IBB, HBP, SF, SO, SB, CS, bbe,' +
    ' ev_avg_mph:fixed1, ev_p90_mph:fixed1, la_avg_deg:fixed1, hard_hit_pct:fixed1, la_band_pct:fixed1, run_speed_ft_s:fixed1',
);

export const FIELDING_COLUMNS = spec(
  'player_id:player, season, level:level, team:team, pos:pos, G, inn:thirds, PO, A, E,' +
    ' arm_mph:fixed1, pop_2b_s:fixed2, exchange_s:fixed2, sb_against, cs_caught',
);

export const PITCHING_COLUMNS = spec(
  'player_id:player, season, level:level, team:team, G, GS, IP:thirds, BF, H, HR, BB, HBP, SO, ER,' +
    ' fb_mph:fixed1, fb_spin_rpm, whiff_pct:fixed1, gb_pct:fixed1',
);

export const CONTRACT_COLUMNS = spec('player_id:player, season, salary_usd:thousandsUsd');

/** Position of a named column; throws on a name the list lacks (a programming error). */
export function columnAt(columns: readonly ColumnSpec[], name: string): number {
  const i = columns.findIndex((c) => c.name === name);
  if (i < 0) throw new KindredError('kindred.usage.badOption', `no column ${JSON.stringify(name)}: expected one of ${columns.map((c) => c.name).join(', ')}`);
  return i;
}
