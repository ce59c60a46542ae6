import { describe, expect, it } from 'vitest';
import { formatThirds } from '../../src/text/formatThirds.ts';
import { parseThirds } from '../../src/ingest/parseThirds.ts';

describe('formatThirds(outs)', () => {
  it('writes 20 outs as 6.2 and 18 as 6.0 (thirds notation, common practice)', () => {
    expect(formatThirds(20)).toBe('6.2');
    expect(formatThirds(18)).toBe('6.0');
    expect(formatThirds(1)).toBe('0.1');
  });

  it('round-trips through the reader for every count of outs up to 1000', () => {
    for (let outs = 0; outs <= 1000; outs++) expect(parseThirds(formatThirds(outs))).toBe(outs);
  });
});
