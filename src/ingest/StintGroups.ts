import type { RowReader } from './RowReader.ts';

/**
 * Who a stint row belongs to: the season key (player, season, level, and a further `part` such as the
 * position; `part: null` when that part could not be read) and the team that tells stints apart.
 */
export interface StintKey {
  readonly playerId: string;
  readonly season: number;
  readonly level: string;
  readonly team: string | undefined;
  readonly part?: string | null;
}

/**
 * The stints of each player-season key, in file order, with the line of each.
 * Finds same-key duplicates (same season key and the same `sub` key, e.g.
 * the team) and names both lines, also when the earlier row was rejected.
 * Most keys have one stint, so a group holds its first stint inline.
 */
export class StintGroups<S> {
  private readonly groups = new Map<string, Group<S>>();
  private readonly rejected = new Map<string, number>();
  /** The key and group of the last checkDuplicate, so add() on the same row looks up once. */
  private lastKey: string | undefined;
  private lastGroup: Group<S> | undefined;

  constructor(private readonly describe: string) {}

  /** Reports a duplicate of `key` + `sub` on the row (nothing else is recorded). */
  checkDuplicate(row: RowReader, key: string, sub: string, shown: string): void {
    const group = this.groups.get(key);
    this.lastKey = key;
    this.lastGroup = group;
    let first: number | undefined;
    if (group !== undefined) {
      if (group.firstSub === sub) first = group.firstLine;
      else if (group.more !== undefined) {
        const i = group.more.findIndex((m) => m.sub === sub);
        if (i >= 0) first = group.more[i]?.line;
      }
    }
    if (first === undefined && this.rejected.size > 0) first = this.rejected.get(`${key}\u0000${sub}`);
    if (first === undefined) return;
    row.report('kindred.input.duplicateKey', undefined, shown,
      `one row per ${this.describe} (line ${first} has the same key; this is line ${row.line})`);
  }

  /**
   * Checks a stint row's key for a duplicate, then settles the row (`settle` reports its issues).
   * Returns the season key when the row is clean; null when it is left out, its key remembered so a
   * later duplicate still names its line. A key that could not be read is not checked.
   */
  settleRow(row: RowReader, k: StintKey, settle: () => boolean): string | null {
    const keyed = k.playerId !== '' && !Number.isNaN(k.season) && k.level !== '' && k.part !== null;
    const key = k.part === undefined || k.part === null
      ? `${k.playerId}\u0000${k.season}\u0000${k.level}`
      : `${k.playerId}\u0000${k.season}\u0000${k.level}\u0000${k.part}`;
    const sub = k.team ?? '';
    if (keyed) {
      const shown = `${k.playerId} ${k.season} ${k.level} ${k.team ?? '(no team)'}${k.part ? ` ${k.part}` : ''}`;
      this.checkDuplicate(row, key, sub, shown);
    }
    if (settle()) return key;
    if (keyed) this.rejectedRow(key, sub, row.line);
    return null;
  }

  /** Remembers a rejected row's key so a later row with the same key is still reported. */
  rejectedRow(key: string, sub: string, line: number): void {
    const full = `${key}\u0000${sub}`;
    if (!this.rejected.has(full)) this.rejected.set(full, line);
  }

  /** Adds a clean stint under its key; `sub` is what tells it from the key's other stints (the team). */
  add(key: string, stint: S, line: number, sub: string): void {
    const group = key === this.lastKey ? this.lastGroup : this.groups.get(key);
    this.lastKey = undefined;
    this.lastGroup = undefined;
    if (group === undefined) {
      this.groups.set(key, { first: stint, firstLine: line, firstSub: sub, more: undefined });
    } else if (group.more === undefined) {
      group.more = [{ stint, line, sub }];
    } else {
      group.more.push({ stint, line, sub });
    }
  }

  /** One value per key: the stint itself when alone, else `combine` of all stints in file order. */
  collect<T>(single: (s: S) => T, combine: (stints: readonly S[]) => T): T[] {
    const out: T[] = [];
    for (const group of this.groups.values()) {
      out.push(group.more === undefined ? single(group.first) : combine([group.first, ...group.more.map((m) => m.stint)]));
    }
    return out;
  }
}

interface Group<S> {
  readonly first: S;
  readonly firstLine: number;
  readonly firstSub: string;
  more: { readonly stint: S; readonly line: number; readonly sub: string }[] | undefined;
}
