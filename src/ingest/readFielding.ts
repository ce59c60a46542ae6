import { KeyLines, type RosterLookups } from './RosterLookups.ts';
import { WeightedMean, addCount, addTo } from './WeightedMean.ts';
import { readTable, type TableOptions, type TableRead } from './readTable.ts';
import type { FieldPosition, FieldingSeason } from './types.ts';

const FIELD_POSITIONS: ReadonlySet<FieldPosition | 'P'> = new Set<FieldPosition | 'P'>(
  ['C', '1B', '2B', '3B', 'SS', 'LF', 'CF', 'RF', 'P'],
);

interface FieldingStints {
  readonly playerId: string;
  readonly season: number;
  readonly level: string;
  readonly pos: FieldPosition;
  readonly teams: string[];
  G: number | undefined;
  outs: number;
  PO: number;
  A: number;
  E: number;
  sbAgainst: number | undefined;
  csCaught: number | undefined;
  arm: WeightedMean | undefined;
  pop: WeightedMean | undefined;
  exchange: WeightedMean | undefined;
}

/**
 * Reads fielding.csv (one row per player, season, level, team and position)
 * and combines the stints of a player, season, level and position: counts and
 * innings summed, arm_mph weighted by innings, pop_2b_s and exchange_s by
 * sb_against (by innings when a stint with the value lacks sb_against).
 * Rows at P are checked like the others, then skipped (pitchers' fielding is
 * not profiled) and counted in `pitcherRows`.
 */
export async function readFielding(
  options: TableOptions,
  lookups: RosterLookups,
): Promise<TableRead & { readonly fielding: FieldingSeason[]; readonly pitcherRows: number }> {
  const seasons = new Map<string, FieldingStints>();
  const keys = new KeyLines('player, season, level, team and position');
  let pitcherRows = 0;
  const read = await readTable(options, 'fielding.csv', (ctx) => {
    const h = ctx.header;
    const c = {
      playerId: h.col('player_id'), season: h.col('season'), level: h.col('level'), team: h.col('team'),
      pos: h.col('pos'), G: h.col('G'), inn: h.col('inn'), PO: h.col('PO'), A: h.col('A'), E: h.col('E'),
      arm: h.col('arm_mph'), pop: h.col('pop_2b_s'), exchange: h.col('exchange_s'),
      sbAgainst: h.col('sb_against'), csCaught: h.col('cs_caught'),
    };
    return (cells, line) => {
      const { row } = ctx;
      row.start(line, cells);
      const playerId = lookups.player(row, c.playerId);
      const season = row.season(c.season);
      const level = lookups.level(row, c.level);
      const team = row.textOpt(c.team);
      const pos = row.oneOf(c.pos, FIELD_POSITIONS, 'a position: C, 1B, 2B, 3B, SS, LF, CF, RF (or P, read and skipped)');
      const G = row.countOpt(c.G);
      const outs = row.thirds(c.inn);
      const PO = row.count(c.PO);
      const A = row.count(c.A);
      const E = row.count(c.E);
      const arm = row.measured(c.arm);
      const pop = row.measured(c.pop);
      const exchange = row.measured(c.exchange);
      const sbAgainst = row.countOpt(c.sbAgainst);
      const csCaught = row.countOpt(c.csCaught);
      row.atMost(c.csCaught, 'cs_caught', csCaught, 'sb_against', sbAgainst);

      if (playerId !== '' && !Number.isNaN(season) && level !== '' && pos !== undefined) {
        keys.check(row, `${playerId}\u0000${season}\u0000${level}\u0000${team ?? ''}\u0000${pos}`,
          `${playerId} ${season} ${level} ${team ?? '(no team)'} ${pos}`);
      }
      if (!ctx.settle() || pos === undefined) return;
      if (pos === 'P') {
        pitcherRows += 1;
        return;
      }

      const key = `${playerId}\u0000${season}\u0000${level}\u0000${pos}`;
      const s = seasons.get(key);
      if (s === undefined) {
        seasons.set(key, {
          playerId, season, level, pos, teams: team === undefined ? [] : [team],
          G, outs, PO, A, E, sbAgainst, csCaught,
          arm: addTo(undefined, arm, outs, outs),
          pop: addTo(undefined, pop, sbAgainst, outs),
          exchange: addTo(undefined, exchange, sbAgainst, outs),
        });
        return;
      }
      if (team !== undefined && !s.teams.includes(team)) s.teams.push(team);
      s.G = addCount(s.G, G);
      s.outs += outs;
      s.PO += PO;
      s.A += A;
      s.E += E;
      s.sbAgainst = addCount(s.sbAgainst, sbAgainst);
      s.csCaught = addCount(s.csCaught, csCaught);
      s.arm = addTo(s.arm, arm, outs, outs);
      s.pop = addTo(s.pop, pop, sbAgainst, outs);
      s.exchange = addTo(s.exchange, exchange, sbAgainst, outs);
    };
  });
  const fielding: FieldingSeason[] = [];
  for (const s of seasons.values()) fielding.push(toFieldingSeason(s));
  return { ...read, fielding, pitcherRows };
}

function toFieldingSeason(s: FieldingStints): FieldingSeason {
  const armMph = s.arm?.value();
  const pop2bS = s.pop?.value();
  const exchangeS = s.exchange?.value();
  return {
    playerId: s.playerId,
    season: s.season,
    level: s.level,
    pos: s.pos,
    teams: s.teams,
    ...(s.G === undefined ? {} : { G: s.G }),
    outs: s.outs,
    PO: s.PO,
    A: s.A,
    E: s.E,
    ...(armMph === undefined ? {} : { armMph }),
    ...(pop2bS === undefined ? {} : { pop2bS }),
    ...(exchangeS === undefined ? {} : { exchangeS }),
    ...(s.sbAgainst === undefined ? {} : { sbAgainst: s.sbAgainst }),
    ...(s.csCaught === undefined ? {} : { csCaught: s.csCaught }),
  };
}
