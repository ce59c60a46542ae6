/**
 * The candidate nearest to a mistyped word by Levenshtein edit distance (Levenshtein 1966), if it is
 * within a third of the word's length; undefined otherwise. For "did you mean" hints.
 *
 * @example
 * didYouMean('obpp', ['obp', 'slg']); // => 'obp'
 */
export function didYouMean(word: string, candidates: readonly string[]): string | undefined {
  let best: string | undefined;
  let bestDistance = Math.max(1, Math.floor(word.length / 3)) + 1;
  for (const c of candidates) {
    const d = editDistance(word, c);
    if (d < bestDistance) {
      best = c;
      bestDistance = d;
    }
  }
  return best;
}

/** Levenshtein (1966) edit distance: insertions, deletions and substitutions of one character. */
export function editDistance(a: string, b: string): number {
  let prev = Array.from({ length: b.length + 1 }, (_, i) => i);
  for (let i = 1; i <= a.length; i++) {
    const cur = [i];
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      cur.push(Math.min((prev[j] ?? Infinity) + 1, (cur[j - 1] ?? Infinity) + 1, (prev[j - 1] ?? Infinity) + cost));
    }
    prev = cur;
  }
  return prev[b.length] ?? Infinity;
}

