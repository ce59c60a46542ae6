/**
 * The long fuzz run: `npm run bench -- fuzz` (tests/fuzz/runFuzz.ts; the short run is in npm test).
 * Store mutants (bit flips, cuts, appended bytes, deleted, swapped and duplicated files, HNSW header
 * and JSON edits, most with the manifest's checksums rewritten), roster and column-map mutants,
 * random command lines and API requests, each in a child process. Aims: no crash, no hang past 10 s,
 * no exit code other than 0, 1 or 2, no failure outside the error hierarchy, no half-written store,
 * every store whose damage a reader can tell refused, no 5xx answer.
 * `node --import tsx bench/fuzz.bench.ts [store mutants] [roster mutants] [command lines] [requests] [workers] [seed] [minutes]`
 * (with a time budget in minutes, each run stops when its share is spent and the counts say how far it got).
 */
import { aim } from './lib/aim.ts';
import { type Finding, runFuzz } from '../tests/fuzz/runFuzz.ts';

const [storeMutants, rosterMutants, commandLines, requests, workers, seed, minutes] = [10_000, 10_000, 2_000, 5_000, 2, 1, NaN].map((d, i) => {
  const arg = process.argv[2 + i];
  return arg === undefined ? d : Number(arg);
}) as [number, number, number, number, number, number, number];

const started = Date.now();
const say = (line: string): void => console.log(`${((Date.now() - started) / 1000).toFixed(0).padStart(6)} s  ${line}`);
const report = await runFuzz(
  { seed, storeMutants, rosterMutants, commandLines, requests, workers, timeoutMs: 10_000, ...(Number.isNaN(minutes) ? {} : { minutes }) },
  say,
  (f) => say(`FINDING ${f.kind} [${f.where}] ${f.what}: ${f.detail.slice(0, 500)}`),
);
const count = (kinds: readonly Finding['kind'][]): number => report.findings.filter((f) => kinds.includes(f.kind)).length;
const codes = (m: Record<number, number>): string => Object.entries(m).map(([k, v]) => `${k}: ${v.toLocaleString('en-US')}`).join(', ');
console.log(`fuzz (seed ${seed}, ${workers} child processes at once, ${(report.seconds / 60).toFixed(1)} min):`);
console.log(`  store mutants     ${report.store.mutants.toLocaleString('en-US')} (${report.store.mustRefuse.toLocaleString('en-US')} with damage a reader can tell; ${report.store.refused.toLocaleString('en-US')} refused in all, ${report.store.answered.toLocaleString('en-US')} answered)`);
console.log(`  roster mutants    ${report.roster.mutants.toLocaleString('en-US')} (${report.roster.built.toLocaleString('en-US')} built, ${report.roster.refused.toLocaleString('en-US')} refused)`);
console.log(`  command lines     ${report.commands.lines.toLocaleString('en-US')} (exit codes ${codes(report.commands.exitCodes)})`);
console.log(`  API requests      ${report.requests.sent.toLocaleString('en-US')} (statuses ${codes(report.requests.statuses)})`);
console.log(`  crashes           ${count(['crash', 'server down'])} ${aim('fuzz: crashes', count(['crash', 'server down']), { below: 1 })}`);
console.log(`  hangs past 10 s   ${count(['hang'])} ${aim('fuzz: hangs', count(['hang']), { below: 1 })} (run twice in fresh children; ${report.slowOnce} more overran once and then finished)`);
console.log(`  other exit codes  ${count(['exit code'])} ${aim('fuzz: exit codes other than 0, 1, 2', count(['exit code']), { below: 1 })}`);
console.log(`  unexpected errors ${count(['unexpected failure', 'server error'])} ${aim('fuzz: failures outside the error hierarchy', count(['unexpected failure', 'server error']), { below: 1 })}`);
console.log(`  half-written      ${count(['half-written', 'built store unreadable'])} ${aim('fuzz: half-written or unreadable stores', count(['half-written', 'built store unreadable']), { below: 1 })}`);
console.log(`  damaged answered  ${count(['damaged store answered'])} ${aim('fuzz: damaged stores answered', count(['damaged store answered']), { below: 1 })}`);
