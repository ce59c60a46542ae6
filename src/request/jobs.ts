/** The jobs a request can ask for, by the name both front ends use (`kindred comps`, `/api/comps`). */
export const JOBS = ['comps', 'prospect', 'cheaper', 'match', 'dims', 'players', 'map', 'backtest'] as const;
export type JobName = (typeof JOBS)[number];

/** The jobs answered from a target and a pool: they share the target and pool parameters. */
export const COMPS_JOBS = ['comps', 'prospect', 'cheaper', 'match'] as const satisfies readonly JobName[];
