/**
 * The stat-line tables of a simulated league (batting, fielding, pitching, contracts) and the rules that
 * turn one career season into their rows: stints at recorded levels, playing time from the level's
 * full-season figures, measurements only where and when the league tracked them, era drift and a
 * season's form (statNoise) on the talents behind the lines.
 *
 * @example
 * const rows = new SeasonRows(options, ladder, rng, 12000);
 * rows.hitterSeason(0, careerSeason); rows.trim(); rows.batting.length; // => the stints written
 */
import type { FieldPosition } from '../ingest/Roster.ts';
import type { SeededRandom } from '../random/SeededRandom.ts';
import { battingLine } from './battingLine.ts';
import { ColumnTable } from './ColumnTable.ts';
import { fieldingLine } from './fieldingLine.ts';
import { BATTING_COLUMNS, CONTRACT_COLUMNS, FIELDING_COLUMNS, PITCHING_COLUMNS } from './fileSchemas.ts';
import { pitchingLine } from './pitchingLine.ts';
import { salaryThousands } from './salary.ts';
import type { SimLadder } from './simLadder.ts';
import type { CareerSeason } from './simulateCareer.ts';
import { positionIndex } from './simPositions.ts';
import type { ResolvedSimOptions } from './simTypes.ts';
import { P_STAMINA } from './talentNames.ts';

export class SeasonRows {
  readonly batting: ColumnTable;
  readonly fielding: ColumnTable;
  readonly pitching: ColumnTable;
  readonly contracts: ColumnTable;
  private readonly bRow = new Float64Array(BATTING_COLUMNS.length);
  private readonly fRow = new Float64Array(FIELDING_COLUMNS.length);
  private readonly pRow = new Float64Array(PITCHING_COLUMNS.length);
  private readonly cRow = new Float64Array(CONTRACT_COLUMNS.length);
  private readonly tracked: number;
  private readonly midSeason: number;

  /** `expected`: the player-seasons expected (steady state), so the tables rarely grow. */
  constructor(
    private readonly o: ResolvedSimOptions,
    private readonly ladder: SimLadder,
    private readonly rng: SeededRandom,
    expected: number,
  ) {
    const hitterRows = Math.ceil(expected * (1 - o.pitcherShare) * 1.1);
    this.batting = new ColumnTable(BATTING_COLUMNS, hitterRows);
    this.fielding = new ColumnTable(FIELDING_COLUMNS, Math.ceil(hitterRows * 1.2));
    this.pitching = new ColumnTable(PITCHING_COLUMNS, Math.ceil(expected * o.pitcherShare * 1.12));
    this.contracts = new ColumnTable(CONTRACT_COLUMNS, Math.ceil(expected * 0.18));
    this.tracked = ladder.names.indexOf(o.trackedFromLevel);
    this.midSeason = (o.firstSeason + o.lastSeason) / 2;
  }

  /** The run environment's drift in a season (0 at the middle of the league's span). */
  private eraOf(season: number): number {
    return this.o.eraDrift * (season - this.midSeason);
  }

  /** Top-level seasons are always recorded; minor-league seasons from `minorsRecordedFrom`. */
  private recorded(season: number, level: number): boolean {
    return level === this.ladder.top || season >= this.o.minorsRecordedFrom;
  }

  /** The talents behind this season's stat lines: true talents, plus a season's form when statNoise > 0. */
  private lineTalents(t: Float64Array, rng: SeededRandom): Float64Array {
    if (this.o.statNoise <= 0) return t;
    const form = new Float64Array(t.length);
    for (let k = 0; k < t.length; k++) form[k] = (t[k] ?? 0) + this.o.statNoise * rng.normal();
    return form;
  }

  /**
   * Batting and fielding rows of one hitter season, one per recorded stint. `rng`: the luck of the lines
   * (default the league's stream; a planted twin's lines draw from the twins' own).
   */
  hitterSeason(player: number, cs: CareerSeason, rng: SeededRandom = this.rng): void {
    const { o, ladder, bRow } = this;
    const pos = cs.position;
    const talents = this.lineTalents(cs.talents, rng);
    for (const stint of cs.stints) {
      const lv = stint.level;
      if (!this.recorded(cs.season, lv)) continue;
      const team = lv * o.teamsPerLevel + stint.club;
      const catcherLoad = pos === 'C' ? 0.82 : 1;
      const pa = Math.max(1, Math.round((ladder.fullPa[lv] ?? 500) * stint.share * catcherLoad));
      const perGame = cs.regular ? rng.uniform(3.9, 4.4) : rng.uniform(2.6, 3.8);
      const maxGames = Math.max(1, Math.round((ladder.seasonGames[lv] ?? 140) * Math.min(1, stint.share + 0.05)));
      const games = Math.max(1, Math.min(maxGames, Math.ceil(pa / perGame)));
      const bb = cs.season >= o.measuredFrom.battedBall && lv >= this.tracked;
      const sprint = cs.season >= o.measuredFrom.sprint && lv >= this.tracked;
      bRow[0] = player;
      bRow[1] = cs.season;
      bRow[2] = lv;
      bRow[3] = team;
      battingLine(rng, talents, ladder.base[lv] ?? lv, pa, games, bb, sprint, bRow, this.eraOf(cs.season));
      this.batting.push(bRow);

      const measured = { arm: cs.season >= o.measuredFrom.arm && lv >= this.tracked, timing: cs.season >= o.measuredFrom.catcherTiming && lv >= this.tracked };
      const second = cs.secondary;
      let secondGames = second === null ? 0 : Math.max(1, Math.round(games * rng.uniform(0.03, 0.25)));
      if (pos !== 'DH' && pos !== 'SP' && pos !== 'RP') {
        const share = cs.regular ? rng.uniform(0.85, 1.0) : rng.uniform(0.6, 1.0);
        const primaryGames = Math.round(games * share) - secondGames;
        if (primaryGames < 1) secondGames = Math.max(0, secondGames + primaryGames - 1);
        if (primaryGames >= 1) this.fieldingRow(rng, player, cs, lv, team, pos, primaryGames, cs.regular, measured);
      }
      if (second !== null && secondGames >= 1) this.fieldingRow(rng, player, cs, lv, team, second, secondGames, false, measured);
    }
  }

  private fieldingRow(
    rng: SeededRandom, player: number, cs: CareerSeason, lv: number, team: number, pos: FieldPosition,
    games: number, regular: boolean, measured: { readonly arm: boolean; readonly timing: boolean },
  ): void {
    const fRow = this.fRow;
    fRow[0] = player;
    fRow[1] = cs.season;
    fRow[2] = lv;
    fRow[3] = team;
    fRow[4] = positionIndex(pos);
    fieldingLine(rng, cs.talents, pos, games, regular, measured.arm, measured.timing, fRow);
    this.fielding.push(fRow);
  }

  /** Pitching rows of one pitcher season, one per recorded stint: starts and outs by role and stamina (`rng` as for hitterSeason). */
  pitcherSeason(player: number, cs: CareerSeason, rng: SeededRandom = this.rng): void {
    const { o, ladder, pRow } = this;
    const reliever = cs.position === 'RP';
    const stamina = cs.talents[P_STAMINA] ?? 0;
    const talents = this.lineTalents(cs.talents, rng);
    for (const stint of cs.stints) {
      const lv = stint.level;
      if (!this.recorded(cs.season, lv)) continue;
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
      const trackedNow = cs.season >= o.measuredFrom.pitchTracking && lv >= this.tracked;
      const gb = cs.season >= o.measuredFrom.groundball;
      pRow[0] = player;
      pRow[1] = cs.season;
      pRow[2] = lv;
      pRow[3] = team;
      pitchingLine(rng, talents, ladder.base[lv] ?? lv, games, starts, outs, reliever, trackedNow, gb, pRow, this.eraOf(cs.season));
      this.pitching.push(pRow);
    }
  }

  /** A top-level season's contract row, present 92% of the time (clubs' records have gaps). */
  contract(player: number, cs: CareerSeason, service: number, rng: SeededRandom = this.rng): void {
    if (!rng.chance(0.92)) return;
    const cRow = this.cRow;
    cRow[0] = player;
    cRow[1] = cs.season;
    cRow[2] = salaryThousands(rng, cs.season, service, cs.value);
    this.contracts.push(cRow);
  }

  trim(): void {
    this.batting.trim();
    this.fielding.trim();
    this.pitching.trim();
    this.contracts.trim();
  }
}
