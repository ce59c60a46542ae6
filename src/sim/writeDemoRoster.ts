/**
 * Regenerates the bundled demo roster (demo-roster/ by default) from its
 * fixed seed: `node --import tsx src/sim/writeDemoRoster.ts [dir]`.
 */
import { fileURLToPath } from 'node:url';
import { dirname, join, resolve } from 'node:path';
import { DEMO_OPTIONS } from './demoOptions.ts';
import { simulateLeague } from './simulateLeague.ts';
import { writeLeagueCsv } from './writeLeagueCsv.ts';

const here = dirname(fileURLToPath(import.meta.url));
const dir = resolve(process.argv[2] ?? join(here, '..', '..', 'demo-roster'));
const league = simulateLeague(DEMO_OPTIONS);
const { files } = await writeLeagueCsv(league, dir);
console.log(`wrote ${dir}: ${Object.entries(files).map(([f, n]) => `${f} ${n}`).join(', ')}`);
