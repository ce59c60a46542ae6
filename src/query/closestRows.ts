import type { PackedRows } from './packPartition.ts';

/**
 * The `c` rows with the smallest missing-aware distance (see missingAwareDistance) to a target among
 * the packed rows (packPartition) that pass `mask` and share at least `minCoverage` of the target's
 * weight, by a scan over only the packed dimensions (those the rows may have) that the target has.
 * Closest first; between equal distances the smaller row. A bounded max-heap keeps the best `c`, so a
 * scan allocates nothing per row.
 *
 * The rows must lack every dimension the target has outside the packed ones (as the rows of one
 * coverage partition do), so that the distance over them is the distance over all dimensions.
 *
 * @example
 * // target [0, 1], rows 0..2 = [0, 0], [5, 5], [0, 1], weights 1: closestRows(..., c = 2) -> [2, 0]
 */
export function closestRows(
  target: Float64Array,
  packed: PackedRows,
  mask: Uint8Array,
  weights: Float64Array,
  targetWeight: number,
  minCoverage: number,
  c: number,
): number[] {
  const { rows, dims, values } = packed;
  const m = dims.length;
  const js = new Int32Array(m);
  const ws = new Float64Array(m);
  const ts = new Float64Array(m);
  let used = 0;
  for (let k = 0; k < m; k++) {
    const j = dims[k] as number;
    const w = weights[j] as number;
    const t = target[j] as number;
    if (w === 0 || Number.isNaN(t)) continue;
    js[used] = k;
    ws[used] = w;
    ts[used] = t;
    used++;
  }
  const cap = Math.max(0, c);
  if (used === 0 || cap === 0 || !(targetWeight > 0)) return [];
  const heapD = new Float64Array(cap);
  const heapR = new Int32Array(cap);
  let size = 0;
  const minShared = minCoverage * targetWeight;
  let sharedAll = 0;
  for (let k = 0; k < used; k++) sharedAll += ws[k] as number;
  // Once the heap is full, a row whose partial sum passes `limit` cannot come closer than the worst kept
  // row: its distance is at least sum * targetWeight / sharedAll (it shares at most every scanned
  // dimension), so the rest of its dimensions are not read. Kept rows' distances are summed in the
  // same order as before, so the result is unchanged; the small margin covers rounding in `limit`.
  let limit = Infinity;
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i] as number;
    if (mask[r] !== 1) continue;
    const base = i * m;
    let sum = 0;
    let shared = 0;
    for (let k = 0; k < used; k++) {
      const v = values[base + (js[k] as number)] as number;
      if (v !== v) continue;
      const diff = (ts[k] as number) - v;
      const w = ws[k] as number;
      sum += w * diff * diff;
      shared += w;
      if (sum > limit) break;
    }
    if (sum > limit || shared === 0 || !(shared >= minShared)) continue;
    const d2 = (sum * targetWeight) / shared;
    if (size < cap) {
      // sift up
      let at = size++;
      while (at > 0) {
        const parent = (at - 1) >> 1;
        if (!worse(d2, r, heapD[parent] as number, heapR[parent] as number)) break;
        heapD[at] = heapD[parent] as number;
        heapR[at] = heapR[parent] as number;
        at = parent;
      }
      heapD[at] = d2;
      heapR[at] = r;
    } else if (worse(heapD[0] as number, heapR[0] as number, d2, r)) {
      // replace the worst kept row, sift down
      let at = 0;
      for (;;) {
        const left = 2 * at + 1;
        if (left >= size) break;
        const right = left + 1;
        const child =
          right < size && worse(heapD[right] as number, heapR[right] as number, heapD[left] as number, heapR[left] as number) ? right : left;
        if (!worse(heapD[child] as number, heapR[child] as number, d2, r)) break;
        heapD[at] = heapD[child] as number;
        heapR[at] = heapR[child] as number;
        at = child;
      }
      heapD[at] = d2;
      heapR[at] = r;
    }
    if (size === cap) limit = ((heapD[0] as number) * sharedAll * (1 + 1e-9)) / targetWeight;
  }
  const order = Array.from({ length: size }, (_, i) => i);
  order.sort((a, b) => (heapD[a] as number) - (heapD[b] as number) || (heapR[a] as number) - (heapR[b] as number));
  return order.map((i) => heapR[i] as number);
}

/** True when (da, ra) ranks after (db, rb): farther, or as far and a larger row. */
function worse(da: number, ra: number, db: number, rb: number): boolean {
  return da > db || (da === db && ra > rb);
}
