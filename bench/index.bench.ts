/**
 * Bench of the guarded HNSW index: build time, p50/p99 query latency and recall@10 against brute force,
 * on 100,000 x 24 invented uniform rows (seeded). Run: `node --import tsx bench/index.bench.ts`.
 * Options by environment: KINDRED_BENCH_ROWS (default 100000), KINDRED_BENCH_QUERIES (default 1000).
 */
import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { exactSearch } from '../src/ann/exactSearch.ts';
import { GuardedIndex } from '../src/ann/GuardedIndex.ts';
import type { IndexParams } from '../src/ann/IndexParams.ts';
import { SeededRandom } from '../src/random/SeededRandom.ts';
import { nearestRankQuantile } from '../src/stats/quantile.ts';

const DIM = 24;
const ROWS = Number(process.env['KINDRED_BENCH_ROWS'] ?? 100_000);
const QUERIES = Number(process.env['KINDRED_BENCH_QUERIES'] ?? 1000);
const K = 10;
const PARAMS: IndexParams = { M: 16, efConstruction: 200, ef: 128, seed: 42 };

function randomRows(count: number, seed: number): Float32Array {
  const rng = new SeededRandom(seed);
  const next = (): number => rng.next();
  const out = new Float32Array(count * DIM);
  for (let i = 0; i < out.length; i++) out[i] = next();
  return out;
}

function timeQueries(run: (q: number[]) => number[], queries: readonly number[][]): { p50: number; p99: number; results: number[][] } {
  const times: number[] = [];
  const results: number[][] = [];
  for (const q of queries) {
    const start = performance.now();
    results.push(run(q));
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return { p50: nearestRankQuantile(times, 0.5), p99: nearestRankQuantile(times, 0.99), results };
}

function recall(truth: readonly number[][], got: readonly number[][]): number {
  let hit = 0;
  truth.forEach((t, i) => {
    const set = new Set(got[i] ?? []);
    for (const label of t) if (set.has(label)) hit++;
  });
  return hit / (truth.length * K);
}

const ms = (x: number): string => `${x.toFixed(3)} ms`;

const vectors = randomRows(ROWS, 1);
const queryRows = randomRows(QUERIES, 2);
const queries = Array.from({ length: QUERIES }, (_, i) => Array.from(queryRows.subarray(i * DIM, (i + 1) * DIM)));
console.log(`rows ${ROWS} x ${DIM}, ${QUERIES} queries, k ${K}, M ${PARAMS.M}, efConstruction ${PARAMS.efConstruction}, node ${process.version}`);

let start = performance.now();
const index = GuardedIndex.build(vectors, DIM, PARAMS);
console.log(`build: ${((performance.now() - start) / 1000).toFixed(2)} s`);

const exact = timeQueries((q) => exactSearch(vectors, DIM, q, K).labels, queries);
console.log(`exact (brute force): p50 ${ms(exact.p50)}, p99 ${ms(exact.p99)}`);

const dir = mkdtempSync(join(tmpdir(), 'kindred-bench-'));
try {
  const file = join(dir, 'index.hnsw');
  start = performance.now();
  index.save(file);
  const saveMs = performance.now() - start;
  start = performance.now();
  const loaded = GuardedIndex.load(file, index.meta);
  const loadMs = performance.now() - start;
  console.log(`save (temp, verify, rename): ${ms(saveMs)}; load (verify, read, check): ${ms(loadMs)}; file ${(statSync(file).size / 1e6).toFixed(1)} MB`);

  for (const ef of [32, 64, 128]) {
    const atEf = ef === loaded.ef ? loaded : GuardedIndex.load(file, { ...index.meta, ef });
    const timed = timeQueries((q) => atEf.search(q, K).labels, queries);
    console.log(`hnsw ef ${ef}: p50 ${ms(timed.p50)}, p99 ${ms(timed.p99)}, recall@10 ${recall(exact.results, timed.results).toFixed(4)}`);
  }
  const keep = (label: number): boolean => label % 10 === 0;
  const filteredExact = timeQueries((q) => exactSearch(vectors, DIM, q, K, keep).labels, queries);
  const filtered = timeQueries((q) => loaded.search(q, K, keep).labels, queries);
  console.log(
    `hnsw ef 128, filter passing 10%: p50 ${ms(filtered.p50)}, p99 ${ms(filtered.p99)}, recall@10 ${recall(filteredExact.results, filtered.results).toFixed(4)} (exact filtered p50 ${ms(filteredExact.p50)})`,
  );
} finally {
  rmSync(dir, { recursive: true, force: true });
}
