import { StoreError } from '../errors/KindredError.ts';
import { embeddingModelFromJSON, modelCodeSize, modelInputSize } from '../embed/EmbeddingModel.ts';
import { scaledEncoder } from '../embed/scaledEncoder.ts';
import { bytesToFloat64 } from './float64Bytes.ts';
import { GROUP_EMBEDDING_VERSION, groupEmbeddingSchema } from './groupEmbeddingFile.ts';
import type { OpenStore } from './openStore.ts';
import { corruptFile, parseJsonText } from './parseStoreJson.ts';
import type { StoredEmbedding } from './StoredEmbedding.ts';
import { groupEmbeddingFileNames } from './storeFileNames.ts';

const corrupt = (dir: string, file: string, what: string): StoreError => corruptFile(`${dir}/${file}`, what);
const parseJson = (text: string, dir: string, file: string): unknown => parseJsonText(text, `${dir}/${file}`);

/**
 * Reads a group's embedding from a store (each file's size and sha256 are checked against the manifest
 * as it is read, so a changed byte in the model, codes or summary is refused before it is parsed):
 * parses the summary (format tag, version, shape) and the model (PcaEmbedding or Autoencoder JSON,
 * each checks its own tag and shape), and checks that they agree with the group (space, d, code size,
 * n codes of that size, one driver per dimension). Any mismatch is StoreError `kindred.store.corrupt`.
 */
export function readGroupEmbedding(
  store: OpenStore,
  group: string,
  expected: { readonly space: 'pca' | 'autoencoder'; readonly dim: number; readonly d: number; readonly n: number; readonly dims: readonly string[] },
): StoredEmbedding {
  const dir = store.dir;
  const names = groupEmbeddingFileNames(group);
  const parsed = groupEmbeddingSchema.safeParse(parseJson(store.readTextSync(names.summary), dir, names.summary));
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw corrupt(dir, names.summary, `unexpected content at ${issue?.path.join('.') ?? '?'}: ${issue?.message ?? 'invalid'}`);
  }
  const summary = parsed.data;
  if (summary.version !== GROUP_EMBEDDING_VERSION) {
    throw new StoreError('kindred.store.version', `${dir}/${names.summary}: version ${summary.version} (expected ${GROUP_EMBEDDING_VERSION}); rebuild the store`, { file: names.summary });
  }
  let model;
  try {
    model = embeddingModelFromJSON(parseJson(store.readTextSync(names.model), dir, names.model));
  } catch (e) {
    if (e instanceof StoreError) throw corrupt(dir, names.model, e.message);
    throw e;
  }
  const codes = bytesToFloat64(store.readBytesSync(names.codes));
  const dim = modelCodeSize(model);
  const problems: string[] = [];
  if (model.space !== expected.space || summary.space !== expected.space) problems.push(`space ${model.space}/${summary.space} (expected ${expected.space})`);
  if (modelInputSize(model) !== expected.d || summary.d !== expected.d) problems.push(`input size ${modelInputSize(model)} (expected ${expected.d})`);
  if (dim !== expected.dim || summary.dim !== expected.dim) problems.push(`code size ${dim} (expected ${expected.dim})`);
  if (codes.length !== expected.n * expected.dim || summary.n !== expected.n) problems.push(`${codes.length} code values (expected ${expected.n} x ${expected.dim})`);
  const driverNames = summary.drivers.dims.map((x) => x.name);
  if (summary.input_scale.length !== expected.d) problems.push(`${summary.input_scale.length} input scales (expected ${expected.d})`);
  if (driverNames.join(',') !== expected.dims.join(',')) problems.push(`drivers for ${driverNames.join(',')} (expected ${expected.dims.join(',')})`);
  for (const v of codes) {
    if (!Number.isFinite(v)) {
      problems.push('a code value that is not a finite number');
      break;
    }
  }
  if (problems.length > 0) throw corrupt(dir, names.summary, `does not match the group: ${problems.join('; ')}`);
  const encoder = model.model;
  return {
    space: model.space,
    d: expected.d,
    dim,
    encode: scaledEncoder((x) => encoder.encode(x), Float64Array.from(summary.input_scale)),
    codes,
    pairScale: summary.pair_scale,
    drivers: Float64Array.from(summary.drivers.dims, (x) => x.mean_abs),
    summary,
  };
}
