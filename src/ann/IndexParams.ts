/** Parameters of an HNSW build (Malkov & Yashunin 2016, arXiv:1603.09320). */
export interface IndexParams {
  /** Links per node on the upper layers (layer 0 gets 2M). */
  readonly M: number;
  /** Candidate list size while inserting. */
  readonly efConstruction: number;
  /** Candidate list size while searching (raised to k for a query when smaller). */
  readonly ef: number;
  /** Seed of the level generator; with the same seed and insertion order builds are byte-identical. */
  readonly seed: number;
}

/** What must be known, from a verified manifest, to load a saved index (the file does not carry dim or ef). */
export interface IndexMeta {
  readonly dim: number;
  readonly count: number;
  readonly M: number;
  readonly efConstruction: number;
  readonly ef: number;
}

/** Nearest neighbours, closest first. Distances are squared Euclidean (L2 without the root). */
export interface IndexHits {
  readonly labels: number[];
  readonly distances: number[];
}

/** A predicate on labels (row indices): true keeps the row. */
export type LabelFilter = (label: number) => boolean;
