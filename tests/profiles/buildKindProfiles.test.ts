import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { simulateLeague } from '../../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../../src/sim/writeLeagueCsv.ts';
import { readRoster } from '../../src/ingest/readRoster.ts';
import type { Roster } from '../../src/ingest/Roster.ts';
import { buildKindProfiles, buildProfiles, DEFAULT_PROFILE_OPTIONS, profileWindowRoster, type ProfileSet } from '../../src/profiles/buildProfiles.ts';
import { windowRoster } from '../../src/profiles/windowRoster.ts';
import { POSITION_GROUPS } from '../../src/profiles/positionGroup.ts';
import { buildStore } from '../../src/pipeline/buildStore.ts';
import { scratchDir } from '../helpers/scratchDir.ts';

/**
 * The build profiles the pitchers first and hands their groups to the index workers, then the hitters.
 * Each kind is measured against leagues of its own kind (a pitcher's K% against pitchers, a hitter's OBP
 * against hitters), so profiling one kind at a time must give exactly the groups of one pass over both:
 * these checks fail if a league mean, a stratum or a weight of one kind came to depend on the other.
 */
let roster: Roster;
let root = '';

beforeAll(async () => {
  root = await scratchDir('kindred-kinds-');
  // invented league (simulator), small enough for a unit test but with every group and two-way lines
  await writeLeagueCsv(simulateLeague({ seed: 31, firstSeason: 2015, lastSeason: 2026, targetPlayerSeasons: 3000 }), join(root, 'roster'));
  roster = await readRoster(join(root, 'roster'), { lenient: false });
});

/** The groups of both sets in one map and their skipped counts added up. */
function joined(a: ProfileSet, b: ProfileSet): ProfileSet {
  return {
    groups: new Map(POSITION_GROUPS.flatMap((g) => {
      const p = a.groups.get(g) ?? b.groups.get(g);
      return p ? [[g, p] as const] : [];
    })),
    skipped: {
      hittersBelowMinimum: a.skipped.hittersBelowMinimum + b.skipped.hittersBelowMinimum,
      pitchersBelowMinimum: a.skipped.pitchersBelowMinimum + b.skipped.pitchersBelowMinimum,
      pitchersBatting: a.skipped.pitchersBatting + b.skipped.pitchersBatting,
    },
  };
}

describe('buildKindProfiles(roster, options, kinds)', () => {
  it('gives the pitchers SP and RP only, and the hitters C, IF, OF and DH only', () => {
    expect([...buildKindProfiles(roster, DEFAULT_PROFILE_OPTIONS, ['pitchers']).groups.keys()]).toEqual(['SP', 'RP']);
    expect([...buildKindProfiles(roster, DEFAULT_PROFILE_OPTIONS, ['hitters']).groups.keys()]).toEqual(['C', 'IF', 'OF', 'DH']);
  });

  it('profiles each kind exactly as one pass over both does (values, strata, shrinkage, weights, skipped seasons)', () => {
    const both = buildProfiles(roster, DEFAULT_PROFILE_OPTIONS);
    const apart = joined(buildKindProfiles(roster, DEFAULT_PROFILE_OPTIONS, ['pitchers']), buildKindProfiles(roster, DEFAULT_PROFILE_OPTIONS, ['hitters']));
    expect(both.skipped.pitchersBatting + both.skipped.hittersBelowMinimum + both.skipped.pitchersBelowMinimum).toBeGreaterThan(0);
    expect(apart).toEqual(both);
  });

  it('profiles each kind over windows of 5 seasons as one pass over both does, with their own weights or the single seasons\u2019', () => {
    const single = buildProfiles(roster, DEFAULT_PROFILE_OPTIONS);
    const wr = windowRoster(roster, 5);
    const both = profileWindowRoster(wr, DEFAULT_PROFILE_OPTIONS, single);
    const apart = joined(profileWindowRoster(wr, DEFAULT_PROFILE_OPTIONS, single, ['pitchers']), profileWindowRoster(wr, DEFAULT_PROFILE_OPTIONS, single, ['hitters']));
    expect(apart).toEqual(both);
    for (const [group, g] of both.groups) expect(g.redundancy).not.toBe(single.groups.get(group)?.redundancy);
    const asSingle = { ...DEFAULT_PROFILE_OPTIONS, windowWeights: 'single' as const };
    const given = profileWindowRoster(wr, asSingle, single);
    expect(joined(profileWindowRoster(wr, asSingle, single, ['pitchers']), profileWindowRoster(wr, asSingle, single, ['hitters']))).toEqual(given);
    for (const [group, g] of given.groups) expect(g.redundancy).toBe(single.groups.get(group)?.redundancy);
  });

  it('regresses the windows\u2019 rates with k fitted to their lines where an era has enough players, single seasons with the table', () => {
    const sources = (set: ProfileSet): Set<string> => new Set([...set.groups.values()].flatMap((g) => [...g.shrinkage.values()].flatMap((m) => [...m.values()].map((u) => u.source))));
    const single = buildProfiles(roster, DEFAULT_PROFILE_OPTIONS);
    expect(sources(single)).toEqual(new Set(['table']));
    expect(sources(profileWindowRoster(windowRoster(roster, 5), DEFAULT_PROFILE_OPTIONS, single)).has('fitted')).toBe(true);
  });
});

describe('buildStore, pitchers first', () => {
  it('reports and records the groups in the usual order (C, IF, OF, DH, SP, RP), single seasons and windows', async () => {
    const summary = await buildStore(join(root, 'roster'), join(root, 'store'), { lenient: false, threads: 1 });
    expect(Object.keys(summary.profiles)).toEqual(['C', 'IF', 'OF', 'DH', 'SP', 'RP']);
    expect(Object.keys(summary.windows?.['5'] ?? {})).toEqual(['C', 'IF', 'OF', 'DH', 'SP', 'RP']);
  }, 60_000);
});
