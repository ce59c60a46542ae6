import { mkdir, mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { stageCharts } from '../../src/pipeline/stageCharts.ts';
import { StoreError } from '../../src/errors/KindredError.ts';

let base = '';
beforeEach(async () => {
  base = await mkdtemp(join(tmpdir(), 'kindred-charts-'));
});
afterEach(async () => {
  await rm(base, { recursive: true, force: true });
});

describe('stageCharts(dir, charts)', () => {
  it('writes into a temporary folder and swaps it in on commit, replacing the old charts whole', async () => {
    const dir = join(base, 'store.charts');
    await mkdir(dir);
    await writeFile(join(dir, 'OLD-drivers.svg'), '<svg/>');
    const staged = await stageCharts(dir, new Map([['IF-drivers.svg', '<svg>new</svg>']]));
    expect(await readFile(join(dir, 'OLD-drivers.svg'), 'utf8')).toBe('<svg/>'); // untouched until commit
    await staged.commit();
    expect(await readdir(dir)).toEqual(['IF-drivers.svg']);
    expect(await readFile(join(dir, 'IF-drivers.svg'), 'utf8')).toBe('<svg>new</svg>');
    expect((await readdir(base)).sort()).toEqual(['store.charts']); // no temp or backup folder left
  });

  it('discard leaves nothing behind', async () => {
    const staged = await stageCharts(join(base, 'x.charts'), new Map([['a.svg', '<svg/>']]));
    await staged.discard();
    expect(await readdir(base)).toEqual([]);
  });

  it('with no charts removes an existing chart folder, but not a folder holding other files', async () => {
    const dir = join(base, 'store.charts');
    await mkdir(dir);
    await writeFile(join(dir, 'C-learning.svg'), '<svg/>');
    await (await stageCharts(dir, new Map())).commit();
    expect(await readdir(base)).toEqual([]);
    await mkdir(dir);
    await writeFile(join(dir, 'notes.txt'), 'mine');
    await (await stageCharts(dir, new Map())).commit();
    expect(await readdir(dir)).toEqual(['notes.txt']);
    const staged = await stageCharts(dir, new Map([['a.svg', '<svg/>']]));
    await expect(staged.commit()).rejects.toThrow(StoreError);
    expect(await readdir(dir)).toEqual(['notes.txt']);
  });
});
