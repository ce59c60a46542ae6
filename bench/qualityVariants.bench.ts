/**
 * Modelling variants of the window profiles against the default, on the comps-quality cases of
 * bench/qualityCases.bench.ts (same leagues, twins, targets and scoring, window 5 by default):
 * `node --import tsx bench/qualityVariants.bench.ts [playerSeasons] [targetsPerCase] [leagues] [twinsPerCase] [variants] [window]`
 * e.g. `... 30000 120 4 60 default,former` (`former`: windows weighed as single seasons, the table's k). Each variant is a set of build options (ProfileOptions), so
 * each league is simulated once and built once per variant. Printed per variant: the hitters' median ratio
 * (mean ± sd over leagues, then per league), the bat's gap (the hitters case's mean squared standardised
 * true-talent gap to the comps, summed over contact, power and eye: what "who hits like him" asks; it must not
 * grow), the twins found, and the SP and RP medians; and per league whether the variant beats the default.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { simulateLeague } from '../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../src/sim/writeLeagueCsv.ts';
import { buildStore } from '../src/pipeline/buildStore.ts';
import { openProfileStore } from '../src/store/openProfileStore.ts';
import { DEFAULT_COMPS_OPTIONS } from '../src/query/findComps.ts';
import { windowView } from '../src/query/windowView.ts';
import { DEFAULT_WINDOW } from '../src/query/defaultWindow.ts';
import { DEFAULT_PROFILE_OPTIONS, type ProfileOptions } from '../src/profiles/buildProfiles.ts';
import { DEFAULT_SHRINKAGE } from '../src/profiles/shrinkage.ts';
import { batGap, chooseTargets, scoreCases } from './lib/caseQuality.ts';
import { benchLeagues } from './leagues.ts';
import { TWIN_SHARE } from './qualityCases.bench.ts';

const D = DEFAULT_PROFILE_OPTIONS;
/** The variants, by name: the build's profile options. */
const VARIANTS: Record<string, ProfileOptions> = {
  default: D,
  /** Before: windows weighed as single seasons and regressed with the table's k. */
  former: { ...D, windowWeights: 'single', windowShrinkage: DEFAULT_SHRINKAGE },
  'former+recency-0.9': { ...D, windowWeights: 'single', windowShrinkage: DEFAULT_SHRINKAGE, windowDecay: 0.9 },
  'former+recency-0.8': { ...D, windowWeights: 'single', windowShrinkage: DEFAULT_SHRINKAGE, windowDecay: 0.8 },
  'former+window-weights': { ...D, windowShrinkage: DEFAULT_SHRINKAGE },
  'former+fitted-k': { ...D, windowWeights: 'single' },
  'former+table-k-x0.5': { ...D, windowWeights: 'single', windowShrinkage: { ...DEFAULT_SHRINKAGE, tableScale: 0.5 } },
  'former+table-k-x2': { ...D, windowWeights: 'single', windowShrinkage: { ...DEFAULT_SHRINKAGE, tableScale: 2 } },
  'recency-0.9': { ...D, windowDecay: 0.9 },
};

const n = Number(process.argv[2] ?? 30000);
const perCase = Number(process.argv[3] ?? 120);
const leagueCount = Number(process.argv[4] ?? 4);
const twinsPerCase = Number(process.argv[5] ?? 60);
const names = (process.argv[6] ?? 'default,former').split(',');
const window = Number(process.argv[7] ?? DEFAULT_WINDOW);
for (const name of names) if (!VARIANTS[name]) throw new Error(`unknown variant ${name}; known: ${Object.keys(VARIANTS).join(', ')}`);

interface Figures { hitters: number; bat: number; twins: number; sp: number; rp: number }
const figures = new Map<string, Figures[]>(names.map((v) => [v, []]));
const leagues = benchLeagues(n).slice(0, leagueCount);

for (const spec of leagues) {
  const dir = await mkdtemp(join(tmpdir(), `kindred-variants-${spec.name}-`));
  try {
    const league = simulateLeague({ ...spec.options, twinShare: TWIN_SHARE });
    await writeLeagueCsv(league, join(dir, 'roster'));
    for (const name of names) {
      const storeDir = join(dir, `store-${name}`);
      const t = performance.now();
      await buildStore(join(dir, 'roster'), storeDir, { lenient: false, windows: [1, window], profile: VARIANTS[name] ?? D });
      const store = await openProfileStore(storeDir);
      const chosen = chooseTargets(store, league, perCase, twinsPerCase, spec.options.seed);
      const s = scoreCases(windowView(store, window), league, chosen, { compsOptions: DEFAULT_COMPS_OPTIONS });
      const found = s.twinsFound.reduce((a, b) => a + b, 0);
      const scored = s.twinTargets.reduce((a, b) => a + b, 0);
      const f: Figures = { hitters: s.median[0] as number, bat: batGap(s.talentGaps[0]), twins: found / scored, sp: s.median[1] as number, rp: s.median[2] as number };
      figures.get(name)?.push(f);
      console.error(`${spec.name} ${name}: hitters ${f.hitters.toFixed(3)} bat gap ${f.bat.toFixed(2)} twins ${found}/${scored} SP ${f.sp.toFixed(3)} RP ${f.rp.toFixed(3)} (${((performance.now() - t) / 1000).toFixed(0)} s)`);
      await rm(storeDir, { recursive: true, force: true });
    }
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

const mean = (xs: readonly number[]): number => xs.reduce((a, b) => a + b, 0) / xs.length;
const sd = (xs: readonly number[]): number => Math.sqrt(xs.reduce((a, x) => a + (x - mean(xs)) ** 2, 0) / Math.max(1, xs.length - 1));
const ms = (xs: readonly number[], d = 3): string => `${mean(xs).toFixed(d)} ± ${sd(xs).toFixed(d)} (${xs.map((x) => x.toFixed(d)).join(' ')})`;
console.log(`window ${window}, leagues ${leagues.map((l) => l.name).join(', ')}, ~${n.toLocaleString('en-US')} player-seasons x size, ${perCase} targets per case, ${twinsPerCase} twins`);
const base = figures.get('default');
for (const [name, list] of figures) {
  const wins = base ? list.filter((f, l) => f.hitters < (base[l]?.hitters ?? Infinity)).length : 0;
  const ties = base ? list.filter((f, l) => f.hitters === base[l]?.hitters).length : 0;
  // (better than default: lower ratio)
  console.log(`${name}:`);
  console.log(`  hitters ${ms(list.map((f) => f.hitters))}${name === 'default' ? '' : `; better than default in ${wins} of ${list.length}, equal in ${ties}`}`);
  console.log(`  bat gap ${ms(list.map((f) => f.bat), 2)}; twins ${ms(list.map((f) => f.twins), 2)}`);
  console.log(`  SP ${ms(list.map((f) => f.sp))}; RP ${ms(list.map((f) => f.rp))}`);
}
