/**
 * The effect of the default pool rules on comp quality, on the standard varied simulated leagues
 * (bench/leagues.ts). For sampled targets at two levels (the top and two below it) in each group, the
 * comps of each pool are scored against the simulator's true talents:
 *   ratio = mean true-talent distance to the top-10 comps / mean distance to the 10 truly nearest
 *           other players (each at his nearest season) among the group's seasons at levels within
 *           one of the target's, any position and any playing time (1.00 is perfect; lower is better).
 * Talents are standardised over the whole group (so that comps from other levels are measured alike);
 * talents a group's data cannot show are left out (as in bench/lib/compsQuality.ts).
 * Pools: `group` (the old default: the whole position group), `level` (the target's level only),
 * `default` (poolRules with DEFAULT_REACH: his position, levels within one, half his PA or BF) and
 * `adjacent` (the default with the adjacent positions).
 * Also printed: the share of comps at the target's position and with at least half his playing time.
 * `node --import tsx bench/poolQuality.bench.ts [playerSeasons] [leagues] [targetsPerGroup]`.
 */
import { benchLeagues, withBenchLeague } from './leagues.ts';
import type { ProfileStore, StoredGroup } from '../src/store/ProfileStore.ts';
import type { SimTruth } from '../src/sim/SimTruth.ts';
import { DEFAULT_COMPS_OPTIONS } from '../src/query/findComps.ts';
import { playerTarget } from '../src/query/playerTarget.ts';
import { DEFAULT_REACH, poolRules } from '../src/query/poolDefaults.ts';
import type { PoolFilter } from '../src/query/PoolFilter.ts';
import type { Target } from '../src/query/Target.ts';
import type { PositionGroup } from '../src/profiles/positionGroup.ts';
import { compRowsOrNone, groupTalents, sampleStream } from './lib/compsQuality.ts';

const GROUPS: PositionGroup[] = ['C', 'IF', 'OF', 'SP', 'RP'];
const POOLS = ['group', 'level', 'default', 'adjacent'] as const;
type Pool = (typeof POOLS)[number];
const K = 10;


function poolFilter(store: ProfileStore, g: StoredGroup, target: Target, pool: Pool): PoolFilter {
  if (pool === 'group') return {};
  if (pool === 'level') return { levels: [target.level ?? ''] };
  const rules = poolRules(store, g, target, { ...DEFAULT_REACH, adjacent: pool === 'adjacent' });
  return {
    ...(rules.positions ? { positions: rules.positions } : {}),
    ...(rules.levels ? { levels: rules.levels } : {}),
    ...(rules.minSample !== undefined ? { minSample: rules.minSample } : {}),
  };
}

interface Score {
  ratio: number;
  samePosition: number;
  enoughTime: number;
  comps: number;
}


function scoreGroup(store: ProfileStore, g: StoredGroup, truth: SimTruth, level: number, targetsPerGroup: number, seed: number): Map<Pool, Score[]> {
  const out = new Map<Pool, Score[]>(POOLS.map((p) => [p, []]));
  const { talents, t } = groupTalents(store, g, truth);
  if (t === 0) return out;
  const dist = (a: number, b: number): number => {
    let s = 0;
    for (let j = 0; j < t; j++) s += ((talents[a * t + j] as number) - (talents[b * t + j] as number)) ** 2;
    return Math.sqrt(s);
  };
  const candidates: number[] = [];
  for (let i = 0; i < g.n; i++) if (g.level[i] === level && !Number.isNaN(talents[i * t] as number)) candidates.push(i);
  const next = sampleStream(seed);
  let done = 0;
  for (let attempt = 0; attempt < targetsPerGroup * 3 && done < targetsPerGroup && candidates.length > 4 * K; attempt++) {
    const row = candidates[Math.floor(next() * candidates.length)] as number;
    const target = playerTarget(store, { group: g.group, row });
    // the ideal: the K truly nearest other players at levels within one, any position, any playing time
    const best = new Map<number, number>();
    for (let r = 0; r < g.n; r++) {
      const p = g.player[r] as number;
      if (p === target.player || Math.abs((g.level[r] as number) - level) > 1 || Number.isNaN(talents[r * t] as number)) continue;
      const d = dist(row, r);
      const prev = best.get(p);
      if (prev === undefined || d < prev) best.set(p, d);
    }
    const nearest = [...best.values()].sort((a, b) => a - b).slice(0, K);
    const ideal = nearest.reduce((a, b) => a + b, 0) / nearest.length;
    if (!(ideal > 0) || nearest.length < K) continue;
    const scores = new Map<Pool, Score>();
    for (const pool of POOLS) {
      const rows = compRowsOrNone(store, target, { ...DEFAULT_COMPS_OPTIONS, exact: true, k: K, filter: poolFilter(store, g, target, pool) });
      if (rows === null) break;
      const known = rows.filter((r) => !Number.isNaN(talents[r * t] as number));
      if (known.length < K) break;
      const targetSample = g.sample[row] as number;
      scores.set(pool, {
        ratio: known.reduce((a, r) => a + dist(row, r), 0) / known.length / ideal,
        samePosition: known.filter((r) => g.position[r] === target.position).length / known.length,
        enoughTime: known.filter((r) => (g.sample[r] as number) * 2 >= targetSample).length / known.length,
        comps: known.length,
      });
    }
    if (scores.size < POOLS.length) continue;
    for (const [pool, s] of scores) out.get(pool)?.push(s);
    done++;
  }
  return out;
}

const mean = (xs: readonly number[]): number => xs.reduce((a, b) => a + b, 0) / xs.length;
const sd = (xs: readonly number[]): number => Math.sqrt(xs.reduce((a, x) => a + (x - mean(xs)) ** 2, 0) / Math.max(1, xs.length - 1));

export async function runPoolQuality(playerSeasons: number, leagueCount = 4, targetsPerGroup = 30): Promise<string[]> {
  const lines: string[] = [];
  lines.push(`pool rules and comp quality, ${playerSeasons.toLocaleString('en-US')} simulated player-seasons per league, ${targetsPerGroup} targets per group and level`);
  lines.push('ratio to the ideal (10 truly nearest at levels within one; 1.00 perfect, lower better); pos: comps at his position; time: comps with half his PA/BF or more');
  lines.push(`${'league'.padEnd(10)} ${POOLS.map((p) => `${p} ratio/pos/time`.padStart(24)).join('')}`);
  const perLeague = new Map<Pool, number[]>(POOLS.map((p) => [p, []]));
  const perGroup = new Map<string, number[]>();
  for (const spec of benchLeagues(playerSeasons).slice(0, leagueCount)) {
    await withBenchLeague(spec, async ({ league, store }) => {
      const all = new Map<Pool, Score[]>(POOLS.map((p) => [p, []]));
      const top = store.levels.length - 1;
      for (const level of [top - 2, top]) {
        for (const group of GROUPS) {
          const g = store.groups.get(group);
          if (!g) continue;
          const s = scoreGroup(store, g, league.truth, level, targetsPerGroup, spec.options.seed);
          for (const p of POOLS) {
            all.get(p)?.push(...(s.get(p) ?? []));
            const key = `${group}|${p}`;
            perGroup.set(key, [...(perGroup.get(key) ?? []), ...(s.get(p) ?? []).map((x) => x.ratio)]);
          }
        }
      }
      const cells = POOLS.map((p) => {
        const xs = all.get(p) ?? [];
        perLeague.get(p)?.push(mean(xs.map((x) => x.ratio)));
        return `${mean(xs.map((x) => x.ratio)).toFixed(3)}/${mean(xs.map((x) => x.samePosition)).toFixed(2)}/${mean(xs.map((x) => x.enoughTime)).toFixed(2)}`.padStart(24);
      });
      lines.push(`${spec.name.padEnd(10)} ${cells.join('')}   (${(all.get('default') ?? []).length} targets)`);
    });
  }
  const names = POOLS.map((p) => perLeague.get(p) ?? []);
  const leagues = names[0]?.length ?? 0;
  lines.push('', `over ${leagues} leagues, ratio mean (sd); wins = leagues where the pool has the lowest ratio`);
  lines.push(
    POOLS.map((p, i) => {
      const xs = names[i] ?? [];
      const wins = xs.filter((x, l) => names.every((o) => (o[l] ?? Infinity) >= x)).length;
      return `${p} ${mean(xs).toFixed(3)} (${sd(xs).toFixed(3)}) wins ${wins}`;
    }).join(' | '),
  );
  lines.push('per group over leagues and levels, mean ratio (' + POOLS.join('/') + '):');
  const groupCell = (xs: readonly number[]): string => (xs.length === 0 ? 'no targets' : mean(xs).toFixed(2));
  lines.push(GROUPS.map((grp) => `${grp} ${POOLS.map((p) => groupCell(perGroup.get(`${grp}|${p}`) ?? [])).join('/')}`).join('  '));
  return lines;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const n = Number(process.argv[2] ?? 30000);
  const count = Number(process.argv[3] ?? 4);
  const targets = Number(process.argv[4] ?? 30);
  for (const line of await runPoolQuality(n, count, targets)) console.log(line);
}
