
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildStore } from '../../src/pipeline/buildStore.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import { DEMO_ROSTER } from '../../src/cli/commands/demoCommand.ts';
import { DEFAULT_STANDARDISE } from '../../src/profiles/standardiseByStratum.ts';
import { scratchDir } from '../helpers/scratchDir.ts';

describe('buildStore(roster, store, options)', () => {
  it('writes a loadable store even when high sample minimums leave strata with a single player', async () => {
    const dir = await scratchDir('kindred-build-store-');
    const summary = await buildStore(DEMO_ROSTER, join(dir, 'store'), {
      lenient: false,
      profile: { minimums: { minPa: 400, minBf: 400 }, standardise: DEFAULT_STANDARDISE },
    });
    expect(summary.skipped.hittersBelowMinimum).toBeGreaterThan(0);
    const store = await openProfileStore(join(dir, 'store'));
    for (const g of store.groups.values()) {
      for (const strata of g.strata.values()) for (const s of strata.values()) expect(Number.isFinite(s.sd)).toBe(true);
    }
  });
});
