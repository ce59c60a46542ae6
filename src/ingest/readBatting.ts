import { KeyLines, type RosterLookups } from './RosterLookups.ts';
import { WeightedMean, addCount, addTo } from './WeightedMean.ts';
import { readTable, type TableOptions, type TableRead } from './readTable.ts';
import type { BattingSeason } from './types.ts';

interface BattingStints {
  readonly playerId: string;
  readonly season: number;
  readonly level: string;
  readonly teams: string[];
  G: number | undefined;
  PA: number;
  AB: number;
  H: number;
  doubles: number;
  triples: number;
  HR: number;
  BB: number;
  HBP: number;
  SF: number;
  SO: number;
  IBB: number | undefined;
  SB: number | undefined;
  CS: number | undefined;
  bbe: number | undefined;
  evAvg: WeightedMean | undefined;
  evP90: WeightedMean | undefined;
  laAvg: WeightedMean | undefined;
  hardHit: WeightedMean | undefined;
  sweetSpot: WeightedMean | undefined;
  sprint: WeightedMean | undefined;
}

/**
 * Reads batting.csv (one row per player, season, level and team) and combines
 * the stints of a player, season and level: counts summed (an optional count
 * is unknown when a stint lacks it), batted-ball averages weighted by bbe
 * (by PA when a stint with the value lacks bbe), sprint speed by PA.
 */
export async function readBatting(
  options: TableOptions,
  lookups: RosterLookups,
): Promise<TableRead & { readonly batting: BattingSeason[] }> {
  const seasons = new Map<string, BattingStints>();
  const keys = new KeyLines('player, season, level and team');
  const read = await readTable(options, 'batting.csv', (ctx) => {
    const h = ctx.header;
    const c = {
      playerId: h.col('player_id'), season: h.col('season'), level: h.col('level'), team: h.col('team'),
      G: h.col('G'), PA: h.col('PA'), AB: h.col('AB'), H: h.col('H'), doubles: h.col('2B'), triples: h.col('3B'),
      HR: h.col('HR'), BB: h.col('BB'), HBP: h.col('HBP'), SF: h.col('SF'), SO: h.col('SO'),
      IBB: h.col('IBB'), SB: h.col('SB'), CS: h.col('CS'), bbe: h.col('bbe'),
      evAvg: h.col('ev_avg_mph'), evP90: h.col('ev_p90_mph'), laAvg: h.col('la_avg_deg'),
      hardHit: h.col('hard_hit_pct'), sweetSpot: h.col('sweet_spot_pct'), sprint: h.col('sprint_ft_s'),
    };
    const hardHitWatch = ctx.watchPercent(c.hardHit);
    const sweetSpotWatch = ctx.watchPercent(c.sweetSpot);
    return (cells, line) => {
      const { row } = ctx;
      row.start(line, cells);
      const playerId = lookups.player(row, c.playerId);
      const season = row.season(c.season);
      const level = lookups.level(row, c.level);
      const team = row.textOpt(c.team);
      const G = row.countOpt(c.G);
      const PA = row.count(c.PA);
      const AB = row.count(c.AB);
      const H = row.count(c.H);
      const doubles = row.count(c.doubles);
      const triples = row.count(c.triples);
      const HR = row.count(c.HR);
      const BB = row.count(c.BB);
      const HBP = row.count(c.HBP);
      const SF = row.count(c.SF);
      const SO = row.count(c.SO);
      const IBB = row.countOpt(c.IBB);
      const SB = row.countOpt(c.SB);
      const CS = row.countOpt(c.CS);
      const bbe = row.countOpt(c.bbe);
      const evAvg = row.measured(c.evAvg);
      const evP90 = row.measured(c.evP90);
      const laAvg = row.measured(c.laAvg);
      const hardHit = row.percent(c.hardHit);
      const sweetSpot = row.percent(c.sweetSpot);
      const sprint = row.measured(c.sprint);

      row.atMost(c.H, 'H', H, 'AB', AB);
      row.atMost(c.H, '2B + 3B + HR', doubles + triples + HR, 'H', H);
      row.atMost(c.PA, 'AB + BB + HBP + SF', AB + BB + HBP + SF, 'PA', PA);
      row.atMost(c.SO, 'SO', SO, 'PA', PA);
      row.atMost(c.IBB, 'IBB', IBB, 'BB', BB);
      row.atMost(c.bbe, 'bbe', bbe, 'PA', PA);
      row.atMost(c.evP90, 'ev_avg_mph', evAvg, 'ev_p90_mph', evP90);

      if (playerId !== '' && !Number.isNaN(season) && level !== '') {
        keys.check(row, `${playerId}\u0000${season}\u0000${level}\u0000${team ?? ''}`,
          `${playerId} ${season} ${level} ${team ?? '(no team)'}`);
      }
      hardHitWatch.see(hardHit, line);
      sweetSpotWatch.see(sweetSpot, line);
      if (!ctx.settle()) return;

      const key = `${playerId}\u0000${season}\u0000${level}`;
      const s = seasons.get(key);
      if (s === undefined) {
        seasons.set(key, {
          playerId, season, level, teams: team === undefined ? [] : [team],
          G, PA, AB, H, doubles, triples, HR, BB, HBP, SF, SO, IBB, SB, CS, bbe,
          evAvg: addTo(undefined, evAvg, bbe, PA),
          evP90: addTo(undefined, evP90, bbe, PA),
          laAvg: addTo(undefined, laAvg, bbe, PA),
          hardHit: addTo(undefined, hardHit, bbe, PA),
          sweetSpot: addTo(undefined, sweetSpot, bbe, PA),
          sprint: addTo(undefined, sprint, PA, PA),
        });
        return;
      }
      if (team !== undefined && !s.teams.includes(team)) s.teams.push(team);
      s.G = addCount(s.G, G);
      s.PA += PA;
      s.AB += AB;
      s.H += H;
      s.doubles += doubles;
      s.triples += triples;
      s.HR += HR;
      s.BB += BB;
      s.HBP += HBP;
      s.SF += SF;
      s.SO += SO;
      s.IBB = addCount(s.IBB, IBB);
      s.SB = addCount(s.SB, SB);
      s.CS = addCount(s.CS, CS);
      s.bbe = addCount(s.bbe, bbe);
      s.evAvg = addTo(s.evAvg, evAvg, bbe, PA);
      s.evP90 = addTo(s.evP90, evP90, bbe, PA);
      s.laAvg = addTo(s.laAvg, laAvg, bbe, PA);
      s.hardHit = addTo(s.hardHit, hardHit, bbe, PA);
      s.sweetSpot = addTo(s.sweetSpot, sweetSpot, bbe, PA);
      s.sprint = addTo(s.sprint, sprint, PA, PA);
    };
  });
  const batting: BattingSeason[] = [];
  for (const s of seasons.values()) batting.push(toBattingSeason(s));
  return { ...read, batting };
}

function toBattingSeason(s: BattingStints): BattingSeason {
  const evAvgMph = s.evAvg?.value();
  const evP90Mph = s.evP90?.value();
  const laAvgDeg = s.laAvg?.value();
  const hardHitPct = s.hardHit?.value();
  const sweetSpotPct = s.sweetSpot?.value();
  const sprintFtS = s.sprint?.value();
  return {
    playerId: s.playerId,
    season: s.season,
    level: s.level,
    teams: s.teams,
    ...(s.G === undefined ? {} : { G: s.G }),
    PA: s.PA,
    AB: s.AB,
    H: s.H,
    doubles: s.doubles,
    triples: s.triples,
    HR: s.HR,
    BB: s.BB,
    HBP: s.HBP,
    SF: s.SF,
    SO: s.SO,
    ...(s.IBB === undefined ? {} : { IBB: s.IBB }),
    ...(s.SB === undefined ? {} : { SB: s.SB }),
    ...(s.CS === undefined ? {} : { CS: s.CS }),
    ...(s.bbe === undefined ? {} : { bbe: s.bbe }),
    ...(evAvgMph === undefined ? {} : { evAvgMph }),
    ...(evP90Mph === undefined ? {} : { evP90Mph }),
    ...(laAvgDeg === undefined ? {} : { laAvgDeg }),
    ...(hardHitPct === undefined ? {} : { hardHitPct }),
    ...(sweetSpotPct === undefined ? {} : { sweetSpotPct }),
    ...(sprintFtS === undefined ? {} : { sprintFtS }),
  };
}
