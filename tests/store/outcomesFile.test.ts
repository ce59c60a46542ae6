import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readRoster } from '../../src/ingest/readRoster.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import { computeOutcomes } from '../../src/outlook/computeOutcomes.ts';
import { decodeOutcomesFile } from '../../src/store/outcomesFile.ts';
import { OUTCOMES_FILE } from '../../src/store/storeFileNames.ts';
import { openStore } from '../../src/store/openStore.ts';
import { writeStore } from '../../src/store/writeStore.ts';
import { StoreError } from '../../src/errors/KindredError.ts';
import { buildSimStore, type SimStore } from '../outlook/simStore.ts';

let sim: SimStore;
let scratch: string;
beforeAll(async () => {
  sim = await buildSimStore({ seed: 99, firstSeason: 2010, lastSeason: 2020, targetPlayerSeasons: 2500 });
  scratch = await mkdtemp(join(tmpdir(), 'kindred-outcomes-'));
});
afterAll(async () => {
  await sim.remove();
  await rm(scratch, { recursive: true, force: true });
});

describe('outcomes.json through openProfileStore(dir).outcomes()', () => {
  it('reads back what the build computed from the roster', async () => {
    const store = await openProfileStore(sim.storeDir);
    const outcomes = store.outcomes();
    const file = computeOutcomes(await readRoster(sim.rosterDir));
    expect(outcomes.lastSeason).toBe(file.last_season);
    expect(outcomes.topLevel).toBe('Top');
    expect(outcomes.league.size).toBe(file.league.length);
    const [id, season] = file.batting[0] ?? ['', 0];
    const o = outcomes.futureOf(store.playerById.get(id) as number, 'hitter', season - 1, 1);
    expect(o.reached_top_level).toBe(true);
    expect(o.first_top_level_season).toBe(season);
  });

  it('asks for a rebuild when the store has no outcomes.json', async () => {
    const opened = await openStore(sim.storeDir);
    const files = new Map<string, Uint8Array>();
    for (const name of Object.keys(opened.manifest.files)) if (name !== OUTCOMES_FILE) files.set(name, await opened.readBytes(name));
    const old = join(scratch, 'old-store');
    await writeStore(old, { params: opened.manifest.params, files });
    const store = await openProfileStore(old);
    expect(() => store.outcomes()).toThrow(expect.objectContaining({ code: 'kindred.store.missing' }));
  });

  it('refuses another format or version, and content of the wrong shape', () => {
    expect(() => decodeOutcomesFile(JSON.stringify({ format: 'kindred-outcomes', version: 99 }), 'x')).toThrow(StoreError);
    expect(() => decodeOutcomesFile('{', 'x')).toThrow(/not valid JSON/);
    expect(() => decodeOutcomesFile(JSON.stringify({ format: 'kindred-outcomes', version: 1, top_level: 'Top' }), 'x')).toThrow(/unexpected content/);
  });
});
