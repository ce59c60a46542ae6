import { defaultWeights } from '../profiles/defaultWeights.ts';
import { DEFAULT_STANDARDISE, standardiseByStratum, stratumKey, type StandardiseOptions, type StratumStats } from '../profiles/standardiseByStratum.ts';
import type { PositionGroup } from '../profiles/positionGroup.ts';
import type { ProfileStore, StoredGroup } from '../store/ProfileStore.ts';

/**
 * A stored group as it would have been built at the end of `season`: only rows of that season and
 * earlier, standardised again within their strata (standardiseByStratum: thin strata borrow only the
 * seasons that existed then), and the default weights (reliability, redundancy) computed again from those
 * rows alone. Rows after the season lose their profile (NaN), so nothing later can reach a distance.
 *
 * Each row's regressed value is read back from its stored z and its stratum's mean and sd
 * (x = z sd + mean, exact up to float32 rounding). Regression toward the league of the row's own season
 * and level (measureDimensions, fixed k) uses nothing from later seasons, so it needs no replay. Not
 * replayed: a store built with fitted shrinkage (off by default) regressed with k fitted over an era
 * reaching `eraSeasons` past each season; its regressed values are taken as stored.
 * This is what keeps the rolling-origin backtest free of later rows (tests/outlook/groupAsOf.test.ts).
 */
export function groupAsOf(store: ProfileStore, g: StoredGroup, season: number, options: StandardiseOptions = standardiseOf(store)): StoredGroup {
  const { n, d } = g;
  const level = (r: number): string => store.levels[g.level[r] as number] ?? '';
  const z = new Float32Array(n * d).fill(NaN);
  const z64 = new Float64Array(n * d).fill(NaN);
  const strata = new Map<string, ReadonlyMap<string, StratumStats>>();
  const kept: number[] = [];
  for (let r = 0; r < n; r++) if ((g.season[r] as number) <= season) kept.push(r);
  g.dims.forEach((dim, j) => {
    const stored = g.strata.get(dim.name);
    const scope = (r: number): string => (dim.scope === 'group' ? g.group : (g.position[r] ?? ''));
    const values = new Float64Array(n).fill(NaN);
    for (const r of kept) {
      const v = g.z[r * d + j] as number;
      const st = stored?.get(stratumKey(g.season[r] as number, level(r), scope(r)));
      if (Number.isNaN(v) || !st) continue;
      values[r] = st.sd > 0 ? v * st.sd + st.mean : st.mean;
    }
    const fresh = standardiseByStratum(values, (r) => g.season[r] as number, (r) => `${level(r)}|${scope(r)}`, options);
    for (const r of kept) {
      const v = fresh.z[r] as number;
      z[r * d + j] = v;
      z64[r * d + j] = v;
    }
    strata.set(dim.name, fresh.strata);
  });
  // the weights from the rows known at the season, in their own order (row-major, kept rows only)
  const m = kept.length;
  const sub = new Float64Array(m * d);
  kept.forEach((r, i) => sub.set(z64.subarray(r * d, r * d + d), i * d));
  const w = defaultWeights(sub, m, d, kept.map((r) => g.player[r] as number), kept.map((r) => g.season[r] as number), g.dims.map((x) => x.family));
  return { ...g, z, strata, reliability: w.reliability, redundancy: w.redundancy };
}

/** The store with one group replaced by its view as of `season` (groupAsOf). */
export function storeAsOf(store: ProfileStore, group: PositionGroup, season: number): ProfileStore {
  const g = store.groups.get(group);
  if (!g) return store;
  const groups = new Map(store.groups);
  groups.set(group, groupAsOf(store, g, season));
  return { ...store, groups };
}

/** The standardisation the store was built with (its params), else the default. */
function standardiseOf(store: ProfileStore): StandardiseOptions {
  const profile = store.params['profile'];
  const s = typeof profile === 'object' && profile !== null && 'standardise' in profile ? profile.standardise : null;
  if (typeof s === 'object' && s !== null && 'minStratum' in s && 'maxBorrow' in s && typeof s.minStratum === 'number' && typeof s.maxBorrow === 'number') {
    return { minStratum: s.minStratum, maxBorrow: s.maxBorrow };
  }
  return DEFAULT_STANDARDISE;
}
