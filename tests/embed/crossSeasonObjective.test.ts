import { EigenvalueDecomposition, Matrix, QrDecomposition, SingularValueDecomposition } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { crossSeasonPairs } from '../../src/embed/crossSeasonPairs.ts';
import type { EmbedData } from '../../src/embed/EmbedData.ts';
import { evaluateReconstruction } from '../../src/embed/evaluateReconstruction.ts';
import type { Autoencoder } from '../../src/embed/Autoencoder.ts';
import { trainAutoencoder } from '../../src/embed/trainAutoencoder.ts';
import type { TrainOptions } from '../../src/embed/TrainOptions.ts';
import { SeededRandom } from '../../src/random/SeededRandom.ts';

/**
 * Principal angles between the column spaces of a and b (Bjorck and Golub 1973, "Numerical methods for
 * computing angles between linear subspaces", Math. Comp. 27): orthonormal bases Qa, Qb by QR, then the
 * cosines are the singular values of Qa' Qb. QR and SVD by ml-matrix. Returned in degrees, largest first.
 */
function principalAngles(a: Matrix, b: Matrix): number[] {
  const qa = new QrDecomposition(a).orthogonalMatrix.subMatrix(0, a.rows - 1, 0, a.columns - 1);
  const qb = new QrDecomposition(b).orthogonalMatrix.subMatrix(0, b.rows - 1, 0, b.columns - 1);
  const cosines = new SingularValueDecomposition(qa.transpose().mmul(qb)).diagonal;
  return cosines.map((c) => (Math.acos(Math.min(1, c)) * 180) / Math.PI).sort((p, q) => q - p);
}

/**
 * Invented planted structure (simulation only): d = 8; each player has a 2-number talent s ~ N(0, I) that
 * both his seasons share through loadings A (columns e1 + e2 and e3 - e4, scaled to unit length); each
 * season adds its own noise: sd 2 along two directions B (e5, e6 + e7) orthogonal to A, and sd 0.3 on
 * every dimension. Per season the noise directions carry 4 times the signal's variance, so a plain
 * autoencoder's code follows them (Baldi and Hornik 1989: a linear one spans the top principal
 * subspace, here B's), while the other season shares only A s.
 */
function planted(players: number, seed: number): { data: EmbedData; seasons: number[]; signal: Matrix } {
  const d = 8;
  const r = Math.SQRT1_2;
  const a = [
    [r, r, 0, 0, 0, 0, 0, 0],
    [0, 0, r, -r, 0, 0, 0, 0],
  ];
  const b = [
    [0, 0, 0, 0, 1, 0, 0, 0],
    [0, 0, 0, 0, 0, r, r, 0],
  ];
  const rng = new SeededRandom(seed);
  const x = new Float64Array(players * 2 * d);
  const groups: string[] = [];
  const seasons: number[] = [];
  for (let p = 0; p < players; p++) {
    const s = [rng.normal(), rng.normal()];
    for (let t = 0; t < 2; t++) {
      const row = (2 * p + t) * d;
      const e = [2 * rng.normal(), 2 * rng.normal()];
      for (let j = 0; j < d; j++) {
        let v = 0.3 * rng.normal();
        for (let k = 0; k < 2; k++) v += (s[k] ?? 0) * (a[k]?.[j] ?? 0) + (e[k] ?? 0) * (b[k]?.[j] ?? 0);
        x[row + j] = v;
      }
      groups.push(`p${p}`);
      seasons.push(2020 + t);
    }
  }
  return { data: { x, n: players * 2, d, groups }, seasons, signal: new Matrix(a).transpose() };
}

/** The input directions a model's code reads: least-squares coefficients of the codes on the inputs (d x latent). */
function encoderSubspace(model: Autoencoder, data: EmbedData): Matrix {
  const rows: number[][] = [];
  const codes: number[][] = [];
  for (let i = 0; i < data.n; i++) {
    const v = data.x.subarray(i * data.d, (i + 1) * data.d);
    rows.push([1, ...v]);
    codes.push(Array.from(model.encode(v)));
  }
  const X = new Matrix(rows);
  const coef = new SingularValueDecomposition(X).solve(new Matrix(codes));
  return coef.subMatrix(1, data.d, 0, coef.columns - 1);
}

const TRAIN: Partial<TrainOptions> = { latent: 2, dropout: 0, l2: 0, batchSize: 64, learningRate: 0.01, maxEpochs: 300, patience: 30, minDelta: 1e-6, seed: 5 };

describe('the cross-season objective on a planted structure (two seasons sharing a 2-dimensional signal, independent noise)', () => {
  const { data, seasons, signal } = planted(600, 17);
  const pairs = crossSeasonPairs(data, seasons);
  const crossData: EmbedData = { x: pairs.x, y: pairs.y, n: pairs.n, d: pairs.d, groups: pairs.groups };

  for (const [name, shape] of [['linear', { hidden: [], activation: 'identity' }], ['tanh, hidden 8', { hidden: [8], activation: 'tanh' }]] as const) {
    it(`${name}: the cross-season code reads the signal's subspace (largest principal angle under 15 degrees), the plain autoencoder's does not (over 60)`, () => {
      const options = { ...TRAIN, hidden: [...shape.hidden], activation: shape.activation };
      const plain = trainAutoencoder(data, options).model;
      const cross = trainAutoencoder(crossData, options).model;
      const plainAngles = principalAngles(encoderSubspace(plain, data), signal);
      const crossAngles = principalAngles(encoderSubspace(cross, data), signal);
      expect(crossAngles[0]).toBeLessThan(15);
      expect(plainAngles[0]).toBeGreaterThan(60);
      expect(crossAngles[0]).toBeLessThan(plainAngles[0] ?? 0);
    });
  }

  it('principal angles: two planes of R^3 meeting in a line at 30 degrees give angles 30 and 0 (worked example)', () => {
    const c = Math.cos(Math.PI / 6);
    const s = Math.sin(Math.PI / 6);
    const angles = principalAngles(new Matrix([[1, 0], [0, 1], [0, 0]]), new Matrix([[1, 0], [0, c], [0, s]]));
    expect(angles[0]).toBeCloseTo(30, 6);
    expect(angles[1]).toBeCloseTo(0, 6);
  });
});

describe('the linear cross-season variant is a reduced-rank regression', () => {
  it('a linear encoder and decoder (latent 2) trained to give back the other season reach the reduced-rank regression optimum within 1%', () => {
    // Source: Izenman 1975, "Reduced-rank regression for the multivariate linear model", J. Multivariate
    // Anal. 5: with identity weighting the best rank-k linear map from X to Y is B V_k V_k', B the
    // least-squares coefficients and V_k the top k eigenvectors of Yhat' Yhat (Yhat = X B). Computed here
    // on centred complete data with ml-matrix, not with the project's code.
    const { data, seasons } = planted(200, 23);
    const pairs = crossSeasonPairs(data, seasons);
    const centre = (v: Float64Array): Matrix => {
      const m = new Matrix(pairs.n, pairs.d);
      for (let i = 0; i < pairs.n; i++) for (let j = 0; j < pairs.d; j++) m.set(i, j, v[i * pairs.d + j] ?? 0);
      return m.subRowVector(m.mean('column'));
    };
    const X = centre(pairs.x);
    const Y = centre(pairs.y);
    const B = new SingularValueDecomposition(X).solve(Y);
    const fitted = X.mmul(B);
    const eig = new EigenvalueDecomposition(fitted.transpose().mmul(fitted));
    const order = eig.realEigenvalues.map((v, i) => [v, i] as const).sort((p, q) => q[0] - p[0]).map(([, i]) => i);
    const V = new Matrix(pairs.d, 2);
    order.slice(0, 2).forEach((col, k) => {
      for (let j = 0; j < pairs.d; j++) V.set(j, k, eig.eigenvectorMatrix.get(j, col));
    });
    const residual = Matrix.sub(Y, fitted.mmul(V).mmul(V.transpose()));
    const reference = residual.pow(2).sum() / (pairs.n * pairs.d);
    const data2: EmbedData = { x: pairs.x, y: pairs.y, n: pairs.n, d: pairs.d, groups: pairs.groups };
    const result = trainAutoencoder(data2, { hidden: [], activation: 'identity', latent: 2, dropout: 0, l2: 0, valFraction: 0, batchSize: pairs.n, learningRate: 0.03, maxEpochs: 4000, patience: 300, minDelta: 1e-8, seed: 3 });
    const mse = evaluateReconstruction(result.model, data2);
    expect(mse).toBeGreaterThanOrEqual(reference * 0.999);
    expect(mse).toBeLessThan(reference * 1.01);
  });
});
