/**
 * Comp quality of three weightings on several simulated leagues (different seeds, sizes, pitcher
 * shares and tracking coverage): plain z-scores, the reliability and redundancy weighting over the
 * whole group, the default (skill-family shares, the same weighting within each family), and, for
 * reference, the bat preset (results for pitchers).
 * Truth is scored twice: on every talent the group's data can show, and on production talents alone
 * (the bat for hitters, results for pitchers).
 * `node --import tsx bench/compsQuality.bench.ts [playerSeasons] [leagues]`.
 * Prints the mean ratio (top-10 comps' true-talent distance / the 10 truly nearest players'; 1.0 is
 * perfect, lower is better) per league, then the mean and spread (sd) over the leagues.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { simulateLeague } from '../src/sim/simulateLeague.ts';
import type { SimOptions } from '../src/sim/simTypes.ts';
import { writeLeagueCsv } from '../src/sim/writeLeagueCsv.ts';
import { buildStore } from '../src/build/buildStore.ts';
import { loadProfileStore } from '../src/query/loadProfileStore.ts';
import type { ProfileStore } from '../src/query/ProfileStore.ts';
import { DEFAULT_COMPS_OPTIONS, type CompsOptions } from '../src/query/findComps.ts';
import { redundancyWeights } from '../src/profiles/redundancyWeights.ts';
import { compsQuality } from './lib/compsQuality.ts';
import type { PositionGroup } from '../src/profiles/positionGroup.ts';

const GROUPS: PositionGroup[] = ['C', 'IF', 'OF', 'SP', 'RP'];
const SCHEMES = ['plain', 'whole-group', 'families', 'bat-preset'] as const;
type Scheme = (typeof SCHEMES)[number];

/** The leagues: each differs from the first in one or two parameters. */
function leagues(playerSeasons: number): { label: string; options: SimOptions }[] {
  const base = { firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: playerSeasons };
  return [
    { label: 'seed 7', options: { ...base, seed: 7 } },
    { label: 'seed 11, 1.5x size', options: { ...base, seed: 11, targetPlayerSeasons: Math.round(playerSeasons * 1.5) } },
    { label: 'seed 23, pitchers 50%', options: { ...base, seed: 23, pitcherShare: 0.5 } },
    { label: 'seed 31, tracked from A+', options: { ...base, seed: 31, trackedFromLevel: 'A+' } },
    { label: 'seed 47, 0.6x size, 16 seasons', options: { ...base, seed: 47, firstSeason: 2011, targetPlayerSeasons: Math.round(playerSeasons * 0.6) } },
  ];
}

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
  readonly ratios: Record<Scheme, number>;
}

export async function runCompsQuality(playerSeasons: number, leagueCount = 5): Promise<string[]> {
  const rows: Row[] = [];
  for (const { label, options } of leagues(playerSeasons).slice(0, leagueCount)) {
    const dir = await mkdtemp(join(tmpdir(), 'kindred-quality-'));
    try {
      const league = simulateLeague(options);
      await writeLeagueCsv(league, join(dir, 'roster'));
      await buildStore(join(dir, 'roster'), join(dir, 'store'), { lenient: false });
      const store = await loadProfileStore(join(dir, 'store'));
      const top = store.levels[store.levels.length - 1] ?? '';
      const mid = store.levels[store.levels.length - 3] ?? '';
      for (const level of [mid, top]) {
        for (const talents of ['all', 'production'] as const) {
          for (const group of GROUPS) {
            const ratios = {} as Record<Scheme, number>;
            for (const scheme of SCHEMES) {
              const r = compsQuality(store, league.truth, {
                groups: [group], level, targetsPerGroup: 40, k: 10, seed: options.seed, talents, compsOptions: schemeOptions(store, group, scheme),
              });
              ratios[scheme] = r.ratio;
            }
            if (SCHEMES.every((s) => Number.isFinite(ratios[s]))) rows.push({ league: label, level, talents, group, ratios });
          }
        }
      }
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  }
  const lines: string[] = [];
  lines.push(`comps quality, ${playerSeasons.toLocaleString('en-US')} simulated player-seasons per league (ratio to the ideal; 1.00 is perfect, lower is better)`);
  lines.push('per league (mean over levels and groups):');
  lines.push(`${'league'.padEnd(32)} truth       ${SCHEMES.map((s) => s.padStart(12)).join('')}`);
  const mean = (xs: readonly number[]): number => xs.reduce((a, b) => a + b, 0) / xs.length;
  const sd = (xs: readonly number[]): number => Math.sqrt(xs.reduce((a, x) => a + (x - mean(xs)) ** 2, 0) / Math.max(1, xs.length - 1));
  const leagueNames = [...new Set(rows.map((r) => r.league))];
  const perLeague = new Map<string, number[]>();
  for (const league of leagueNames) {
    for (const talents of ['all', 'production'] as const) {
      const sel = rows.filter((r) => r.league === league && r.talents === talents);
      const m = SCHEMES.map((s) => mean(sel.map((r) => r.ratios[s])));
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
  lines.push('', 'per group over leagues and levels, mean:');
  for (const talents of ['all', 'production'] as const) {
    const cells = GROUPS.map((grp) => {
      const sel = rows.filter((r) => r.group === grp && r.talents === talents);
      return `${grp} ${SCHEMES.map((s) => mean(sel.map((r) => r.ratios[s])).toFixed(2)).join('/')}`;
    });
    lines.push(`${talents.padEnd(11)} ${cells.join('  ')}   (${SCHEMES.join('/')})`);
  }
  return lines;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const n = Number(process.argv[2] ?? 30000);
  const count = Number(process.argv[3] ?? 5);
  for (const line of await runCompsQuality(n, count)) console.log(line);
}
