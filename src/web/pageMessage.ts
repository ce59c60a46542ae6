import { ApiError } from './api.ts';

/** The page's own name for each request parameter it sends (the labels of its fields). */
const FIELD_LABELS: Readonly<Record<string, string>> = {
  player: 'Player',
  candidate: 'Versus',
  season: 'Season',
  level: 'Level',
  position: 'Position',
  want: 'Target profile',
  'season-b': 'Versus season',
  'level-b': 'Versus level',
  'pool-level': 'Levels',
  'pool-season': 'Seasons',
  age: 'Age',
  bats: 'Bats',
  throws: 'Throws',
  k: 'Comps (k)',
  preset: 'Emphasis',
  adjacent: 'Positions',
  'level-span': 'Levels around his',
  'sample-floor': 'Least playing time',
  recent: 'Seasons back',
  weights: 'Weights',
  'min-coverage': 'Min coverage',
  window: 'Seasons per profile',
  horizon: 'Follow-up',
  path: 'Seasons matched',
  'max-salary': 'Max salary',
  'max-share': 'Share of his salary',
};

/**
 * What the page says when a job fails, in the page's words: the field at fault by its label, the
 * API's explanation after it, and never an error code or a command-line flag.
 *
 * @example
 * pageMessage(new ApiError(400, 'kindred.usage.badOption', 'parameter k: expected a whole number of 1 or more, got "0"', 'k'));
 * // => 'Comps (k): expected a whole number of 1 or more, got "0"'
 */
export function pageMessage(e: unknown): string {
  if (!(e instanceof ApiError)) return e instanceof Error ? e.message : String(e);
  if (e.status === 0) return 'The server gave an answer this page cannot read; reload the page.';
  const p = e.parameter;
  const prefix = p === undefined ? '' : `parameter ${p}: `;
  if (p !== undefined && e.message.startsWith(prefix)) return `${FIELD_LABELS[p] ?? p}: ${inPageWords(e.message.slice(prefix.length))}`;
  const text = inPageWords(e.message);
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/**
 * A server text (an error, the outlook's calibration note) in the page's words: an option named as
 * `--name` becomes its field's label in quotes, and a hint in brackets about a command to run is left
 * out (the page has no commands).
 *
 * @example
 * inPageWords('calibration not applied: the backtest used --horizon 6');
 * // => 'calibration not applied: the backtest used "Follow-up" 6'
 * inPageWords('no backtest stored with this store (kindred build stores one; kindred backtest runs one)');
 * // => 'no backtest stored with this store'
 */
export function inPageWords(text: string): string {
  return text
    .replace(/\s*\([^()]*\bkindred [a-z]+[^()]*\)/g, '')
    .replace(/(?:no )?--([a-z][a-z0-9-]*)/g, (whole: string, name: string) => {
      const label = FIELD_LABELS[name];
      if (label === undefined) return name.replaceAll('-', ' ');
      return whole.startsWith('no ') ? `no "${label}"` : `"${label}"`;
    })
    .replace(/\bkindred (build|backtest|serve)\b/g, 'the store\u2019s build');
}
