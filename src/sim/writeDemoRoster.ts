/**
 * Regenerates the bundled demo roster (demo-roster/ by default) from a fixed
 * seed: `node --import tsx src/sim/writeDemoRoster.ts [dir]`.
 */
import { fileURLToPath } from 'node:url';
import { dirname, join, resolve } from 'node:path';
import { simulateLeague } from './simulateLeague.ts';
import { writeLeagueCsv } from './writeLeagueCsv.ts';

/** The demo league's fixed settings. */
export const DEMO_OPTIONS = { seed: 20260630, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: 17000 } as const;

const here = dirname(fileURLToPath(import.meta.url));
const dir = resolve(process.argv[2] ?? join(here, '..', '..', 'demo-roster'));
const league = simulateLeague(DEMO_OPTIONS);
const { files } = await writeLeagueCsv(league, dir);
console.log(`wrote ${dir}: ${Object.entries(files).map(([f, n]) => `${f} ${n}`).join(', ')}`);
