/**
 * The fuzz run shared by the short run in `npm test` (tests/fuzz/fuzz.test.ts) and the long one in
 * `npm run bench -- fuzz` (bench/fuzz.bench.ts). It builds a small simulated roster and two stores
 * from it (input space, and PCA with one HNSW index per group), then runs in child processes
 * (tests/fuzz/runInChild.ts): store mutants (each queried for every position group, a prospect and
 * the dimension table), roster and column-map mutants (each built), random command lines, and random
 * API requests to a `kindred serve` child. Every mutant is made from its own seed (`seed`, index), so
 * a finding can be replayed from the line that reports it.
 */
import { spawn } from 'node:child_process';
import { cpSync, existsSync, mkdirSync, readdirSync, rmSync } from 'node:fs';
import { mkdtemp } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildStore } from '../../src/pipeline/buildStore.ts';
import { SeededRandom } from '../../src/random/SeededRandom.ts';
import { simulateLeague } from '../../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../../src/sim/writeLeagueCsv.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import { servingUrl } from '../../src/server/servingUrl.ts';
import type { CommandOutcome, FuzzJob } from './fuzzWorker.ts';
import { randomCommandLine, randomRequest } from './parameterMutations.ts';
import { RosterMutator } from './rosterMutations.ts';
import { ChildRunner, type JobEnd } from './runInChild.ts';
import { StoreMutator } from './storeMutations.ts';

export interface FuzzPlan {
  readonly seed: number;
  readonly storeMutants: number;
  readonly rosterMutants: number;
  readonly commandLines: number;
  readonly requests: number;
  /** Child processes working at once. */
  readonly workers: number;
  /** Longest a command may take before it counts as a hang. */
  readonly timeoutMs: number;
  /**
   * Optional time budget in minutes: the store and roster runs get 45% of it each and the command
   * lines and requests the rest; a run stops early when its share is spent (the report says how many ran).
   */
  readonly minutes?: number;
}

export interface Finding {
  readonly kind: 'crash' | 'hang' | 'exit code' | 'unexpected failure' | 'damaged store answered' | 'half-written' | 'built store unreadable' | 'server error' | 'server down';
  /** Which run and mutant: `store 17`, `roster 3`, ... (replayable with the plan's seed). */
  readonly where: string;
  readonly what: string;
  readonly detail: string;
}

export interface FuzzReport {
  readonly store: { mutants: number; mustRefuse: number; refused: number; answered: number };
  readonly roster: { mutants: number; built: number; refused: number };
  readonly commands: { lines: number; exitCodes: Record<number, number> };
  readonly requests: { sent: number; statuses: Record<number, number> };
  readonly findings: readonly Finding[];
  /** Mutants that overran the watchdog once and finished when run again (not findings). */
  readonly slowOnce: number;
  readonly seconds: number;
}

const seedOf = (plan: FuzzPlan, run: number, index: number): SeededRandom => new SeededRandom(plan.seed * 7919 + run * 1_000_003 + index);
const ROOT = fileURLToPath(new URL('../..', import.meta.url));

interface Target {
  readonly args: readonly string[];
}

/** One target per position group (its first row) and a minor-league one for the prospect job. */
async function targetsOf(storeDir: string): Promise<{ comps: Target[]; prospect: Target | undefined; players: string[] }> {
  const store = await openProfileStore(storeDir);
  const comps: Target[] = [];
  let prospect: Target | undefined;
  const players = new Set<string>();
  const top = store.levels[store.levels.length - 1];
  for (const g of store.groups.values()) {
    for (let row = 0; row < g.n; row++) {
      const p = store.players[g.player[row] as number];
      if (!p) continue;
      players.add(p.playerId);
      const args = [p.playerId, '--season', String(g.season[row]), '--level', store.levels[g.level[row] as number] ?? '', '--position', g.position[row] ?? 'DH'];
      if (row === 0) comps.push({ args });
      if (!prospect && store.levels[g.level[row] as number] !== top) prospect = { args };
    }
  }
  return { comps, prospect, players: [...players].slice(0, 60) };
}

/**
 * Runs a mutant; one that overruns the watchdog is run once more in a fresh child, and counts as a hang
 * only if it overruns again (a shared machine can stall a command that finishes in a second); a mutant
 * that finished the second time is counted in `slow`.
 */
async function runConfirmed(runner: ChildRunner, slow: { count: number }, job: FuzzJob): Promise<JobEnd> {
  const end = await runner.run(job);
  if (end.kind !== 'hang') return end;
  const again = await runner.run(job);
  if (again.kind !== 'hang') slow.count++;
  return again;
}

function countCode(map: Record<number, number>, code: number): void {
  map[code] = (map[code] ?? 0) + 1;
}

/** What a finished command says about itself: a bad exit code or an error outside the hierarchy. */
function commandFindings(where: string, what: string, argv: readonly string[], r: CommandOutcome): Finding[] {
  const out: Finding[] = [];
  if (![0, 1, 2].includes(r.code)) out.push({ kind: 'exit code', where, what, detail: `${argv.join(' ')} exited ${r.code}: ${r.stderr}` });
  if (r.unexpected) out.push({ kind: 'unexpected failure', where, what, detail: `${argv.join(' ')}: ${r.stderr}` });
  return out;
}

function endFindings(where: string, what: string, commands: readonly (readonly string[])[], end: JobEnd): Finding[] {
  if (end.kind === 'crash') {
    return [{ kind: 'crash', where, what, detail: `${(commands[end.step] ?? []).join(' ')} ended the process (${end.signal ?? `exit ${end.code}`}): ${end.stderr.slice(-400)}` }];
  }
  if (end.kind === 'hang') return [{ kind: 'hang', where, what, detail: `${(commands[end.step] ?? []).join(' ')} did not finish in time` }];
  return end.results.flatMap((r, i) => commandFindings(where, what, commands[i] ?? [], r));
}

/** Runs `count` items over `workers` slots, each slot with its own child and set-up. */
async function overSlots<S>(
  count: number,
  workers: number,
  setUp: (slot: number) => S,
  item: (slot: S, runner: ChildRunner, index: number) => Promise<void>,
  timeoutMs: number,
  stopAt = Infinity,
): Promise<void> {
  await Promise.all(
    Array.from({ length: Math.min(workers, Math.max(count, 1)) }, async (_, slot) => {
      const state = setUp(slot);
      const runner = new ChildRunner({ timeoutMs });
      try {
        for (let i = slot; i < count && Date.now() < stopAt; i += workers) await item(state, runner, i);
      } finally {
        runner.close();
      }
    }),
  );
}

export async function runFuzz(plan: FuzzPlan, log: (line: string) => void = () => {}, onFinding: (f: Finding) => void = () => {}): Promise<FuzzReport> {
  const started = performance.now();
  const work = await mkdtemp(join(tmpdir(), 'kindred-fuzz-'));
  const found: Finding[] = [];
  const findings = {
    get length(): number {
      return found.length;
    },
    push(...more: Finding[]): void {
      for (const f of more) onFinding(f);
      found.push(...more);
    },
  };
  const slowOnce = { count: 0 };
  const report = {
    store: { mutants: 0, mustRefuse: 0, refused: 0, answered: 0 },
    roster: { mutants: 0, built: 0, refused: 0 },
    commands: { lines: 0, exitCodes: {} as Record<number, number> },
    requests: { sent: 0, statuses: {} as Record<number, number> },
  };
  try {
    const roster = join(work, 'roster');
    const league = simulateLeague({ seed: 11 + plan.seed, firstSeason: 2015, lastSeason: 2026, targetPlayerSeasons: 600 });
    await writeLeagueCsv(league, roster);
    const stores = { input: join(work, 'store-input'), pca: join(work, 'store-pca') };
    await buildStore(roster, stores.input, { lenient: false, threads: 1 });
    await buildStore(roster, stores.pca, { lenient: false, threads: 1, embed: { method: 'pca', driverTargets: 0 } });
    const targets = await targetsOf(stores.input);
    const budget = plan.minutes === undefined ? undefined : plan.minutes * 60_000;
    const phaseStart = Date.now();
    const until = (share: number): number => (budget === undefined ? Infinity : Date.now() + budget * share);
    log(`fuzz: roster of ${targets.players.length}+ players, stores in the input space and in PCA; ${targets.comps.length} groups queried per store mutant`);

    // Store mutants: each damages a work copy of one of the two stores, then queries it.
    await overSlots(
      plan.storeMutants,
      plan.workers,
      (slot) => {
        const kinds = Object.entries(stores).map(([kind, base]) => {
          const copy = join(work, `slot${slot}-${kind}`);
          cpSync(base, copy, { recursive: true });
          return { copy, mutator: new StoreMutator(base, copy) };
        });
        return kinds;
      },
      async (kinds, runner, i) => {
        const rng = seedOf(plan, 1, i);
        const { copy, mutator } = kinds[i % kinds.length] ?? (kinds[0] as (typeof kinds)[number]);
        const mutant = mutator.mutate(rng);
        const formats = ['json', 'table', 'csv'];
        // each group's comps over single seasons and over windows of 5 (the build's default windows; the
        // default comps of an input-space store): every group file is read by one of them
        const commands: string[][] = targets.comps.flatMap((t, j) => [
          ['comps', ...t.args, '--store', copy, '--format', formats[(i + j) % 3] ?? 'json', '--window', '1'],
          ['comps', ...t.args, '--store', copy, '--format', formats[(i + j + 1) % 3] ?? 'json', '--window', '5'],
        ]);
        if (targets.prospect) commands.push(['prospect', ...targets.prospect.args, '--store', copy]);
        if (i % 8 === 0) commands.push(['dims', '--store', copy]);
        const mustRefuse = mutant.expect === 'refuse';
        const end = await runConfirmed(runner, slowOnce, { id: i, commands, stopOnStoreError: mustRefuse });
        const where = `store ${i}`;
        findings.push(...endFindings(where, mutant.what, commands, end));
        report.store.mutants++;
        if (end.kind === 'done') {
          const refused = end.results.some((r) => r.code === 1 && r.errorCodes.some((c) => c.startsWith('kindred.store.')));
          if (refused) report.store.refused++;
          else report.store.answered++;
          if (mustRefuse) {
            report.store.mustRefuse++;
            if (!refused) findings.push({ kind: 'damaged store answered', where, what: mutant.what, detail: end.results.map((r) => `${r.code} ${r.errorCodes.join(',')}`).join('; ') });
          }
        }
        mutator.restore(mutant);
        if (report.store.mutants % 500 === 0) log(`fuzz: ${report.store.mutants} store mutants, ${findings.length} findings`);
      },
      plan.timeoutMs,
      until(0.45),
    );
    log(`fuzz: ${report.store.mutants} store mutants done`);

    // Roster mutants: each edits a work copy of the roster (and maybe writes a column map), then builds it.
    await overSlots(
      plan.rosterMutants,
      plan.workers,
      (slot) => {
        const dir = join(work, `slot${slot}-roster`);
        const copy = join(dir, 'roster');
        mkdirSync(dir);
        cpSync(roster, copy, { recursive: true });
        const out = join(dir, 'out');
        mkdirSync(out);
        return { copy, out, mutator: new RosterMutator(roster, copy, join(dir, 'map.json')) };
      },
      async ({ copy, out, mutator }, runner, i) => {
        const rng = seedOf(plan, 2, i);
        const mutant = mutator.mutate(rng);
        const storeDir = join(out, 'store');
        const probe = targets.comps[i % targets.comps.length]?.args[0] ?? 'x';
        const commands = [['build', copy, '--store', storeDir, '--no-backtest', ...mutant.args], ['comps', probe, '--store', storeDir, '--format', 'json']];
        const end = await runConfirmed(runner, slowOnce, { id: i, commands, stopOnStoreError: false });
        const where = `roster ${i}`;
        findings.push(...endFindings(where, mutant.what, commands, end));
        report.roster.mutants++;
        if (end.kind === 'done') {
          const [build, probe] = end.results;
          if (build?.code === 0) {
            report.roster.built++;
            if (probe?.errorCodes.some((c) => c.startsWith('kindred.store.'))) findings.push({ kind: 'built store unreadable', where, what: mutant.what, detail: probe.stderr });
          } else {
            report.roster.refused++;
            if (existsSync(storeDir)) findings.push({ kind: 'half-written', where, what: mutant.what, detail: `the build exited ${build?.code} but ${storeDir} exists` });
          }
          const left = readdirSync(out).filter((n) => !['store', 'store.charts', 'store.rejects.csv'].includes(n));
          if (left.length > 0) findings.push({ kind: 'half-written', where, what: mutant.what, detail: `left behind: ${left.join(', ')}` });
        }
        rmSync(out, { recursive: true, force: true });
        mkdirSync(out);
        mutator.restore(mutant);
        if (report.roster.mutants % 500 === 0) log(`fuzz: ${report.roster.mutants} roster mutants, ${findings.length} findings`);
      },
      plan.timeoutMs,
      budget === undefined ? Infinity : phaseStart + budget * 0.9,
    );
    log(`fuzz: ${report.roster.mutants} roster mutants done`);

    // Command lines: random parameters of every job against the two good stores.
    await overSlots(
      plan.commandLines,
      plan.workers,
      () => null,
      async (_, runner, i) => {
        const rng = seedOf(plan, 3, i);
        const store = i % 2 === 0 ? stores.input : stores.pca;
        const argv = randomCommandLine(rng, store, targets.players);
        const end = await runConfirmed(runner, slowOnce, { id: i, commands: [argv], stopOnStoreError: false });
        findings.push(...endFindings(`command ${i}`, argv.join(' '), [argv], end));
        report.commands.lines++;
        if (end.kind === 'done') for (const r of end.results) countCode(report.commands.exitCodes, r.code);
      },
      plan.timeoutMs,
      budget === undefined ? Infinity : phaseStart + budget * 0.95,
    );
    log(`fuzz: ${report.commands.lines} command lines done`);

    if (plan.requests > 0) await fuzzServer(plan, stores.input, targets.players, report.requests, findings, budget === undefined ? Infinity : phaseStart + budget);
    log(`fuzz: ${report.requests.sent} requests done`);
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
  return { ...report, findings: found, slowOnce: slowOnce.count, seconds: (performance.now() - started) / 1000 };
}

/** Random API requests to one `kindred serve` child; no answer may be a 5xx, the server must stay up. */
async function fuzzServer(
  plan: FuzzPlan,
  storeDir: string,
  players: readonly string[],
  counts: { sent: number; statuses: Record<number, number> },
  findings: { push(...more: Finding[]): void },
  stopAt: number,
): Promise<void> {
  const child = spawn(process.execPath, [join(ROOT, 'bin', 'kindred.js'), 'serve', '--store', storeDir, '--port', '0'], { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] });
  let log = '';
  child.stderr.on('data', (c: Buffer) => {
    log = (log + c.toString('utf8')).slice(-4000);
  });
  let exited: string | null = null;
  child.once('exit', (code, signal) => {
    exited = signal ?? `exit ${code}`;
  });
  try {
    const url = await servingUrl(child, () => log);
    for (let i = 0; i < plan.requests && Date.now() < stopAt; i++) {
      const rng = seedOf(plan, 4, i);
      const { method, path } = randomRequest(rng, players);
      const where = `request ${i}`;
      try {
        const res = await fetch(new URL(path, url), { method, signal: AbortSignal.timeout(plan.timeoutMs), headers: { Origin: url.replace(/\/$/, '') } });
        const body = await res.text();
        countCode(counts.statuses, res.status);
        // a folder without the built page answers its page paths 503 kindred.http.pageNotBuilt: not a fault
        if (res.status >= 500 && !body.includes('kindred.http.pageNotBuilt')) findings.push({ kind: 'server error', where, what: `${method} ${path.slice(0, 200)}`, detail: `status ${res.status}; log: ${log.slice(-300)}` });
      } catch (error) {
        findings.push({
          kind: exited ? 'server down' : 'hang',
          where,
          what: `${method} ${path.slice(0, 200)}`,
          detail: `${error instanceof Error ? error.message : String(error)}${exited ? ` (server ended: ${exited}; log: ${log.slice(-300)})` : ''}`,
        });
        if (exited) return;
      }
      counts.sent++;
    }
  } finally {
    child.kill('SIGTERM');
  }
}
