/**
 * Which way a measurement is good: `higher` when a larger value is better (OBP), `lower` when a
 * smaller one is (pop time), `neither` when it describes a style rather than a skill (launch angle).
 */
export type Direction = 'higher' | 'lower' | 'neither';
