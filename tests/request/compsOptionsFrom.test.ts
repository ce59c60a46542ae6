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
import { answerComps } from '../../src/request/answerComps.ts';
import { ParameterError } from '../../src/errors/ParameterError.ts';

let dir: string;
let store: ProfileStore;

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'kindred-request-'));
  await buildStore(DEMO_ROSTER, join(dir, 'store'), { lenient: false });
  store = await openProfileStore(join(dir, 'store'));
});
afterAll(() => rm(dir, { recursive: true, force: true }));

const req = (text: string) => readRequest('comps', 'http', new URLSearchParams(text));
/** The options of a request for a hand-built shortstop. */
const optionsOf = (text: string) => {
  const r = req(`${text}&want=obp%3D.340&position=SS`);
  return compsOptionsFrom(r, store, targetFrom(store, r));
};

describe('compsOptionsFrom(request, store): weights', () => {
  it('takes a dimension by its label as well as its name, and both give the same weights', () => {
    const byLabel = optionsOf('weights=Run%20speed%3D0,OBP%3D2').weightOverrides;
    const byName = optionsOf('weights=run_speed_ft_s%3D0,obp%3D2').weightOverrides;
    expect([...byLabel].sort()).toEqual([...byName].sort());
    expect(byLabel.get('run_speed_ft_s')).toBe(0);
  });
  it('refuses one dimension given by both its name and its label', () => {
    expect(() => optionsOf('weights=Run%20speed%3D0,run_speed_ft_s%3D2')).toThrow(/"run speed" and "run_speed_ft_s" are the same dimension \(run_speed_ft_s\); give it once/);
  });
  it('suggests near names for an unknown one', () => {
    expect(() => optionsOf('weights=run_sped%3D0')).toThrow(/no dimension "run_sped" \(did you mean run_speed_ft_s\?\)/);
    expect(() => optionsOf('weights=obpp%3D2')).toThrow(/did you mean obp/);
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

describe('compsOptionsFrom(request, store, target): the default pool respects role and sample', () => {
  const comps = (text: string, job: 'comps' | 'cheaper' | 'match' = 'comps') => {
    const r = readRequest(job, 'http', new URLSearchParams(text));
    return answerComps(store, r);
  };
  const levelOf = (l: string): number => store.levels.indexOf(l);
  /** A hitter profile of the demo with a season at a level with a level above and below it. */
  const middleHitter = (): { id: string; season: number; level: string; position: string; sample: number } => {
    const g = store.groups.get('IF');
    if (!g) throw new Error('no IF group');
    for (let i = 0; i < g.n; i++) {
      const l = g.level[i] ?? 0;
      if (l > 0 && l < store.levels.length - 1 && (g.sample[i] ?? 0) >= 400 && g.position[i] === 'SS') {
        return { id: store.players[g.player[i] ?? 0]?.playerId ?? '', season: g.season[i] ?? 0, level: store.levels[l] ?? '', position: 'SS', sample: g.sample[i] ?? 0 };
      }
    }
    throw new Error('no middle-level shortstop');
  };

  it('gives a shortstop only shortstops, at levels within one of his, with at least half his PA; and says so', () => {
    const t = middleHitter();
    const r = comps(`player=${t.id}&season=${t.season}&level=${t.level}&k=25`);
    expect(r.comps.length).toBeGreaterThan(0);
    for (const c of r.comps) {
      expect(c.position).toBe('SS');
      expect(Math.abs(levelOf(c.level) - levelOf(t.level))).toBeLessThanOrEqual(1);
      expect(c.sample).toBeGreaterThanOrEqual(Math.round(t.sample / 2));
      expect(c.sample_unit).toBe('PA');
    }
    expect(r.pool.sample_floor).toEqual({ unit: 'PA', min: Math.round(t.sample / 2), share: 0.5, target_sample: t.sample, target_sample_from: 'target' });
    expect(r.pool.filters.min_sample).toBe(Math.round(t.sample / 2));
    expect(r.pool.summary).toContain(`${Math.round(t.sample / 2)} PA or more (50% of the target\u2019s ${t.sample})`);
  });

  it('answers the hand-built SS case with shortstops only (it used to mix 2B, 1B and 3B)', () => {
    const r = comps(`want=${encodeURIComponent('obp=60g,iso=70g,run_speed_ft_s=55g')}&position=SS`);
    expect(r.comps.map((c) => c.position)).toEqual(r.comps.map(() => 'SS'));
    expect(r.pool.sample_floor?.target_sample_from).toBe('group median');
  });

  it('adds the adjacent positions (SS: 2B and 3B) on request, and nothing else', () => {
    const t = middleHitter();
    const r = comps(`player=${t.id}&season=${t.season}&level=${t.level}&adjacent=true&k=60&level-span=all&sample-floor=0`);
    const seen = new Set(r.comps.map((c) => c.position));
    expect([...seen].every((p) => ['SS', '2B', '3B'].includes(p))).toBe(true);
    expect(seen.size).toBeGreaterThan(1);
  });

  it('loosens levels and the floor through level-span and sample-floor', () => {
    const t = middleHitter();
    const r = comps(`player=${t.id}&season=${t.season}&level=${t.level}&level-span=all&sample-floor=0&k=200`);
    expect(r.pool.sample_floor).toBeNull();
    expect(r.pool.filters.levels).toBeUndefined();
    expect(Math.max(...r.comps.map((c) => Math.abs(levelOf(c.level) - levelOf(t.level))))).toBeGreaterThan(1);
    expect(Math.min(...r.comps.map((c) => c.sample))).toBeLessThan(Math.round(t.sample / 2));
  });

  it('lets an explicit pool-position and pool-level win over the defaults', () => {
    const t = middleHitter();
    const top = store.levels[store.levels.length - 1] ?? '';
    const r = comps(`player=${t.id}&season=${t.season}&level=${t.level}&pool-position=2B&pool-level=${top}`);
    expect(r.comps.length).toBeGreaterThan(0);
    for (const c of r.comps) {
      expect(c.position).toBe('2B');
      expect(c.level).toBe(top);
    }
  });

  it('refuses a filter that empties the pool, naming it (it used to answer with no comps and exit 0)', () => {
    const catcher = store.groups.get('C');
    const id = store.players[catcher?.player[0] ?? 0]?.playerId ?? '';
    expect(() => comps(`player=${id}&pool-position=SS`)).toThrow(/^pool-position: leaves the pool empty: no other C player-season at SS \(the C group holds C\)/);
    expect(() => comps(`player=${id}&pool-position=SS`)).toThrow(ParameterError);
    expect(() => comps(`player=${id}&age=60-61`)).toThrow(/^age: leaves the pool empty/);
    expect(() => comps(`player=${id}&pool-season=1900`)).toThrow(/^pool-season: leaves the pool empty: no other C player-season at C \(the C group holds C\), at .*, in seasons 1900-1900/);
  });
});
