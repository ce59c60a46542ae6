import { readFile, rm } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { DEMO_OPTIONS } from '../../src/sim/demoOptions.ts';
import { smallLeague, writeToTemp } from './smallLeague.ts';

const demoDir = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'demo-roster');
const FILES = ['levels.csv', 'players.csv', 'batting.csv', 'fielding.csv', 'pitching.csv', 'contracts.csv'];

describe('DEMO_OPTIONS', () => {
  it('regenerates the committed demo-roster/ byte for byte (run src/sim/writeDemoRoster.ts after changing the model)', async () => {
    const { dir, files } = await writeToTemp(smallLeague(DEMO_OPTIONS));
    try {
      for (const f of FILES) {
        const fresh = await readFile(join(dir, f), 'utf8');
        const committed = await readFile(join(demoDir, f), 'utf8');
        expect(fresh === committed, `${f} differs from demo-roster/${f}`).toBe(true);
      }
      // Modest size: 2,000 to 3,000 players and 10,000 to 15,000 batting rows.
      expect(files['players.csv']).toBeGreaterThanOrEqual(2000);
      expect(files['players.csv']).toBeLessThanOrEqual(3000);
      expect(files['batting.csv']).toBeGreaterThanOrEqual(10000);
      expect(files['batting.csv']).toBeLessThanOrEqual(15000);
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });
});
