import { KeyLines, type RosterLookups } from './RosterLookups.ts';
import { WeightedMean, addTo } from './WeightedMean.ts';
import { readTable, type TableOptions, type TableRead } from './readTable.ts';
import type { PitchingSeason } from './types.ts';

interface PitchingStints {
  readonly playerId: string;
  readonly season: number;
  readonly level: string;
  readonly teams: string[];
  G: number;
  GS: number;
  outs: number;
  BF: number;
  H: number;
  HR: number;
  BB: number;
  HBP: number;
  SO: number;
  ER: number;
  fb: WeightedMean | undefined;
  spin: WeightedMean | undefined;
  whiff: WeightedMean | undefined;
  gb: WeightedMean | undefined;
}

/**
 * Reads pitching.csv (one row per player, season, level and team) and
 * combines the stints of a player, season and level: counts and innings
 * summed, fb_mph, fb_spin_rpm and whiff_pct weighted by BF, gb_pct by balls
 * in play (BF - SO - BB - HBP).
 */
export async function readPitching(
  options: TableOptions,
  lookups: RosterLookups,
): Promise<TableRead & { readonly pitching: PitchingSeason[] }> {
  const seasons = new Map<string, PitchingStints>();
  const keys = new KeyLines('player, season, level and team');
  const read = await readTable(options, 'pitching.csv', (ctx) => {
    const h = ctx.header;
    const c = {
      playerId: h.col('player_id'), season: h.col('season'), level: h.col('level'), team: h.col('team'),
      G: h.col('G'), GS: h.col('GS'), IP: h.col('IP'), BF: h.col('BF'), H: h.col('H'), HR: h.col('HR'),
      BB: h.col('BB'), HBP: h.col('HBP'), SO: h.col('SO'), ER: h.col('ER'),
      fb: h.col('fb_mph'), spin: h.col('fb_spin_rpm'), whiff: h.col('whiff_pct'), gb: h.col('gb_pct'),
    };
    const whiffWatch = ctx.watchPercent(c.whiff);
    const gbWatch = ctx.watchPercent(c.gb);
    return (cells, line) => {
      const { row } = ctx;
      row.start(line, cells);
      const playerId = lookups.player(row, c.playerId);
      const season = row.season(c.season);
      const level = lookups.level(row, c.level);
      const team = row.textOpt(c.team);
      const G = row.count(c.G);
      const GS = row.count(c.GS);
      const outs = row.thirds(c.IP);
      const BF = row.count(c.BF);
      const H = row.count(c.H);
      const HR = row.count(c.HR);
      const BB = row.count(c.BB);
      const HBP = row.count(c.HBP);
      const SO = row.count(c.SO);
      const ER = row.count(c.ER);
      const fb = row.measured(c.fb);
      const spin = row.measured(c.spin);
      const whiff = row.percent(c.whiff);
      const gb = row.percent(c.gb);

      row.atMost(c.GS, 'GS', GS, 'G', G);
      row.atMost(c.H, 'H', H, 'BF', BF);
      row.atMost(c.HR, 'HR', HR, 'H', H);
      row.atMost(c.BF, 'SO + BB + HBP', SO + BB + HBP, 'BF', BF);

      if (playerId !== '' && !Number.isNaN(season) && level !== '') {
        keys.check(row, `${playerId}\u0000${season}\u0000${level}\u0000${team ?? ''}`,
          `${playerId} ${season} ${level} ${team ?? '(no team)'}`);
      }
      whiffWatch.see(whiff, line);
      gbWatch.see(gb, line);
      if (!ctx.settle()) return;

      const inPlay = BF - SO - BB - HBP;
      const key = `${playerId}\u0000${season}\u0000${level}`;
      const s = seasons.get(key);
      if (s === undefined) {
        seasons.set(key, {
          playerId, season, level, teams: team === undefined ? [] : [team],
          G, GS, outs, BF, H, HR, BB, HBP, SO, ER,
          fb: addTo(undefined, fb, BF, BF),
          spin: addTo(undefined, spin, BF, BF),
          whiff: addTo(undefined, whiff, BF, BF),
          gb: addTo(undefined, gb, inPlay, inPlay),
        });
        return;
      }
      if (team !== undefined && !s.teams.includes(team)) s.teams.push(team);
      s.G += G;
      s.GS += GS;
      s.outs += outs;
      s.BF += BF;
      s.H += H;
      s.HR += HR;
      s.BB += BB;
      s.HBP += HBP;
      s.SO += SO;
      s.ER += ER;
      s.fb = addTo(s.fb, fb, BF, BF);
      s.spin = addTo(s.spin, spin, BF, BF);
      s.whiff = addTo(s.whiff, whiff, BF, BF);
      s.gb = addTo(s.gb, gb, inPlay, inPlay);
    };
  });
  const pitching: PitchingSeason[] = [];
  for (const s of seasons.values()) pitching.push(toPitchingSeason(s));
  return { ...read, pitching };
}

function toPitchingSeason(s: PitchingStints): PitchingSeason {
  const fbMph = s.fb?.value();
  const fbSpinRpm = s.spin?.value();
  const whiffPct = s.whiff?.value();
  const gbPct = s.gb?.value();
  return {
    playerId: s.playerId,
    season: s.season,
    level: s.level,
    teams: s.teams,
    G: s.G,
    GS: s.GS,
    outs: s.outs,
    BF: s.BF,
    H: s.H,
    HR: s.HR,
    BB: s.BB,
    HBP: s.HBP,
    SO: s.SO,
    ER: s.ER,
    ...(fbMph === undefined ? {} : { fbMph }),
    ...(fbSpinRpm === undefined ? {} : { fbSpinRpm }),
    ...(whiffPct === undefined ? {} : { whiffPct }),
    ...(gbPct === undefined ? {} : { gbPct }),
  };
}
