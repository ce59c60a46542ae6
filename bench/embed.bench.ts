/**
 * Training time of the default autoencoder on 100,000 invented profiles x 24 dimensions
 * (6 latent factors through a mild non-linearity plus noise, 5% missing, 4 seasons per player).
 * Run: node --import tsx bench/embed.bench.ts [rows]
 */
import { SeededRandom } from '../src/random/SeededRandom.ts';
import type { EmbedData } from '../src/embed/EmbedData.ts';
import { fitPcaEmbedding } from '../src/embed/fitPcaEmbedding.ts';
import { trainAutoencoder } from '../src/embed/trainAutoencoder.ts';
import { DEFAULT_TRAIN_OPTIONS } from '../src/embed/TrainOptions.ts';
import { evaluateReconstruction } from '../src/embed/evaluateReconstruction.ts';
import { attributeDistance } from '../src/embed/attributeDistance.ts';
import { aim } from './lib/aim.ts';

function structuredData(n: number, d: number, factors: number, seed: number): EmbedData {
  const rng = new SeededRandom(seed);
  const loadings = Float64Array.from({ length: factors * d }, () => rng.normal() / Math.sqrt(factors));
  const x = new Float64Array(n * d);
  const groups: string[] = [];
  const f = new Float64Array(factors);
  for (let i = 0; i < n; i++) {
    if (i % 4 === 0) for (let k = 0; k < factors; k++) f[k] = rng.normal();
    groups.push(`p${Math.floor(i / 4)}`);
    for (let j = 0; j < d; j++) {
      let s = 0;
      for (let k = 0; k < factors; k++) s += (f[k] ?? 0) * (loadings[k * d + j] ?? 0);
      const v = Math.tanh(s) + 0.3 * rng.normal();
      x[i * d + j] = rng.next() < 0.05 ? NaN : v;
    }
  }
  // standardise each column over present values
  for (let j = 0; j < d; j++) {
    let sum = 0, sq = 0, c = 0;
    for (let i = 0; i < n; i++) { const v = x[i * d + j] ?? NaN; if (!Number.isNaN(v)) { sum += v; sq += v * v; c++; } }
    const mean = sum / c, sd = Math.sqrt(sq / c - mean * mean);
    for (let i = 0; i < n; i++) x[i * d + j] = ((x[i * d + j] ?? NaN) - mean) / sd;
  }
  return { x, n, d, groups };
}

const n = Number(process.argv[2] ?? 100_000);
const data = structuredData(n, 24, 6, 42);
const result = trainAutoencoder(data, { seed: 1 });
const o = DEFAULT_TRAIN_OPTIONS;
console.log(`rows ${n} x 24 dims, network 24-${o.hidden.join('-')}-${o.latent}-${[...o.hidden].reverse().join('-')}-24 ${o.activation}, batch ${o.batchSize}, lr ${o.learningRate}, dropout ${o.dropout}`);
// the training aim is for 100,000 profiles: one minute
const trainingAim = n >= 100_000 ? ` ${aim(`autoencoder training at ${n} rows`, result.seconds, { below: 60, unit: 's' })}` : '';
console.log(`training ${result.seconds.toFixed(1)} s, ${result.stoppedEpoch} epochs (best ${result.bestEpoch}), ${(result.seconds / result.stoppedEpoch).toFixed(2)} s/epoch${trainingAim}`);
console.log(`val MSE ${result.history.val[result.bestEpoch - 1]?.toFixed(4)}, train (as trained) ${result.history.train[result.bestEpoch - 1]?.toFixed(4)}`);
const t0 = performance.now();
const pca = fitPcaEmbedding(data, o.latent);
console.log(`PCA k=${o.latent}: fit ${((performance.now() - t0) / 1000).toFixed(2)} s, reconstruction MSE (all rows) ${pca.reconstructionError(data).toFixed(4)}; autoencoder (all rows) ${evaluateReconstruction(result.model, data).toFixed(4)}`);

// Attribution cost per comp with the trained model (d = 24: sampled; 12 dimensions in play: exact).
const encode = (v: Float64Array): Float64Array => result.model.encode(v);
const target = data.x.slice(0, 24);
const comp = data.x.slice(24 * 100, 24 * 101);
let t = performance.now();
const sampled = attributeDistance(encode, target, comp, { samples: 1000, seed: 1 });
const sampledMs = performance.now() - t;
const maxSe = Math.max(...sampled.standardError);
const half = comp.slice();
for (let j = 12; j < 24; j++) half[j] = target[j] ?? NaN;
t = performance.now();
const exact = attributeDistance(encode, target, half);
console.log(`attribution: ${sampled.players} dims sampled (1000 permutations) ${sampledMs.toFixed(0)} ms, max standard error ${maxSe.toFixed(4)} of total ${sampled.total.toFixed(3)}; ${exact.players} dims exact ${(performance.now() - t).toFixed(0)} ms`);
