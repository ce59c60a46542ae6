/** What every listing shows of a comp's playing time: PA for hitters, BF and IP for pitchers. */
export interface PlayingTime {
  readonly sample: number;
  readonly sample_unit: 'PA' | 'BF';
  readonly ip: string | null;
}

/** The playing-time headings of a listing: `PA`, or `BF` and `IP` for pitchers. */
export function playingTimeHeads(unit: 'PA' | 'BF'): string[] {
  return unit === 'BF' ? ['BF', 'IP'] : ['PA'];
}

/** One comp's playing-time cells under playingTimeHeads: `412`, or `612` and `150.1`. */
export function playingTimeCells(c: PlayingTime): string[] {
  return c.sample_unit === 'BF' ? [String(c.sample), c.ip ?? '-'] : [String(c.sample)];
}
