/**
 * The league simulator: an invented professional league (levels Entry, Low, Mid,
 * High, Elite, Top) whose players' true talents are known, for the demo, the
 * end-to-end tests and the benchmarks.
 *
 * Model in brief (details in each module's doc comment):
 * - Hitters have seven latent talents (contact, power, eye, speed, glove, arm,
 *   catcherThrow) and pitchers six (stuff, control, groundball, velocity,
 *   spin, stamina), standard normal among professionals at their peak
 *   (drawTalents). Positions follow talents: catchers are a separate pool,
 *   SS and CF take range and speed, 1B and DH the weakest gloves
 *   (choosePosition); pitchers start or relieve by stamina.
 * - A season's true talent = peak + age curve (growth to the mid/late
 *   twenties, decline from about 30; ageCurve, talentCurves) + a slow random
 *   walk. The truth table (SimTruth) holds exactly this vector.
 * - Observed lines (battingLine, fieldingLine, pitchingLine) shift outcome
 *   talents by level difficulty and draw counts as binomials, so noise shrinks
 *   with the sample; several stats share one talent on purpose (ISO, HR, EV,
 *   hard-hit% on power; K% and whiff% on stuff or contact; BB% on eye or
 *   control). Hitters and pitchers are simulated independently (not against
 *   each other).
 * - Careers (simulateCareer): entry at 17 to 23, promotion, demotion,
 *   release and retirement by value, showing and age; about one entrant in
 *   six or seven reaches the top level; careers running at the last season are censored
 *   (players.active).
 * - Measurement availability (MeasuredFrom; missing cells are empty, never
 *   0): batted-ball columns and run speed from lastSeason - 9, arm
 *   velocity and catcher pop/exchange from lastSeason - 7, pitch tracking
 *   from lastSeason - 9, all only at High and above; gb_pct from
 *   lastSeason - 15 at every level. `sb_against` counts stolen-base attempts
 *   against a catcher (stolen plus caught), so cs_caught <= sb_against.
 * - Salaries (salary): top-level seasons only, for about 92% of them.
 * - League parameters (SimOptions, all defaulting to the demo league's): the
 *   level count (minorLevels, simLadder), promotion margin and chance, the
 *   noise of a season's showing and of its stat lines, era drift of the run
 *   environment, and a first season for minor-league records. bench/leagues.ts
 *   holds the standard set of varied leagues the modelling benches use.
 * Everything is a pure function of the seed (SeededRandom).
 */
export { simulateLeague, resolveSimOptions } from './simulateLeague.ts';
export { writeLeagueCsv } from './writeLeagueCsv.ts';
export { cellText } from './cellText.ts';
export { SimTruth, playerIndexOf, type SeasonTruth } from './SimTruth.ts';
export { ColumnTable, type ColumnSpec, type ColumnFormat } from './ColumnTable.ts';
export { SeededRandom } from '../random/SeededRandom.ts';
export { HITTER_TALENTS, PITCHER_TALENTS, TALENT_NAMES, type SimKind } from './talentNames.ts';
export { SIM_LEVELS } from './levelTable.ts';
export { simLadder, type SimLadder } from './simLadder.ts';
export { SIM_POSITIONS } from './simPositions.ts';
export { DEMO_OPTIONS } from './demoOptions.ts';
export type { SimOptions, ResolvedSimOptions, SimLeague, SimPlayers, MeasuredFrom } from './simTypes.ts';
