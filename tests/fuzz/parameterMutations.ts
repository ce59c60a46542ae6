/**
 * Random command lines and API requests for the fuzz suite, made from the parameter table
 * (src/request/parameters.ts), so every parameter of every job is tried: plausible values, values
 * just outside their range, repeated dimensions, malformed ranges, overflowing numbers, hostile
 * text, and parameters a job does not take.
 */
import { PARAMETER_KEYS, PARAMETERS } from '../../src/request/parameters.ts';
import type { SeededRandom } from '../../src/random/SeededRandom.ts';

export const FUZZ_JOBS = ['comps', 'prospect', 'cheaper', 'match', 'dims'] as const;

/** Values tried for any parameter (a few plausible ones for each kind, the rest odd). */
const VALUES: readonly string[] = [
  '', '0', '1', '2', '-1', '3', '10', '50', '51', '200', '2.5', '0.5', '1.5', '1e309', '-1e309', 'NaN', 'Infinity', '9007199254740993', '0x10', '007',
  '2015', '2020', '9999', '1800', '2015-2020', '2020-2015', '20152020', '2015-', '-2020', '2015--2020', '21-24', '2530', '25-30', '30-25', '100', '-5-3',
  'obp=.300', 'obp=.300,obp=.400', 'obp=5', 'obp=60g', 'obp=90g', 'k_pct=.2,bb_pct=.1', 'obp=2,obp=0', 'obp=2', 'obp=-1', 'obp=1e309', 'nothing=1', 'obp',
  'pop_2b_s=1.90', 'fip=3.5,k_pct=.3', 'SS', 'SS,2B', 'C', 'SP', 'RP', 'XX', 'L', 'R', 'S', 'L,R', 'Q', 'Top', 'Elite', 'High,Elite', 'ZZZ',
  'json', 'csv', 'table', 'bat', 'glove', 'power', 'speed', 'results', 'stuff', 'command', 'redundancy', 'plain', 'IF', 'OF',
  '1000000', '0.000001', '\u001b[2J', '\u202eevil', '=1+1', '../etc/passwd', 'x'.repeat(3000), 'é', ' 5 ', '5,', ',', '%', '%00',
];

function pick<T>(rng: SeededRandom, list: readonly T[]): T {
  return list[rng.int(list.length)] as T;
}

/** A random command line against `store`: a job, targets from `players`, and random parameters. */
export function randomCommandLine(rng: SeededRandom, store: string, players: readonly string[]): string[] {
  const job = pick(rng, FUZZ_JOBS);
  const argv: string[] = [job];
  if (job !== 'dims' && !rng.chance(0.05)) argv.push(rng.chance(0.9) ? pick(rng, players) : pick(rng, VALUES));
  if (job === 'match') argv.push(rng.chance(0.9) ? pick(rng, players) : pick(rng, VALUES));
  argv.push('--store', store);
  const count = rng.int(5);
  for (let i = 0; i < count; i++) {
    const key = pick(rng, PARAMETER_KEYS);
    const p = PARAMETERS[key];
    if (p.positional || key === 'store' || key === 'batch') continue;
    const ownJob = p.jobs.some((j) => j === job);
    if (!ownJob && !rng.chance(0.1)) continue;
    argv.push(`--${p.name}`);
    if (p.value !== undefined) argv.push(pick(rng, VALUES));
  }
  if (rng.chance(0.05)) argv.push('--no-such-option');
  return argv;
}

/** A random API path with a query string (and sometimes an odd path or method). */
export function randomRequest(rng: SeededRandom, players: readonly string[]): { method: string; path: string } {
  const endpoints = ['comps', 'prospect', 'cheaper', 'match', 'players', 'dims', 'map', 'info'];
  const endpoint = pick(rng, endpoints);
  const query = new URLSearchParams();
  if (['comps', 'prospect', 'cheaper', 'match'].includes(endpoint) && rng.chance(0.9)) query.append('player', rng.chance(0.9) ? pick(rng, players) : pick(rng, VALUES));
  if (endpoint === 'match' && rng.chance(0.9)) query.append('candidate', pick(rng, players));
  const count = rng.int(5);
  for (let i = 0; i < count; i++) {
    const key = pick(rng, PARAMETER_KEYS);
    const p = PARAMETERS[key];
    if (p.only === 'cli') continue;
    query.append(p.name, p.value === undefined ? pick(rng, ['', 'true', 'false', '1', 'yes', 'x']) : pick(rng, VALUES));
  }
  if (rng.chance(0.03)) query.append('no_such_parameter', '1');
  let path = `/api/${endpoint}?${query.toString()}`;
  if (rng.chance(0.03)) path = pick(rng, ['/api/../manifest.json', '/%2e%2e/%2e%2e/etc/passwd', '/api/comps?player=%E0%A4%A', '/api/nothing', '/api/comps?' + 'k=1&'.repeat(2000), '/']);
  const method = rng.chance(0.03) ? pick(rng, ['POST', 'PUT', 'DELETE', 'HEAD']) : 'GET';
  return { method, path };
}
