import { StoreError } from '../errors/KindredError.ts';
import { OUTLOOK_CONSTANTS } from './outlookConstants.ts';
import type { OutcomesFile } from '../store/outcomesFile.ts';
import type { CompOutcome, OutcomeKind } from './CompOutcome.ts';

/** One top-level season of one player: the sample and the league-relative value (NaN when undefined). */
interface TopSeason {
  readonly season: number;
  /** PA (hitters) or outs (pitchers). */
  readonly sample: number;
  /** Any appearance: PA (hitters) or BF (pitchers). */
  readonly appeared: boolean;
  /** OPS+ (hitters) or FIP- (pitchers). */
  readonly value: number;
}

export interface LeagueSeason {
  readonly season: number;
  readonly OBP: number;
  readonly SLG: number;
  readonly ERA: number;
  readonly fipConstant: number;
  readonly FIP: number;
}

/**
 * The top-level outcomes of a store, indexed by the store's player index, answering "what did this
 * player do at the top level in the `horizon` seasons after season s, as far as the data known at
 * `asOf` tells".
 */
export class Outcomes {
  readonly topLevel: string;
  readonly firstSeason: number;
  readonly lastSeason: number;
  readonly league: ReadonlyMap<number, LeagueSeason>;
  private readonly batting: ReadonlyMap<number, readonly TopSeason[]>;
  private readonly pitching: ReadonlyMap<number, readonly TopSeason[]>;

  /** @param playerIndex the store's player index by id (ProfileStore.playerById) */
  constructor(file: OutcomesFile, playerIndex: ReadonlyMap<string, number>, source = 'outcomes.json') {
    this.topLevel = file.top_level;
    this.firstSeason = file.first_season;
    this.lastSeason = file.last_season;
    const nan = (x: number | null): number => (x === null ? NaN : x);
    this.league = new Map(
      file.league.map(([season, OBP, SLG, ERA, C, FIP]) => [season, { season, OBP: nan(OBP), SLG: nan(SLG), ERA: nan(ERA), fipConstant: nan(C), FIP: nan(FIP) }]),
    );
    const indexOf = (id: string): number => {
      const i = playerIndex.get(id);
      if (i === undefined) {
        throw new StoreError('kindred.store.corrupt', `${source}: player ${JSON.stringify(id)} is not in the store's players (players.bin); rebuild the store`, { file: source, value: id });
      }
      return i;
    };
    const group = (rows: readonly { player: number; s: TopSeason }[]): Map<number, TopSeason[]> => {
      const out = new Map<number, TopSeason[]>();
      for (const { player, s } of rows) {
        const list = out.get(player);
        if (list) list.push(s);
        else out.set(player, [s]);
      }
      for (const list of out.values()) list.sort((a, b) => a.season - b.season);
      return out;
    };
    this.batting = group(file.batting.map(([id, season, PA, ops]) => ({ player: indexOf(id), s: { season, sample: PA, appeared: PA > 0, value: nan(ops) } })));
    this.pitching = group(
      file.pitching.map(([id, season, outs, BF, fipM]) => ({ player: indexOf(id), s: { season, sample: outs, appeared: BF > 0 || outs > 0, value: nan(fipM) } })),
    );
  }

  /**
   * What the player did at the top level in seasons season+1 .. season+horizon, using only seasons up
   * to `asOf` (default: the data's last season). Censored when the window runs past `asOf`.
   * Peak: the best OPS+ (highest) in a season of at least 300 PA for hitters, the best FIP- (lowest) in
   * a season of at least 50 IP for pitchers (OUTLOOK_CONSTANTS).
   */
  futureOf(player: number, kind: OutcomeKind, season: number, horizon: number, asOf: number = this.lastSeason): CompOutcome {
    const from = season + 1;
    const to = season + horizon;
    const seen = Math.min(to, asOf);
    const list = (kind === 'hitter' ? this.batting : this.pitching).get(player) ?? [];
    const minSample = kind === 'hitter' ? OUTLOOK_CONSTANTS.minPaForPeak : OUTLOOK_CONSTANTS.minOutsForPeak;
    const better = (a: number, b: number): boolean => (kind === 'hitter' ? a > b : a < b);
    let first: number | null = null;
    let seasons = 0;
    let peak = NaN;
    let peakSeason: number | null = null;
    for (const s of list) {
      // his first top-level season is his first ever (up to what is seen), even before the window: a
      // comp already at the top level in his comp season did not arrive the season after it
      if (first === null && s.appeared && s.season <= seen) first = s.season;
      if (s.season < from || s.season > seen || !s.appeared) continue;
      seasons++;
      if (s.sample >= minSample && !Number.isNaN(s.value) && (Number.isNaN(peak) || better(s.value, peak))) {
        peak = s.value;
        peakSeason = s.season;
      }
    }
    const base = {
      window: [from, to] as const,
      seasons_observed: Math.max(0, seen - from + 1),
      censored: to > asOf,
      reached_top_level: seasons > 0,
      first_top_level_season: first,
      top_level_seasons: seasons,
      peak_season: peakSeason,
    };
    const value = Number.isNaN(peak) ? null : peak;
    return kind === 'hitter' ? { kind, ...base, peak_ops_plus: value } : { kind, ...base, peak_fip_minus: value };
  }
}

/** The peak value of an outcome whatever its kind (null when no season qualified). */
export function peakOf(o: CompOutcome): number | null {
  return o.kind === 'hitter' ? o.peak_ops_plus : o.peak_fip_minus;
}
