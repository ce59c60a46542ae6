import { editDistance } from './didYouMean.ts';

/** What dimension lookups need: the stable name and the label shown in tables. */
export interface NamedDimension {
  readonly name: string;
  readonly label: string;
}

const fold = (s: string): string => s.trim().toLowerCase();

/**
 * The index of the dimension a user means by `text`: its name or its label, case ignored
 * (`obp`, `OBP`, `run speed`); -1 when none.
 *
 * @example
 * findDimension([{ name: 'obp', label: 'OBP' }, { name: 'run_speed_ft_s', label: 'Run speed' }], 'run speed'); // => 1
 */
export function findDimension(dims: readonly NamedDimension[], text: string): number {
  const t = fold(text);
  const byName = dims.findIndex((d) => d.name === t);
  return byName >= 0 ? byName : dims.findIndex((d) => fold(d.label) === t);
}

/**
 * Up to three dimension names close to a mistyped name or label (within a third of its length in
 * edits, to the name or to the label), nearest first, for a "did you mean" hint.
 */
export function dimensionSuggestions(dims: readonly NamedDimension[], text: string): string[] {
  const t = fold(text);
  const limit = Math.max(1, Math.floor(t.length / 3)) + 1;
  const scored = new Map<string, number>();
  for (const d of dims) {
    const distance = Math.min(editDistance(t, d.name), editDistance(t, fold(d.label)));
    if (distance < limit && distance < (scored.get(d.name) ?? Infinity)) scored.set(d.name, distance);
  }
  return [...scored].sort((a, b) => a[1] - b[1]).slice(0, 3).map(([name]) => name);
}

/** ` (did you mean a, b or c?)`, or '' when there is no suggestion. */
export function suggestionHint(suggestions: readonly string[]): string {
  if (suggestions.length === 0) return '';
  const last = suggestions[suggestions.length - 1] ?? '';
  return ` (did you mean ${suggestions.length === 1 ? last : `${suggestions.slice(0, -1).join(', ')} or ${last}`}?)`;
}
