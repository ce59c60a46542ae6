/**
 * Random edits of a JSON document for the fuzz suite: a value somewhere in the tree replaced by a
 * value of another kind or an extreme one, a key deleted or added, an array shortened or an element
 * repeated. Seeded: the same generator state gives the same edit.
 */
import type { SeededRandom } from '../../src/random/SeededRandom.ts';

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Odd values a careless or hostile edit might leave: extremes, wrong kinds, control and bidi text. */
export const ODD_VALUES: readonly Json[] = [
  null, true, false, 0, -1, 1, 0.5, -0.0001, 2 ** 31, 2 ** 32, -(2 ** 31) - 1, 2 ** 53, 1e308, -1e308, 1e-320,
  '', ' ', 'x', '0', '-1', 'NaN', '\u001b[2J\u001b]0;title\u0007', '\u202eevil', '=HYPERLINK("http://x")', '../../etc/passwd',
  'é'.repeat(3), 'a'.repeat(5000), [], [0], [null], {}, { a: 1 },
];

/** Every path to a value in the document (the root included), up to `limit` of them. */
function paths(doc: Json, limit = 20000): (string | number)[][] {
  const out: (string | number)[][] = [];
  const walk = (node: Json, path: (string | number)[]): void => {
    if (out.length >= limit) return;
    out.push(path);
    if (Array.isArray(node)) node.forEach((v, i) => walk(v, [...path, i]));
    else if (node !== null && typeof node === 'object') for (const [k, v] of Object.entries(node)) walk(v, [...path, k]);
  };
  walk(doc, []);
  return out;
}

function pick<T>(rng: SeededRandom, list: readonly T[]): T {
  return list[rng.int(list.length)] as T;
}

/** A changed value for `old`: a nearby number, an odd value, or another kind. */
function changed(rng: SeededRandom, old: Json): Json {
  if (typeof old === 'number' && rng.chance(0.5)) {
    return pick(rng, [old + 1, old - 1, -old, old * 2, Math.floor(old / 2), old + 0.5, old * 1e6]);
  }
  if (typeof old === 'string' && rng.chance(0.4)) return pick(rng, [old + old, old.slice(1), old.toUpperCase(), `${old}\u0000`, `${old}\u202e`]);
  return pick(rng, ODD_VALUES);
}

/**
 * Applies one random edit to the JSON text and returns the new text and what was done; `null` when
 * the text is not JSON (then the caller edits bytes instead).
 */
export function editJson(rng: SeededRandom, text: string): { text: string; what: string } | null {
  let doc: Json;
  try {
    doc = JSON.parse(text);
  } catch {
    return null;
  }
  const all = paths(doc);
  const path = pick(rng, all);
  const where = path.length === 0 ? '(root)' : path.join('.');
  const parentPath = path.slice(0, -1);
  let parent: Json = doc;
  for (const p of parentPath) parent = (parent as Record<string | number, Json>)[p] as Json;
  const last = path[path.length - 1];
  let node: Json = doc;
  for (const p of path) node = (node as Record<string | number, Json>)[p] as Json;
  const op = rng.int(5);
  if (path.length === 0) {
    return { text: JSON.stringify(changed(rng, doc)), what: `root replaced` };
  }
  if (op === 0 && Array.isArray(parent) && typeof last === 'number') {
    parent.splice(last, 1);
    return { text: JSON.stringify(doc), what: `${where} removed from its array` };
  }
  if (op === 1 && Array.isArray(parent) && typeof last === 'number') {
    parent.splice(last, 0, structuredClone(node));
    return { text: JSON.stringify(doc), what: `${where} repeated in its array` };
  }
  if (op === 2 && !Array.isArray(parent) && parent !== null && typeof parent === 'object' && typeof last === 'string') {
    if (rng.chance(0.5)) {
      delete parent[last];
      return { text: JSON.stringify(doc), what: `${where} deleted` };
    }
    parent[`${last}_extra`] = changed(rng, node);
    return { text: JSON.stringify(doc), what: `key ${last}_extra added beside ${where}` };
  }
  const value = changed(rng, node);
  (parent as Record<string | number, Json>)[last as string | number] = value;
  const shown = JSON.stringify(value) ?? String(value);
  return { text: JSON.stringify(doc), what: `${where} set to ${shown.length > 40 ? `${shown.slice(0, 40)}...` : shown}` };
}
