/**
 * Mutations of a store folder for the fuzz suite, driven by the manifest's own file list (whatever
 * files the store format has): bit flips, truncations, appended bytes, files deleted, swapped or
 * duplicated between groups and kinds, header edits and JSON edits; most with the manifest's size and
 * sha256 rewritten to match ("resealed"), so that the checks behind the checksum are what stands.
 * Each mutant says what a correct Kindred must do with it:
 * - `refuse`: the store is damaged in a way a reader can tell (a checksum no longer matches, a file is
 *   cut or extended, one file stands where another belongs): some query must exit 1 with a
 *   `kindred.store.*` error;
 * - `survive`: the damage may be invisible to the reader (a changed number, an edited name): no crash,
 *   no hang and only exit codes 0, 1 or 2, but an answer is allowed.
 */
import { copyFileSync, existsSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { SeededRandom } from '../../src/random/SeededRandom.ts';
import { MANIFEST_NAME } from '../../src/store/manifest.ts';
import { listedFiles, resealStore } from '../helpers/resealStore.ts';
import { editJson } from './jsonEdits.ts';

export interface Mutant {
  readonly what: string;
  readonly expect: 'refuse' | 'survive';
  /** Files (relative to the work folder) to put back from the base afterwards. */
  readonly changed: readonly string[];
}

/** hnswlib 0.8 header fields (hnswalg.h saveIndex): name, byte offset, width, whether any other value is damage. */
const HNSW_FIELDS: readonly { name: string; at: number; bytes: 4 | 8; strict: boolean }[] = [
  { name: 'offsetLevel0', at: 0, bytes: 8, strict: true },
  { name: 'maxElements', at: 8, bytes: 8, strict: false },
  { name: 'count', at: 16, bytes: 8, strict: true },
  { name: 'sizeDataPerElement', at: 24, bytes: 8, strict: true },
  { name: 'labelOffset', at: 32, bytes: 8, strict: true },
  { name: 'offsetData', at: 40, bytes: 8, strict: true },
  { name: 'maxLevel', at: 48, bytes: 4, strict: false },
  { name: 'entryPoint', at: 52, bytes: 4, strict: false },
  { name: 'maxM', at: 56, bytes: 8, strict: true },
  { name: 'maxM0', at: 64, bytes: 8, strict: true },
  { name: 'M', at: 72, bytes: 8, strict: true },
  { name: 'mult', at: 80, bytes: 8, strict: false },
  { name: 'efConstruction', at: 88, bytes: 8, strict: true },
];

function pick<T>(rng: SeededRandom, list: readonly T[]): T {
  return list[rng.int(list.length)] as T;
}

function flipBits(rng: SeededRandom, bytes: Buffer, count: number, within: number): number[] {
  const at: number[] = [];
  for (let i = 0; i < count; i++) {
    const offset = rng.int(Math.min(within, bytes.length));
    bytes[offset] = (bytes[offset] ?? 0) ^ (1 << rng.int(8));
    at.push(offset);
  }
  return at;
}

/** A mutator over one base store: `mutate` damages the work copy, `restore` puts it back. */
export class StoreMutator {
  readonly #base: string;
  readonly #work: string;
  readonly #listed: readonly string[];
  readonly #unlisted: readonly string[];

  /** `work` must start as a copy of `base`. */
  constructor(base: string, work: string) {
    this.#base = base;
    this.#work = work;
    this.#listed = listedFiles(base).filter((n) => statSync(join(base, n)).size > 0);
    this.#unlisted = readdirSync(base).filter((n) => n !== MANIFEST_NAME && !this.#listed.includes(n));
  }

  get listed(): readonly string[] {
    return this.#listed;
  }

  restore(mutant: Mutant): void {
    for (const name of new Set([...mutant.changed, MANIFEST_NAME])) {
      const from = join(this.#base, name);
      const to = join(this.#work, name);
      if (existsSync(from)) copyFileSync(from, to);
      else rmSync(to, { force: true });
    }
  }

  mutate(rng: SeededRandom): Mutant {
    const read = (name: string): Buffer => readFileSync(join(this.#work, name));
    const write = (name: string, bytes: Buffer | string): void => writeFileSync(join(this.#work, name), bytes);
    const reseal = (...names: string[]): void => resealStore(this.#work, names);
    const name = pick(rng, this.#listed);
    const op = rng.int(100);
    if (op < 14) {
      const bytes = read(name);
      const at = flipBits(rng, bytes, 1 + rng.int(8), bytes.length);
      write(name, bytes);
      return { what: `bits flipped in ${name} at ${at.join(',')}`, expect: 'refuse', changed: [name] };
    }
    if (op < 30) {
      const bytes = read(name);
      const at = flipBits(rng, bytes, 1 + rng.int(8), bytes.length);
      write(name, bytes);
      reseal(name);
      return { what: `bits flipped in ${name} at ${at.join(',')}, resealed`, expect: 'survive', changed: [name] };
    }
    if (op < 38) {
      const bytes = read(name);
      const at = flipBits(rng, bytes, 1 + rng.int(4), 128);
      write(name, bytes);
      reseal(name);
      return { what: `bits flipped in the first bytes of ${name} at ${at.join(',')}, resealed`, expect: 'survive', changed: [name] };
    }
    if (op < 48) {
      const bytes = read(name);
      const length = rng.chance(0.2) ? 0 : rng.int(bytes.length);
      write(name, bytes.subarray(0, length));
      const sealed = rng.chance(0.7);
      if (sealed) reseal(name);
      return { what: `${name} cut to ${length} of ${bytes.length} bytes${sealed ? ', resealed' : ''}`, expect: 'refuse', changed: [name] };
    }
    if (op < 53) {
      const bytes = read(name);
      const extra = Buffer.alloc(1 + rng.int(64));
      for (let i = 0; i < extra.length; i++) extra[i] = 1 + rng.int(255);
      if ([0x20, 0x09, 0x0a, 0x0d].includes(extra[0] ?? 0)) extra[0] = 0x41;
      write(name, Buffer.concat([bytes, extra]));
      reseal(name);
      return { what: `${extra.length} bytes appended to ${name}, resealed`, expect: 'refuse', changed: [name] };
    }
    if (op < 58) {
      rmSync(join(this.#work, name));
      return { what: `${name} deleted`, expect: 'refuse', changed: [name] };
    }
    if (op < 70) {
      const other = this.#differentFrom(rng, name);
      if (!other) return this.mutate(rng);
      const a = read(name);
      write(name, read(other));
      write(other, a);
      reseal(name, other);
      return { what: `${name} and ${other} swapped, resealed`, expect: 'refuse', changed: [name, other] };
    }
    if (op < 76) {
      const other = this.#differentFrom(rng, name);
      if (!other) return this.mutate(rng);
      write(name, read(other));
      reseal(name);
      return { what: `${other} copied over ${name}, resealed`, expect: 'refuse', changed: [name] };
    }
    if (op < 84) {
      const indexes = this.#listed.filter((n) => n.endsWith('.hnsw'));
      if (indexes.length === 0) return this.mutate(rng);
      const file = pick(rng, indexes);
      const bytes = read(file);
      const field = pick(rng, HNSW_FIELDS);
      const old = field.bytes === 8 ? bytes.readBigUInt64LE(field.at) : BigInt(bytes.readUInt32LE(field.at));
      const choices = [old + 1n, old > 0n ? old - 1n : 2n, 0n, old * 2n + 1n, BigInt(rng.nextUint32()), 2n ** 31n, 2n ** 32n - 1n];
      let value = pick(rng, choices);
      if (field.bytes === 4) value &= 0xffffffffn;
      else value &= 0xffffffffffffffffn;
      if (value === old) value = old ^ 1n;
      if (field.bytes === 8) bytes.writeBigUInt64LE(value, field.at);
      else bytes.writeUInt32LE(Number(value), field.at);
      write(file, bytes);
      reseal(file);
      return { what: `${file} header ${field.name} ${old} -> ${value}, resealed`, expect: field.strict ? 'refuse' : 'survive', changed: [file] };
    }
    if (op < 94) {
      const jsons = this.#listed.filter((n) => n.endsWith('.json'));
      const file = jsons.length > 0 ? pick(rng, jsons) : name;
      const edit = editJson(rng, read(file).toString('utf8'));
      if (!edit) return this.mutate(rng);
      write(file, edit.text);
      reseal(file);
      return { what: `${file}: ${edit.what}, resealed`, expect: 'survive', changed: [file] };
    }
    if (op < 97 || this.#unlisted.length === 0) {
      const edit = editJson(rng, read(MANIFEST_NAME).toString('utf8'));
      if (!edit) return this.mutate(rng);
      write(MANIFEST_NAME, edit.text);
      return { what: `${MANIFEST_NAME}: ${edit.what}`, expect: 'survive', changed: [] };
    }
    const file = pick(rng, this.#unlisted);
    const bytes = read(file);
    const edit = rng.chance(0.5) ? editJson(rng, bytes.toString('utf8')) : null;
    if (edit) write(file, edit.text);
    else write(file, bytes.subarray(0, rng.int(bytes.length)));
    return { what: `${file} (not in the manifest): ${edit ? edit.what : 'cut'}`, expect: 'survive', changed: [file] };
  }

  /** Another listed file whose bytes differ from `name`'s, or undefined. */
  #differentFrom(rng: SeededRandom, name: string): string | undefined {
    const mine = readFileSync(join(this.#work, name));
    const others = this.#listed.filter((n) => n !== name);
    for (let tries = 0; tries < 8 && others.length > 0; tries++) {
      const other = pick(rng, others);
      if (!readFileSync(join(this.#work, other)).equals(mine)) return other;
    }
    return undefined;
  }
}
