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
import type { FieldPosition } from '../ingest/Roster.ts';
import { UsageError } from '../errors/KindredError.ts';
import { battingLine } from './battingLine.ts';
import { ColumnTable } from './ColumnTable.ts';
import { fieldingLine } from './fieldingLine.ts';
import { BATTING_COLUMNS, CONTRACT_COLUMNS, FIELDING_COLUMNS, PITCHING_COLUMNS } from './fileSchemas.ts';
import { inventClubs } from './inventClubs.ts';
import { inventName } from './inventName.ts';
import { simLadder, type SimLadder } from './simLadder.ts';
import { pitchingLine } from './pitchingLine.ts';
import { SeededRandom } from '../random/SeededRandom.ts';
import { salaryThousands } from './salary.ts';
import { DEFAULT_CAREER_RULES, simulateCareer, type Career, type CareerRules, type CareerSeason } from './simulateCareer.ts';
import { positionIndex } from './simPositions.ts';
import { SimTruth } from './SimTruth.ts';
import type { MeasuredFrom, ResolvedSimOptions, SimLeague, SimOptions } from './simTypes.ts';
import { P_STAMINA } from './talentNames.ts';
import type { Bats, Throws } from '../ingest/Roster.ts';

/** Seasons of intake simulated before firstSeason (longer careers are very rare). */
const WARM_UP = 20;
const PILOT_CAREERS = 4000;
const DEFAULT_TARGET = 12000;
/** Players a club carries in a season, used to size the number of clubs. */
const PLAYERS_PER_CLUB = 36;

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
  const finite = (name: string, v: number, ok: boolean): void => {
    if (!Number.isFinite(v) || !ok) throw new UsageError(`${name} ${v}: out of range`, { [name]: v });
  };
  finite('promotionMargin', promotionMargin, promotionMargin > -1 && promotionMargin < 2);
  finite('promotionChance', promotionChance, promotionChance > 0 && promotionChance <= 1);
  finite('showingNoise', showingNoise, showingNoise >= 0 && showingNoise <= 2);
  finite('statNoise', statNoise, statNoise >= 0 && statNoise <= 2);
  finite('eraDrift', eraDrift, Math.abs(eraDrift) <= 0.2);
  finite('minorsRecordedFrom', minorsRecordedFrom, Number.isInteger(minorsRecordedFrom));
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
  const trackedFromLevel = options.trackedFromLevel ?? 'AA';
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
    minorLevels, promotionMargin, promotionChance, showingNoise, statNoise, eraDrift, minorsRecordedFrom,
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
  const midSeason = (o.firstSeason + o.lastSeason) / 2;
  const eraOf = (season: number): number => o.eraDrift * (season - midSeason);
  const recorded = (season: number, level: number): boolean => level === ladder.top || season >= o.minorsRecordedFrom;
  /** The talents behind this season's stat lines: true talents, plus a season's form when statNoise > 0. */
  const lineTalents = (t: Float64Array): Float64Array => {
    if (o.statNoise <= 0) return t;
    const form = new Float64Array(t.length);
    for (let k = 0; k < t.length; k++) form[k] = (t[k] ?? 0) + o.statNoise * rng.normal();
    return form;
  };
  const teams = inventClubs(rng, levels.length, o.teamsPerLevel);
  const seasons = o.lastSeason - o.firstSeason + 1;
  // Capacities from the expected size (steady state), so tables rarely grow.
  const expected = Math.ceil(1.04 * o.playersPerSeasonIntake * seasons * meanCareerLength(o.seed, o.pitcherShare, rules));
  const hitterRows = Math.ceil(expected * (1 - o.pitcherShare) * 1.1);
  const batting = new ColumnTable(BATTING_COLUMNS, hitterRows);
  const fielding = new ColumnTable(FIELDING_COLUMNS, Math.ceil(hitterRows * 1.2));
  const pitching = new ColumnTable(PITCHING_COLUMNS, Math.ceil(expected * o.pitcherShare * 1.12));
  const contracts = new ColumnTable(CONTRACT_COLUMNS, Math.ceil(expected * 0.18));
  const truth = new SimTruth(levels, expected);
  const tracked = levels.indexOf(o.trackedFromLevel);

  const names: string[] = [];
  const birthDates: string[] = [];
  const bats: Bats[] = [];
  const throws: Throws[] = [];
  const kind: number[] = [];
  const entrySeason: number[] = [];
  const entryAge: number[] = [];
  const highestLevel: number[] = [];
  const mlbSeasons: number[] = [];
  const active: number[] = [];
  const peakValue: number[] = [];

  const bRow = new Float64Array(BATTING_COLUMNS.length);
  const fRow = new Float64Array(FIELDING_COLUMNS.length);
  const pRow = new Float64Array(PITCHING_COLUMNS.length);
  const cRow = new Float64Array(CONTRACT_COLUMNS.length);

  const emitHitterSeason = (player: number, cs: CareerSeason): void => {
    const pos = cs.position;
    const talents = lineTalents(cs.talents);
    for (const stint of cs.stints) {
      const lv = stint.level;
      if (!recorded(cs.season, lv)) continue;
      const team = lv * o.teamsPerLevel + stint.club;
      const catcherLoad = pos === 'C' ? 0.82 : 1;
      const pa = Math.max(1, Math.round((ladder.fullPa[lv] ?? 500) * stint.share * catcherLoad));
      const perGame = cs.regular ? rng.uniform(3.9, 4.4) : rng.uniform(2.6, 3.8);
      const maxGames = Math.max(1, Math.round((ladder.seasonGames[lv] ?? 140) * Math.min(1, stint.share + 0.05)));
      const games = Math.max(1, Math.min(maxGames, Math.ceil(pa / perGame)));
      const bb = cs.season >= o.measuredFrom.battedBall && lv >= tracked;
      const sprint = cs.season >= o.measuredFrom.sprint && lv >= tracked;
      bRow[0] = player;
      bRow[1] = cs.season;
      bRow[2] = lv;
      bRow[3] = team;
      battingLine(rng, talents, ladder.base[lv] ?? lv, pa, games, bb, sprint, bRow, eraOf(cs.season));
      batting.push(bRow);

      const arm = cs.season >= o.measuredFrom.arm && lv >= tracked;
      const timing = cs.season >= o.measuredFrom.catcherTiming && lv >= tracked;
      const second = cs.secondary;
      let secondGames = second === null ? 0 : Math.max(1, Math.round(games * rng.uniform(0.03, 0.25)));
      if (pos !== 'DH' && pos !== 'SP' && pos !== 'RP') {
        const share = cs.regular ? rng.uniform(0.85, 1.0) : rng.uniform(0.6, 1.0);
        const primaryGames = Math.round(games * share) - secondGames;
        if (primaryGames < 1) secondGames = Math.max(0, secondGames + primaryGames - 1);
        if (primaryGames >= 1) emitFielding(player, cs, lv, team, pos, primaryGames, cs.regular, arm, timing);
      }
      if (second !== null && secondGames >= 1) emitFielding(player, cs, lv, team, second, secondGames, false, arm, timing);
    }
  };

  const emitFielding = (
    player: number, cs: CareerSeason, lv: number, team: number, pos: FieldPosition,
    games: number, regular: boolean, arm: boolean, timing: boolean,
  ): void => {
    fRow[0] = player;
    fRow[1] = cs.season;
    fRow[2] = lv;
    fRow[3] = team;
    fRow[4] = positionIndex(pos);
    fieldingLine(rng, cs.talents, pos, games, regular, arm, timing, fRow);
    fielding.push(fRow);
  };

  const emitPitcherSeason = (player: number, cs: CareerSeason): void => {
    const reliever = cs.position === 'RP';
    const stamina = cs.talents[P_STAMINA] ?? 0;
    const talents = lineTalents(cs.talents);
    for (const stint of cs.stints) {
      const lv = stint.level;
      if (!recorded(cs.season, lv)) continue;
      const team = lv * o.teamsPerLevel + stint.club;
      let games: number, starts: number, outs: number;
      if (!reliever) {
        starts = Math.max(1, Math.round((ladder.fullStarts[lv] ?? 25) * stint.share));
        const extra = rng.chance(0.3) ? rng.binomial(4, 0.4) : 0;
        games = starts + extra;
        const perStart = Math.min(22, Math.max(8, 3 * (5.0 + 0.6 * stamina + 0.4 * (cs.value - (ladder.bar[lv] ?? 0))) + 2 * rng.normal()));
        outs = Math.max(1, Math.round(starts * perStart * rng.uniform(0.9, 1.1) + extra * 3));
      } else {
        games = Math.max(1, Math.round((ladder.fullReliefGames[lv] ?? 40) * stint.share));
        starts = rng.chance(0.05) ? 1 : 0;
        outs = Math.max(1, Math.round(games * (3.1 + 0.25 * stamina) * rng.uniform(0.85, 1.15) + starts * 9));
      }
      const trackedNow = cs.season >= o.measuredFrom.pitchTracking && lv >= tracked;
      const gb = cs.season >= o.measuredFrom.groundball;
      pRow[0] = player;
      pRow[1] = cs.season;
      pRow[2] = lv;
      pRow[3] = team;
      pitchingLine(rng, talents, ladder.base[lv] ?? lv, games, starts, outs, reliever, trackedNow, gb, pRow, eraOf(cs.season));
      pitching.push(pRow);
    }
  };

  for (let entry = o.firstSeason - WARM_UP; entry <= o.lastSeason; entry++) {
    for (let k = 0; k < o.playersPerSeasonIntake; k++) {
      const career = simulateCareer(rng, entry, o.lastSeason, o.teamsPerLevel, o.pitcherShare, rules);
      const last = career.seasons[career.seasons.length - 1];
      if (last === undefined || last.season < o.firstSeason) continue;
      const player = names.length;
      addPlayer(career);
      let service = 0;
      let top = 0;
      for (const cs of career.seasons) {
        let mask = 0;
        for (const s of cs.stints) mask |= 1 << s.level;
        const atTop = (mask & (1 << ladder.top)) !== 0;
        top = Math.max(top, Math.floor(Math.log2(mask)));
        if (cs.season >= o.firstSeason) {
          truth.push(player, cs.season, career.kind, positionIndex(cs.position), mask, cs.age, cs.talents);
          if (career.kind === 'hitter') emitHitterSeason(player, cs);
          else emitPitcherSeason(player, cs);
          if (atTop && rng.chance(0.92)) {
            cRow[0] = player;
            cRow[1] = cs.season;
            cRow[2] = salaryThousands(rng, cs.season, service, cs.value);
            contracts.push(cRow);
          }
        }
        if (atTop) service++;
      }
      highestLevel.push(top);
      mlbSeasons.push(service);
    }
  }

  function addPlayer(career: Career): void {
    names.push(inventName(rng));
    birthDates.push(career.birthDate);
    bats.push(career.bats);
    throws.push(career.throws);
    kind.push(career.kind === 'hitter' ? 0 : 1);
    entrySeason.push(career.entrySeason);
    entryAge.push(career.entryAge);
    active.push(career.active ? 1 : 0);
    peakValue.push(career.peakValue);
  }

  const count = names.length;
  const width = Math.max(6, String(count).length);
  const ids = Array.from({ length: count }, (_, i) => `p${String(i + 1).padStart(width, '0')}`);
  truth.seal(ids);
  batting.trim();
  fielding.trim();
  pitching.trim();
  contracts.trim();
  return {
    options: o,
    levels,
    teams,
    players: {
      count,
      ids,
      names,
      birthDates,
      bats,
      throws,
      kind: Uint8Array.from(kind),
      entrySeason: Int16Array.from(entrySeason),
      entryAge: Int8Array.from(entryAge),
      highestLevel: Int8Array.from(highestLevel),
      mlbSeasons: Int16Array.from(mlbSeasons),
      peakValue: Float32Array.from(peakValue),
      active: Uint8Array.from(active),
    },
    batting,
    fielding,
    pitching,
    contracts,
    truth,
  };
}
