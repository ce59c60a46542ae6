/**
 * Builds a store in a process of its own and prints one JSON line: seconds and peak resident memory.
 * `node --import tsx bench/lib/buildChild.ts <roster> <store>`
 */
import { availableParallelism } from 'node:os';
import { buildStore } from '../../src/pipeline/buildStore.ts';

const [roster, store] = process.argv.slice(2);
if (!roster || !store) throw new Error('usage: buildChild.ts <roster> <store>');
const summary = await buildStore(roster, store, { lenient: false });
const profiles = Object.values(summary.profiles).reduce((a, b) => a + b, 0);
// maxRSS is the process's peak, worker threads included (they share the process)
const cpu = process.cpuUsage(); // the whole process, worker threads included
console.log(JSON.stringify({ seconds: summary.seconds, cpuSeconds: (cpu.user + cpu.system) / 1e6, maxRssMb: process.resourceUsage().maxRSS / 1024, profiles, threads: availableParallelism() }));
