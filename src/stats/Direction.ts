/** Which way a measurement is good: `higher` when a larger value is better, `lower` when a smaller one is. */
export type Direction = 'higher' | 'lower';
