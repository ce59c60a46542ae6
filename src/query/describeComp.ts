import { round } from '../stats/round.ts';
import type { AttributedComp } from './AttributedComp.ts';
import { attributeEmbedded } from './attributeEmbedded.ts';
import { explainComp } from './explainComp.ts';
import { explainEmbeddedComp } from './explainEmbeddedComp.ts';
import { likeness } from './likeness.ts';
import type { PreparedQuery } from './prepareQuery.ts';
import type { QuerySpace } from './QuerySpace.ts';
import type { ScoredRow } from './scoreRow.ts';
import type { Comp } from './CompsResult.ts';
import { valueAt } from './valueAt.ts';
import { formatThirds } from '../text/formatThirds.ts';
import type { StoredGroup } from '../store/ProfileStore.ts';

export interface DescribeSettings {
  /** The learned space the row was ranked in (null: the input space). */
  readonly space: QuerySpace;
  /** Attribute a learned-space distance to the dimensions. */
  readonly attributions: boolean;
  /** Total weight likeness is scaled by (default: the target's weight, or the learned space's pair scale). */
  readonly likenessWeight?: number;
}

/**
 * A scored row as the comps list shows it: who and when, likeness, distance and coverage, and the
 * per-dimension breakdown with alike and apart (explainComp; in a learned space with each dimension's
 * Shapley attribution, explainEmbeddedComp).
 */
export function describeComp(q: PreparedQuery, s: ScoredRow, rank: number, settings: DescribeSettings): Comp {
  const { store, group: g, target } = q;
  const emb = settings.space?.embedding;
  const inputEx = explainComp(g.dims, q.weights, target.z, target.raw, g.z, g.raw, s.row * g.d);
  const attribution =
    emb && settings.attributions
      ? attributeEmbedded(emb.encode, target.z, Float64Array.from(g.z.subarray(s.row * g.d, (s.row + 1) * g.d)), s.row + 1)
      : null;
  const ex = emb && attribution ? explainEmbeddedComp(inputEx, attribution, emb.drivers, g.dims) : inputEx;
  const player = store.players[valueAt(g.player, s.row)];
  const distance = Math.sqrt(s.d2);
  const age = valueAt(g.age, s.row);
  const comp: Comp = {
    rank,
    player_id: player?.playerId ?? '',
    name: player?.name ?? '',
    season: valueAt(g.season, s.row),
    ...(g.window ? { seasons: [valueAt(g.window.first, s.row), valueAt(g.season, s.row)] as const } : {}),
    level: store.levels[valueAt(g.level, s.row)] ?? '',
    position: g.position[s.row] ?? 'DH',
    age: Number.isNaN(age) ? null : age,
    sample: valueAt(g.sample, s.row),
    sample_unit: g.group === 'SP' || g.group === 'RP' ? 'BF' : 'PA',
    ip: inningsOf(g, s.row),
    likeness: round(likeness(distance, settings.likenessWeight ?? (emb ? emb.pairScale : q.targetWeight)), 1),
    distance: round(distance, 4),
    coverage: round(s.coverage, 3),
    dimensions: ex.dimensions,
    alike: ex.alike,
    apart: ex.apart,
  };
  if (!attribution) return comp;
  const attributed: AttributedComp = {
    ...comp,
    attribution_total: attribution.total,
    attribution_method: attribution.method,
    attribution_error: attribution.standardError.reduce((a, b) => Math.max(a, b), 0),
  };
  return attributed;
}

/** A row's innings pitched in thirds notation, or null for a hitter row. */
export function inningsOf(g: StoredGroup, row: number): string | null {
  const outs = g.outs[row] ?? NaN;
  return Number.isNaN(outs) ? null : formatThirds(outs);
}
