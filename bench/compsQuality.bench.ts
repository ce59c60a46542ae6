/**
 * Comp quality of the weightings on the standard varied simulated leagues (bench/leagues.ts: seeds,
 * sizes, level counts, promotion rates, noise, era drift): plain z-scores, the reliability and redundancy weighting over the
 * whole group, the default (skill-family shares, the same weighting within each family), and, for
 * reference, the bat preset (results for pitchers).
 * Truth is scored twice: on every talent the group's data can show, and on production talents alone
 * (the bat for hitters, results for pitchers).
 * `node --import tsx bench/compsQuality.bench.ts [playerSeasons] [leagues]`.
 * Prints the mean ratio (top-10 comps' true-talent distance / the 10 truly nearest players'; 1.0 is
 * perfect, lower is better) per league, then the mean and spread (sd) over the leagues.
 */
import { aim } from './lib/aim.ts';
import { benchLeagues, withBenchLeague } from './leagues.ts';
import type { ProfileStore } from '../src/store/ProfileStore.ts';
import { DEFAULT_COMPS_OPTIONS, type CompsOptions } from '../src/query/findComps.ts';
import { redundancyWeights } from '../src/profiles/redundancyWeights.ts';
import { compsQuality } from './lib/compsQuality.ts';
import type { PositionGroup } from '../src/profiles/positionGroup.ts';

const GROUPS: PositionGroup[] = ['C', 'IF', 'OF', 'SP', 'RP'];
const SCHEMES = ['plain', 'whole-group', 'families', 'bat-preset'] as const;
type Scheme = (typeof SCHEMES)[number];

/** Per-dimension multipliers that turn the stored default weights into those of `scheme`. */
function schemeOptions(store: ProfileStore, group: PositionGroup, scheme: Scheme): CompsOptions {
  const exact = { ...DEFAULT_COMPS_OPTIONS, exact: true };
  if (scheme === 'plain') return { ...exact, weighting: 'plain' };
  if (scheme === 'families') return exact;
  if (scheme === 'bat-preset') return { ...exact, preset: group === 'SP' || group === 'RP' ? 'results' : 'bat' };
  const g = store.groups.get(group);
  if (!g) return exact;
  const whole = redundancyWeights(Float64Array.from(g.z), g.n, g.d, Float64Array.from(g.reliability));
  const total = whole.reduce((a, b) => a + b, 0);
  const overrides = new Map(g.dims.map((d, j) => [d.name, (whole[j] as number) / total / Math.max(1e-12, g.redundancy[j] as number)]));
  return { ...exact, weightOverrides: overrides };
}

interface Row {
  readonly league: string;
  readonly level: string;
  readonly talents: 'all' | 'production';
  readonly group: PositionGroup;
  readonly ratios: ReadonlyMap<Scheme, number>;
}

export async function runCompsQuality(playerSeasons: number, leagueCount = 4): Promise<string[]> {
  const rows: Row[] = [];
  for (const spec of benchLeagues(playerSeasons).slice(0, leagueCount)) {
    await withBenchLeague(spec, async ({ league, store }) => {
      const top = store.levels[store.levels.length - 1] ?? '';
      const mid = store.levels[store.levels.length - 3] ?? '';
      for (const level of [mid, top]) {
        for (const talents of ['all', 'production'] as const) {
          for (const group of GROUPS) {
            const ratios = new Map<Scheme, number>();
            for (const scheme of SCHEMES) {
              const r = compsQuality(store, league.truth, {
                groups: [group], level, targetsPerGroup: 40, k: 10, seed: spec.options.seed, talents, compsOptions: schemeOptions(store, group, scheme),
              });
              ratios.set(scheme, r.ratio);
            }
            if (SCHEMES.every((s) => Number.isFinite(ratios.get(s) ?? NaN))) rows.push({ league: spec.name, level, talents, group, ratios });
          }
        }
      }
    });
  }
  const lines: string[] = [];
  lines.push(`comps quality, ${playerSeasons.toLocaleString('en-US')} simulated player-seasons per league (ratio to the ideal; 1.00 is perfect, lower is better)`);
  lines.push('per league (mean over two levels, the top and two below it, and the groups):');
  lines.push(`${'league'.padEnd(32)} truth       ${SCHEMES.map((s) => s.padStart(12)).join('')}`);
  const mean = (xs: readonly number[]): number => xs.reduce((a, b) => a + b, 0) / xs.length;
  const sd = (xs: readonly number[]): number => Math.sqrt(xs.reduce((a, x) => a + (x - mean(xs)) ** 2, 0) / Math.max(1, xs.length - 1));
  const leagueNames = [...new Set(rows.map((r) => r.league))];
  const perLeague = new Map<string, number[]>();
  for (const league of leagueNames) {
    for (const talents of ['all', 'production'] as const) {
      const sel = rows.filter((r) => r.league === league && r.talents === talents);
      const m = SCHEMES.map((s) => mean(sel.map((r) => (r.ratios.get(s) ?? NaN))));
      SCHEMES.forEach((s, i) => perLeague.set(`${talents}|${s}`, [...(perLeague.get(`${talents}|${s}`) ?? []), m[i] as number]));
      lines.push(`${league.padEnd(32)} ${talents.padEnd(11)} ${m.map((x) => x.toFixed(3).padStart(12)).join('')}`);
    }
  }
  lines.push('', `over ${leagueNames.length} leagues: mean (sd); wins = leagues where the scheme has the lowest ratio (of all four)`);
  for (const talents of ['all', 'production'] as const) {
    const cells = SCHEMES.map((s) => {
      const xs = perLeague.get(`${talents}|${s}`) ?? [];
      const wins = leagueNames.filter((_, i) => SCHEMES.every((o) => (perLeague.get(`${talents}|${o}`)?.[i] ?? Infinity) >= (xs[i] ?? Infinity))).length;
      return `${s} ${mean(xs).toFixed(3)} (${sd(xs).toFixed(3)}) wins ${wins}`;
    });
    lines.push(`${talents.padEnd(11)} ${cells.join(' | ')}`);
  }
  // The README's claims for the default (skill families): better than plain z-scores on both truths in
  // every league, and better than the whole-group weighting on production in every league.
  const beats = (talents: 'all' | 'production', other: Scheme): number =>
    leagueNames.filter((_, i) => (perLeague.get(`${talents}|families`)?.[i] ?? Infinity) < (perLeague.get(`${talents}|${other}`)?.[i] ?? -Infinity)).length;
  const everyLeague = { atLeast: leagueNames.length, unit: 'leagues' } as const;
  lines.push('', 'aims for the default (skill families), in leagues won:');
  lines.push(`  beats plain z-scores, all talents: ${beats('all', 'plain')} ${aim('quality: families beat plain z-scores on all talents', beats('all', 'plain'), everyLeague)}`);
  lines.push(`  beats plain z-scores, production: ${beats('production', 'plain')} ${aim('quality: families beat plain z-scores on production', beats('production', 'plain'), everyLeague)}`);
  lines.push(`  beats the whole-group weighting, production: ${beats('production', 'whole-group')} ${aim('quality: families beat the whole-group weighting on production', beats('production', 'whole-group'), everyLeague)}`);
  lines.push('', 'per group over leagues and levels, mean:');
  for (const talents of ['all', 'production'] as const) {
    const cells = GROUPS.map((grp) => {
      const sel = rows.filter((r) => r.group === grp && r.talents === talents);
      return `${grp} ${SCHEMES.map((s) => mean(sel.map((r) => (r.ratios.get(s) ?? NaN))).toFixed(2)).join('/')}`;
    });
    lines.push(`${talents.padEnd(11)} ${cells.join('  ')}   (${SCHEMES.join('/')})`);
  }
  return lines;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const n = Number(process.argv[2] ?? 30000);
  const count = Number(process.argv[3] ?? 4);
  for (const line of await runCompsQuality(n, count)) console.log(line);
}
