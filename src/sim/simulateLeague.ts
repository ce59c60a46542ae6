/**
 * Simulates an invented league deterministically from a seed: players enter
 * each season (from a warm-up period before firstSeason, so the first season
 * already holds players of every age), live their careers (simulateCareer),
 * and for each season in firstSeason..lastSeason get batting, fielding,
 * pitching and contract rows (battingLine, fieldingLine, pitchingLine,
 * salaryThousands) plus a truth row with their true talents.
 *
 * Players are simulated one at a time and their rows appended to flat
 * Float32 tables, so memory grows with the rows kept (about 100 bytes per
 * batting row) and nothing else. The intake per season for a
 * targetPlayerSeasons is sized from a pilot run of careers: in a steady state
 * each season holds intake x (mean career length) players.
 *
 * @example
 * const league = simulateLeague({ seed: 1, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: 12000 });
 * league.truth.length; // => about 12,000
 */
import { UsageError } from '../errors/KindredError.ts';
import { inventClubs } from './inventClubs.ts';
import { inventName } from './inventName.ts';
import { simLadder, type SimLadder } from './simLadder.ts';
import { SeededRandom } from '../random/SeededRandom.ts';
import { DEFAULT_CAREER_RULES, simulateCareer, type CareerRules } from './simulateCareer.ts';
import { positionIndex } from './simPositions.ts';
import { PlayerColumns } from './PlayerColumns.ts';
import { SeasonRows } from './SeasonRows.ts';
import { SimTruth } from './SimTruth.ts';
import type { MeasuredFrom, ResolvedSimOptions, SimLeague, SimOptions } from './simTypes.ts';

/** Seasons of intake simulated before firstSeason (longer careers are very rare). */
const WARM_UP = 20;
const PILOT_CAREERS = 4000;
const DEFAULT_TARGET = 12000;
/** Players a club carries in a season, used to size the number of clubs. */
const PLAYERS_PER_CLUB = 36;
/** Mixed into the seed for the planted twins' own random stream. */
const TWIN_STREAM = 0x7b1a5e;

export function resolveSimOptions(options: SimOptions): ResolvedSimOptions {
  const { seed, firstSeason, lastSeason } = options;
  if (!Number.isInteger(seed)) throw new UsageError(`seed ${seed}: expected an integer`, { seed });
  if (!Number.isInteger(firstSeason) || !Number.isInteger(lastSeason) || lastSeason < firstSeason || firstSeason < 1900 || lastSeason > 9999) {
    throw new UsageError(`seasons ${firstSeason}..${lastSeason}: expected whole years with firstSeason <= lastSeason`, { firstSeason, lastSeason });
  }
  const pitcherShare = options.pitcherShare ?? 0.4;
  if (!(pitcherShare >= 0 && pitcherShare <= 1)) throw new UsageError(`pitcherShare ${pitcherShare}: expected 0 to 1`, { pitcherShare });
  const seasons = lastSeason - firstSeason + 1;
  const minorLevels = options.minorLevels ?? 5;
  const ladder = simLadder(minorLevels);
  const promotionMargin = options.promotionMargin ?? DEFAULT_CAREER_RULES.promotionMargin;
  const promotionChance = options.promotionChance ?? DEFAULT_CAREER_RULES.promotionChance;
  const showingNoise = options.showingNoise ?? DEFAULT_CAREER_RULES.showingNoise;
  const statNoise = options.statNoise ?? 0;
  const eraDrift = options.eraDrift ?? 0;
  const minorsRecordedFrom = options.minorsRecordedFrom ?? firstSeason;
  const twinShare = options.twinShare ?? 0;
  const finite = (name: string, v: number, ok: boolean): void => {
    if (!Number.isFinite(v) || !ok) throw new UsageError(`${name} ${v}: out of range`, { [name]: v });
  };
  finite('promotionMargin', promotionMargin, promotionMargin > -1 && promotionMargin < 2);
  finite('promotionChance', promotionChance, promotionChance > 0 && promotionChance <= 1);
  finite('showingNoise', showingNoise, showingNoise >= 0 && showingNoise <= 2);
  finite('statNoise', statNoise, statNoise >= 0 && statNoise <= 2);
  finite('eraDrift', eraDrift, Math.abs(eraDrift) <= 0.2);
  finite('minorsRecordedFrom', minorsRecordedFrom, Number.isInteger(minorsRecordedFrom));
  finite('twinShare', twinShare, twinShare >= 0 && twinShare <= 1);
  const rules: CareerRules = { ladder, promotionMargin, promotionChance, showingNoise };
  let intake = options.playersPerSeasonIntake;
  if (intake === undefined) {
    const target = options.targetPlayerSeasons ?? DEFAULT_TARGET;
    if (!(target > 0)) throw new UsageError(`targetPlayerSeasons ${target}: expected a positive number`, { target });
    intake = Math.max(1, Math.round(target / (seasons * meanCareerLength(seed, pitcherShare, rules))));
  }
  if (!Number.isInteger(intake) || intake < 1) throw new UsageError(`playersPerSeasonIntake ${intake}: expected a positive integer`, { intake });
  const perSeason = intake * 5;
  const teamsPerLevel = options.teamsPerLevel ?? Math.max(4, Math.round(perSeason / (ladder.names.length * PLAYERS_PER_CLUB)));
  if (!Number.isInteger(teamsPerLevel) || teamsPerLevel < 2) throw new UsageError(`teamsPerLevel ${teamsPerLevel}: expected an integer >= 2`, { teamsPerLevel });
  const trackedFromLevel = options.trackedFromLevel ?? 'High';
  if (!ladder.names.some((l) => l === trackedFromLevel)) {
    throw new UsageError(`trackedFromLevel ${JSON.stringify(trackedFromLevel)}: expected one of ${ladder.names.join(', ')}`, { trackedFromLevel });
  }
  const m = options.measuredFrom ?? {};
  const measuredFrom: MeasuredFrom = {
    battedBall: m.battedBall ?? lastSeason - 9,
    sprint: m.sprint ?? lastSeason - 9,
    arm: m.arm ?? lastSeason - 7,
    catcherTiming: m.catcherTiming ?? lastSeason - 7,
    pitchTracking: m.pitchTracking ?? lastSeason - 9,
    groundball: m.groundball ?? lastSeason - 15,
  };
  return {
    seed, firstSeason, lastSeason, playersPerSeasonIntake: intake, teamsPerLevel, pitcherShare, measuredFrom, trackedFromLevel,
    minorLevels, promotionMargin, promotionChance, showingNoise, statNoise, eraDrift, minorsRecordedFrom, twinShare,
  };
}

function careerRulesOf(o: ResolvedSimOptions): CareerRules {
  return { ladder: simLadder(o.minorLevels), promotionMargin: o.promotionMargin, promotionChance: o.promotionChance, showingNoise: o.showingNoise };
}

/** Mean number of seasons in a career, from a pilot sample drawn with a seed-derived stream. */
function meanCareerLength(seed: number, pitcherShare: number, rules: CareerRules): number {
  const key = `${seed}|${pitcherShare}|${rules.ladder.names.length}|${rules.promotionMargin}|${rules.promotionChance}|${rules.showingNoise}`;
  const known = pilotCache.get(key);
  if (known !== undefined) return known;
  const rng = new SeededRandom((seed ^ 0x5eed5eed) >>> 0);
  let total = 0;
  for (let i = 0; i < PILOT_CAREERS; i++) total += simulateCareer(rng, 0, 60, 8, pitcherShare, rules).seasons.length;
  const mean = total / PILOT_CAREERS;
  if (pilotCache.size > 100) pilotCache.clear();
  pilotCache.set(key, mean);
  return mean;
}

/** Pilot results by seed and pitcher share (pure, so safe to reuse). */
const pilotCache = new Map<string, number>();

export function simulateLeague(options: SimOptions): SimLeague {
  const o = resolveSimOptions(options);
  const rng = new SeededRandom(o.seed);
  const rules = careerRulesOf(o);
  const ladder: SimLadder = rules.ladder;
  const levels: readonly string[] = ladder.names;
  const teams = inventClubs(rng, levels.length, o.teamsPerLevel);
  const seasons = o.lastSeason - o.firstSeason + 1;
  const expected = Math.ceil(1.04 * o.playersPerSeasonIntake * seasons * meanCareerLength(o.seed, o.pitcherShare, rules));
  const rows = new SeasonRows(o, ladder, rng, expected);
  const truth = new SimTruth(levels, expected);
  const players = new PlayerColumns();
  // planted twins draw their names and luck from a stream of their own, so the rest of the league is unchanged
  const twinRng = new SeededRandom((o.seed ^ TWIN_STREAM) >>> 0);

  for (let entry = o.firstSeason - WARM_UP; entry <= o.lastSeason; entry++) {
    for (let k = 0; k < o.playersPerSeasonIntake; k++) {
      const career = simulateCareer(rng, entry, o.lastSeason, o.teamsPerLevel, o.pitcherShare, rules);
      const last = career.seasons[career.seasons.length - 1];
      if (last === undefined || last.season < o.firstSeason) continue;
      const player = players.count;
      players.add(career, inventName(rng));
      addSeasons(player, career, rng);
      const twinned = o.twinShare > 0 && career.seasons.some((cs) => cs.season >= o.firstSeason && cs.stints.some((s) => s.level === ladder.top));
      if (twinned && twinRng.chance(o.twinShare)) {
        players.add(career, inventName(twinRng));
        addSeasons(player + 1, career, twinRng);
        players.pair(player, player + 1);
      }
    }
  }

  /** Truth, stat and contract rows of one career from firstSeason on, the lines' luck drawn from `luck`. */
  function addSeasons(player: number, career: ReturnType<typeof simulateCareer>, luck: SeededRandom): void {
    let service = 0;
    let top = 0;
    for (const cs of career.seasons) {
      let mask = 0;
      for (const s of cs.stints) mask |= 1 << s.level;
      const atTop = (mask & (1 << ladder.top)) !== 0;
      top = Math.max(top, Math.floor(Math.log2(mask)));
      if (cs.season >= o.firstSeason) {
        truth.push(player, cs.season, career.kind, positionIndex(cs.position), mask, cs.age, cs.talents);
        if (career.kind === 'hitter') rows.hitterSeason(player, cs, luck);
        else rows.pitcherSeason(player, cs, luck);
        if (atTop) rows.contract(player, cs, service, luck);
      }
      if (atTop) service++;
    }
    players.end(top, service);
  }

  const sealed = players.seal();
  truth.seal(sealed.ids);
  rows.trim();
  const { batting, fielding, pitching, contracts } = rows;
  return { options: o, levels, teams, players: sealed, batting, fielding, pitching, contracts, truth };
}
