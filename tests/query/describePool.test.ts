/** The pool's rules in words (no option names, no "..." for an open end). Expected texts written by hand. */
import { describe, expect, it } from 'vitest';
import { describePool } from '../../src/query/describePool.ts';

describe('describePool', () => {
  it('says the worked example of its doc comment', () => {
    expect(describePool({ positions: ['SS'], levels: ['AA', 'AAA'], minSample: 250 }, { unit: 'PA', min: 250, share: 0.5, target_sample: 500, target_sample_from: 'target' }, 'IF'))
      .toBe('SS; at AA, AAA; 250 PA or more (50% of the target\u2019s 500)');
  });
  it('says an open-ended season or age range in words: "seasons to 2017", "ages from 22"', () => {
    const text = describePool({ levels: ['High'], seasonTo: 2017, ageMin: 22 }, null, 'IF');
    expect(text).toBe('every IF position; at High; seasons to 2017; ages from 22; any PA');
    expect(text).not.toContain('...');
  });
  it('says a closed range with a dash, a single season or age once, and BF for pitchers', () => {
    expect(describePool({ seasonFrom: 2015, seasonTo: 2020, ageMin: 21, ageMax: 21 }, null, 'RP')).toBe('every RP position; every level; seasons 2015-2020; age 21; any BF');
    expect(describePool({ seasonFrom: 2018, seasonTo: 2018 }, null, 'SP')).toBe('every SP position; every level; season 2018; any BF');
  });
});
