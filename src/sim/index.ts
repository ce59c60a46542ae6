/** The league simulator: invented players, careers and stat lines with known true talents. */
export { simulateLeague, resolveSimOptions } from './simulateLeague.ts';
export { writeLeagueCsv } from './writeLeagueCsv.ts';
export { cellText } from './cellText.ts';
export { SimTruth, playerIndexOf, type SeasonTruth } from './SimTruth.ts';
export { ColumnTable, type ColumnSpec, type ColumnFormat } from './ColumnTable.ts';
export { SeededRandom } from './random.ts';
export { HITTER_TALENTS, PITCHER_TALENTS, TALENT_NAMES, type SimKind } from './talentNames.ts';
export { SIM_LEVELS } from './levelTable.ts';
export { SIM_POSITIONS } from './simPositions.ts';
export type { SimOptions, ResolvedSimOptions, SimLeague, SimPlayers, MeasuredFrom } from './simTypes.ts';
