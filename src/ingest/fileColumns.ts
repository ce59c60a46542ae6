/**
 * The canonical roster files and their columns (required, then optional).
 * A roster folder's files are read under these names unless a column map
 * renames them.
 */
export const FILE_COLUMNS = {
  'levels.csv': {
    required: ['level'],
    optional: [],
  },
  'players.csv': {
    required: ['player_id', 'name'],
    optional: ['birth_date', 'bats', 'throws'],
  },
  'batting.csv': {
    required: ['player_id', 'season', 'level', 'PA', 'AB', 'H', '2B', '3B', 'HR', 'BB', 'HBP', 'SF', 'SO'],
    optional: [
      'team', 'G', 'IBB', 'SB', 'CS',
      'bbe', 'ev_avg_mph', 'ev_p90_mph', 'la_avg_deg', 'hard_hit_pct', 'sweet_spot_pct', 'sprint_ft_s',
    ],
  },
  'fielding.csv': {
    required: ['player_id', 'season', 'level', 'pos', 'inn', 'PO', 'A', 'E'],
    optional: ['team', 'G', 'arm_mph', 'pop_2b_s', 'exchange_s', 'sb_against', 'cs_caught'],
  },
  'pitching.csv': {
    required: ['player_id', 'season', 'level', 'G', 'GS', 'IP', 'BF', 'H', 'HR', 'BB', 'HBP', 'SO', 'ER'],
    optional: ['team', 'fb_mph', 'fb_spin_rpm', 'whiff_pct', 'gb_pct'],
  },
  'contracts.csv': {
    required: ['player_id', 'season', 'salary_usd'],
    optional: [],
  },
} as const;

export type RosterFile = keyof typeof FILE_COLUMNS;
export type ColumnOf<F extends RosterFile> =
  | (typeof FILE_COLUMNS)[F]['required'][number]
  | (typeof FILE_COLUMNS)[F]['optional'][number];

export const ROSTER_FILES: readonly RosterFile[] = [
  'levels.csv', 'players.csv', 'batting.csv', 'fielding.csv', 'pitching.csv', 'contracts.csv',
];

/** Files a roster folder must have; the others are read as empty when absent. */
export const REQUIRED_FILES: ReadonlySet<RosterFile> = new Set<RosterFile>(['players.csv', 'batting.csv']);

export function isRequiredColumn(file: RosterFile, column: string): boolean {
  const required: readonly string[] = FILE_COLUMNS[file].required;
  return required.includes(column);
}

export function columnsOf(file: RosterFile): readonly string[] {
  const spec = FILE_COLUMNS[file];
  const required: readonly string[] = spec.required;
  const optional: readonly string[] = spec.optional;
  return [...required, ...optional];
}
