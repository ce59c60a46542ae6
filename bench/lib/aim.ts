/**
 * A bench figure's aim, printed beside the figure as "(aim: under 2 ms, met)". When the run checks
 * aims (`npm run bench -- --check`, which sets KINDRED_BENCH_CHECK=1), a missed aim makes the bench
 * exit with code 3 (MISSED_AIM_EXIT), after it has printed all its figures.
 */
export type Aim =
  | { readonly below: number; readonly unit?: string }
  | { readonly atLeast: number; readonly unit?: string }
  | { readonly atMost: number; readonly unit?: string }
  | { readonly above: number; readonly unit?: string }
  | { readonly within: readonly [number, number]; readonly unit?: string };

export const MISSED_AIM_EXIT = 3;
export const CHECK_ENV = 'KINDRED_BENCH_CHECK';

const missed: string[] = [];

/** Whether `value` meets `aim` (NaN never does). */
export function meets(value: number, aim: Aim): boolean {
  if (Number.isNaN(value)) return false;
  if ('below' in aim) return value < aim.below;
  if ('atLeast' in aim) return value >= aim.atLeast;
  if ('atMost' in aim) return value <= aim.atMost;
  if ('above' in aim) return value > aim.above;
  return value >= aim.within[0] && value <= aim.within[1];
}

/** The aim in words, e.g. "under 2 ms", "at least 0.99", "0.7 to 0.9". */
export function describeAim(aim: Aim): string {
  const unit = aim.unit ? ` ${aim.unit}` : '';
  if ('below' in aim) return `under ${aim.below}${unit}`;
  if ('atLeast' in aim) return `at least ${aim.atLeast}${unit}`;
  if ('atMost' in aim) return `at most ${aim.atMost}${unit}`;
  if ('above' in aim) return `above ${aim.above}${unit}`;
  return `${aim.within[0]} to ${aim.within[1]}${unit}`;
}

/**
 * Compares one figure with its aim and returns the text to print beside it; a miss is remembered under
 * `what` and, when aims are checked, sets the exit code.
 */
export function aim(what: string, value: number, target: Aim): string {
  const ok = meets(value, target);
  if (!ok) {
    missed.push(`${what}: ${value} (aim: ${describeAim(target)})`);
    if (process.env[CHECK_ENV] === '1') process.exitCode = MISSED_AIM_EXIT;
  }
  return `(aim: ${describeAim(target)}, ${ok ? 'met' : 'MISSED'})`;
}

process.on('exit', () => {
  if (missed.length > 0) console.log(`aims missed:\n${missed.map((m) => `  ${m}`).join('\n')}`);
});
