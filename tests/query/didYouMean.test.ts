import { describe, expect, it } from 'vitest';
import { didYouMean } from '../../src/query/didYouMean.ts';

// Reference: Levenshtein edit distance (Levenshtein 1966): insertions, deletions and substitutions
// each cost 1; the textbook example kitten -> sitting is 3 edits. Distances below worked by hand.
describe('didYouMean(word, candidates)', () => {
  it('gives the doc example: obpp is one deletion from obp', () => {
    expect(didYouMean('obpp', ['obp', 'slg'])).toBe('obp');
  });
  it('prefers the candidate fewest edits away', () => {
    // sprnt -> sprint: 1 insertion; sprnt -> spin: 3 edits
    expect(didYouMean('sprnt', ['spin', 'sprint'])).toBe('sprint');
  });
  it('stays silent when the best candidate is more than a third of the word away', () => {
    // kitten -> sitting is 3 edits; a third of 6 letters allows 2
    expect(didYouMean('kitten', ['sitting'])).toBeUndefined();
    // kitten -> sittin is 2 edits: suggested
    expect(didYouMean('kitten', ['sittin'])).toBe('sittin');
  });
  it('allows one edit in short words', () => {
    expect(didYouMean('bb', ['b', 'hr'])).toBe('b');
  });
});
