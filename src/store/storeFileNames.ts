/**
 * The names of the files in a store folder and beside it, in one place. Every data file is listed in
 * the manifest (src/store/manifest.ts) with its size and sha256.
 */

/** Players (id, name, birth date, bats, throws), level names and contracts (a columns file). */
export const PLAYERS_FILE = 'players.bin';

/** What every player did at the top level, season by season (src/store/outcomesFile.ts). */
export const OUTCOMES_FILE = 'outcomes.json';

/** The latest backtest of the prospect outlook, written beside the manifest after the build (outside it). */
export const BACKTEST_FILE = 'backtest.json';

/**
 * The files of one position group: its JSON part, its rows (a columns file), the raw and standardised
 * matrices and its indexes. Profiles over windows of N >= 2 seasons are the group `<G>.w<N>`
 * (`group-IF.w3.json`, ...).
 */
export const groupFileNames = (
  group: string,
  window = 1,
): {
  json: string;
  rows: string;
  raw: string;
  z: string;
  index: string;
  partitionIndex: (i: number) => string;
  narrowIndex: (i: number) => string;
} => {
  const name = window === 1 ? group : `${group}.w${window}`;
  return {
    json: `group-${name}.json`,
    rows: `group-${name}.rows.bin`,
    raw: `group-${name}.raw.f32`,
    z: `group-${name}.z.f32`,
    index: `group-${name}.hnsw`,
    partitionIndex: (i: number) => `group-${name}.p${i}.hnsw`,
    narrowIndex: (i: number) => `group-${name}.p${i}.narrow.hnsw`,
  };
};

/** The files of a group's learned space: summary, model weights and every row's code. */
export const groupEmbeddingFileNames = (group: string): { summary: string; model: string; codes: string } => ({
  summary: `group-${group}.embedding.json`,
  model: `group-${group}.model.json`,
  codes: `group-${group}.codes.f64`,
});

/** Chart file names of a group inside `<store>.charts/`. */
export const groupChartNames = (group: string): { learning: string; drivers: string } => ({
  learning: `${group}-learning.svg`,
  drivers: `${group}-drivers.svg`,
});

/** The folder beside a store where its charts live: `<store>.charts`. */
export const chartsFolderOf = (storeDir: string): string => `${storeDir.replace(/\/+$/, '')}.charts`;
