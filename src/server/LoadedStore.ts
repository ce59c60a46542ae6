import type { ProfileStore } from '../store/ProfileStore.ts';
import type { PositionGroup } from '../profiles/positionGroup.ts';
import type { TargetRow } from '../query/selectTargetRow.ts';
import { poolMap, type PoolMap } from './poolMap.ts';
import { AnswerCache } from './AnswerCache.ts';
import type { ServedStore } from './loadServedStore.ts';
import type { Outcomes } from '../outlook/Outcomes.ts';
import type { StoreError } from '../errors/KindredError.ts';
import type { BacktestFile } from '../outlook/backtestFile.ts';
import { once } from '../store/readGroup.ts';

/** A store as the server holds it: the store, when it was loaded, and what is computed from it on demand. */
export class LoadedStore {
  readonly store: ProfileStore;
  readonly #outcomes: () => Outcomes | StoreError;
  /** The store's backtest, or why there is none (prospect answers carry its calibration). */
  readonly backtest: { readonly file: BacktestFile | null; readonly reason: string | null };
  readonly loadedAt: Date;
  readonly generation: number;
  /** Serialised answers of cacheable endpoints for this store. */
  readonly answers: AnswerCache;
  readonly #maps = new Map<PositionGroup, PoolMap>();

  constructor(served: ServedStore, generation: number, cacheEntries: number, loadedAt: Date = new Date()) {
    this.store = served.store;
    const given = served.outcomes;
    this.#outcomes = typeof given === 'function' ? once(given) : () => given;
    this.backtest = served.backtest ?? { file: null, reason: 'no backtest stored with this store' };
    this.generation = generation;
    this.loadedAt = loadedAt;
    this.answers = new AnswerCache(cacheEntries);
  }

  /** The top-level outcomes, or why the store has none: read on the first call, then kept. */
  get outcomes(): Outcomes | StoreError {
    return this.#outcomes();
  }

  /** The pool map of a group, computed once per loaded store; undefined when the store lacks the group. */
  map(group: PositionGroup): PoolMap | undefined {
    const cached = this.#maps.get(group);
    if (cached) return cached;
    const g = this.store.groups.get(group);
    if (!g) return undefined;
    const m = poolMap(this.store, g);
    this.#maps.set(group, m);
    return m;
  }

  /** Every profiled row of a player (all groups), from the store's players table. */
  rowsOf(player: number): readonly TargetRow[] {
    return this.store.rowsOf(player);
  }
}

