/**
 * The players of a simulated league gathered column by column as their careers are simulated, then sealed
 * into `SimPlayers` with ids p000001, p000002, ... in order of entry.
 *
 * @example
 * const players = new PlayerColumns();
 * players.add(career, 'Ardo Vessin'); players.end(5, 3); players.seal().ids; // => ['p000001']
 */
import type { Bats, Throws } from '../ingest/Roster.ts';
import type { Career } from './simulateCareer.ts';
import type { SimPlayers } from './simTypes.ts';

export class PlayerColumns {
  private readonly names: string[] = [];
  private readonly birthDates: string[] = [];
  private readonly bats: Bats[] = [];
  private readonly throws: Throws[] = [];
  private readonly kind: number[] = [];
  private readonly entrySeason: number[] = [];
  private readonly entryAge: number[] = [];
  private readonly highestLevel: number[] = [];
  private readonly topLevelSeasons: number[] = [];
  private readonly active: number[] = [];
  private readonly peakValue: number[] = [];
  private readonly twins: [number, number][] = [];

  /** Players added so far (the next player's index). */
  get count(): number {
    return this.names.length;
  }

  add(career: Career, name: string): void {
    this.names.push(name);
    this.birthDates.push(career.birthDate);
    this.bats.push(career.bats);
    this.throws.push(career.throws);
    this.kind.push(career.kind === 'hitter' ? 0 : 1);
    this.entrySeason.push(career.entrySeason);
    this.entryAge.push(career.entryAge);
    this.active.push(career.active ? 1 : 0);
    this.peakValue.push(career.peakValue);
  }

  /** The last added player's whole-career summary: highest level index and top-level seasons. */
  end(highestLevel: number, topLevelSeasons: number): void {
    this.highestLevel.push(highestLevel);
    this.topLevelSeasons.push(topLevelSeasons);
  }

  /** Marks players `a` and `b` as planted twins of each other. */
  pair(a: number, b: number): void {
    this.twins.push([a, b]);
  }

  seal(): SimPlayers {
    const count = this.names.length;
    const twinOf = new Int32Array(count).fill(-1);
    for (const [a, b] of this.twins) {
      twinOf[a] = b;
      twinOf[b] = a;
    }
    const width = Math.max(6, String(count).length);
    return {
      count,
      ids: Array.from({ length: count }, (_, i) => `p${String(i + 1).padStart(width, '0')}`),
      names: this.names,
      birthDates: this.birthDates,
      bats: this.bats,
      throws: this.throws,
      kind: Uint8Array.from(this.kind),
      entrySeason: Int16Array.from(this.entrySeason),
      entryAge: Int8Array.from(this.entryAge),
      highestLevel: Int8Array.from(this.highestLevel),
      topLevelSeasons: Int16Array.from(this.topLevelSeasons),
      peakValue: Float32Array.from(this.peakValue),
      active: Uint8Array.from(this.active),
      twinOf,
    };
  }
}
