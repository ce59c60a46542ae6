import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildStore } from '../../src/pipeline/buildStore.ts';
import { DEMO_ROSTER } from '../../src/cli/commands/demoCommand.ts';
import { plausibleRange } from '../../src/ingest/fileColumns.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import { compsOptionsFrom } from '../../src/request/compsOptionsFrom.ts';
import { readRequest } from '../../src/request/readRequest.ts';
import { targetFrom } from '../../src/request/targetFrom.ts';

let dir: string;
let store: ProfileStore;

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'kindred-request-'));
  await buildStore(DEMO_ROSTER, join(dir, 'store'), { lenient: false });
  store = await openProfileStore(join(dir, 'store'));
});
afterAll(() => rm(dir, { recursive: true, force: true }));

const req = (text: string) => readRequest('comps', 'http', new URLSearchParams(text));

describe('compsOptionsFrom(request, store): weights', () => {
  it('takes a dimension by its label as well as its name, and both give the same weights', () => {
    const byLabel = compsOptionsFrom(req('weights=Run%20speed%3D0,OBP%3D2'), store).weightOverrides;
    const byName = compsOptionsFrom(req('weights=run_speed_ft_s%3D0,obp%3D2'), store).weightOverrides;
    expect([...byLabel].sort()).toEqual([...byName].sort());
    expect(byLabel.get('run_speed_ft_s')).toBe(0);
  });
  it('refuses one dimension given by both its name and its label', () => {
    expect(() => compsOptionsFrom(req('weights=Run%20speed%3D0,run_speed_ft_s%3D2'), store)).toThrow(/"run speed" and "run_speed_ft_s" are the same dimension \(run_speed_ft_s\); give it once/);
  });
  it('suggests near names for an unknown one', () => {
    expect(() => compsOptionsFrom(req('weights=run_sped%3D0'), store)).toThrow(/no dimension "run_sped" \(did you mean run_speed_ft_s\?\)/);
    expect(() => compsOptionsFrom(req('weights=obpp%3D2'), store)).toThrow(/did you mean obp/);
  });
});

describe('targetFrom(store, request): want', () => {
  const want = (text: string, position = 'SS') => targetFrom(store, req(`want=${encodeURIComponent(text)}&position=${position}`));
  it('accepts a plausible profile, by names or labels', () => {
    expect(want('obp=.340,iso=.180').kind).toBe('want');
    expect(want('OBP=.340,Run speed=28').kind).toBe('want');
  });
  it('refuses a dimension given twice (the last would silently win)', () => {
    expect(() => want('obp=.300,obp=.400')).toThrow(/^want: obp is given more than once in "obp=.300,obp=.400"/);
    expect(() => want('obp=.300,OBP=.400')).toThrow(/more than once/);
  });
  it('refuses an OBP of 5 or 360 with the plausible range (within 5 standard deviations of the league mean)', () => {
    expect(() => want('obp=5')).toThrow(/obp=5 is not a plausible value: expected \.\d{3} to \.\d{3} fraction \(within 5 standard deviations/);
    expect(() => want('obp=360')).toThrow(/obp=360 is not a plausible value/);
  });
  it('refuses a measurement outside the plausible range the roster is checked against', () => {
    const r = plausibleRange('batting.csv', 'run_speed_ft_s');
    expect(() => want(`run_speed_ft_s=${r.max + 5}`)).toThrow(new RegExp(`expected ${r.min}\\.\\d to ${r.max}\\.\\d ft/s \\(the plausible range`));
  });
  it('refuses a number too long to read instead of answering with an empty pool', () => {
    expect(() => want(`obp=${'9'.repeat(400)}`)).toThrow(/too large to read/);
  });
  it('suggests names for an unknown dimension', () => {
    expect(() => want('rn_speed_ft_s=28')).toThrow(/no dimension "rn_speed_ft_s" \(did you mean run_speed_ft_s\?\)/);
  });
});
