/**
 * The levels of the invented league, low to high, with the constants the
 * simulator uses for each. Names and figures are project choices (invented),
 * tuned so that the output looks like a professional ladder: an entry level
 * with a short season, four full-season levels below the top and the top
 * level. The simulator writes them to levels.csv in this order, so the top
 * level is the roster's own highest declared level.
 */
export const SIM_LEVELS = ['Entry', 'Low', 'Mid', 'High', 'Elite', 'Top'] as const;
export type SimLevel = (typeof SIM_LEVELS)[number];

export const LEVEL_ENTRY = 0;
export const LEVEL_HIGH = 3;
export const LEVEL_ELITE = 4;
export const LEVEL_TOP = 5;

/** Games in a team's season. */
export const SEASON_GAMES: readonly number[] = [56, 132, 132, 138, 144, 162];

/** Plate appearances of an everyday hitter over a full season. */
export const FULL_PA: readonly number[] = [230, 520, 530, 540, 550, 620];

/** Starts of a rotation regular over a full season. */
export const FULL_STARTS: readonly number[] = [11, 25, 25, 26, 27, 32];

/** Appearances of a bullpen regular over a full season. */
export const FULL_RELIEF_GAMES: readonly number[] = [18, 40, 42, 45, 48, 64];

/**
 * Current value (in talent units, see valueOf) a player must show to be
 * promoted into the level; Entry takes anyone.
 */
export const LEVEL_BAR: readonly number[] = [-Infinity, -1.15, -0.6, -0.1, 0.4, 1.15];

/** Typical age (on June 30) of a player at the level; older players there are released sooner. */
export const TYPICAL_AGE: readonly number[] = [19, 20.5, 21.5, 23, 24.5, 27];

/**
 * Shift added to outcome talents (not to physical measurements) at each
 * level: lower levels face weaker opposition, so a given talent produces
 * better rates there. 0 at the top level.
 */
export const LEVEL_SHIFT: readonly number[] = [1.15, 0.9, 0.65, 0.4, 0.2, 0];
