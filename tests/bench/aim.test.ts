/**
 * Bench aims: each kind of aim compared by its plain meaning, and a missed aim under `--check`
 * (KINDRED_BENCH_CHECK=1) turns into exit code 3 with the miss listed; without it the bench exits 0.
 */
import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { CHECK_ENV, MISSED_AIM_EXIT, describeAim, meets } from '../../bench/lib/aim.ts';

function runAims(check: boolean, script: string): { status: number | null; stdout: string } {
  const r = spawnSync(process.execPath, ['--import', 'tsx', '--input-type=module', '-e', script], {
    encoding: 'utf8',
    env: { ...process.env, [CHECK_ENV]: check ? '1' : '0' },
    timeout: 60_000,
  });
  return { status: r.status, stdout: r.stdout };
}

const MISSING_ONE = `import { aim } from ${JSON.stringify(new URL('../../bench/lib/aim.ts', import.meta.url).href)};
console.log('p50 1.5 ms ' + aim('p50', 1.5, { below: 2, unit: 'ms' }));
console.log('recall 0.97 ' + aim('recall@10', 0.97, { atLeast: 0.99 }));`;

describe('bench aims', () => {
  it('reads below, at least, at most, above and within as their words say; NaN never meets an aim', () => {
    expect(meets(1.3, { atMost: 1.3 })).toBe(true);
    expect(meets(1.3001, { atMost: 1.3 })).toBe(false);
    expect(meets(Number.NaN, { atMost: 1.3 })).toBe(false);
    expect(describeAim({ atMost: 1.3 })).toBe('at most 1.3');
    expect(meets(1.99, { below: 2 })).toBe(true);
    expect(meets(2, { below: 2 })).toBe(false);
    expect(meets(0.99, { atLeast: 0.99 })).toBe(true);
    expect(meets(0.9899, { atLeast: 0.99 })).toBe(false);
    expect(meets(0, { above: 0 })).toBe(false);
    expect(meets(0.001, { above: 0 })).toBe(true);
    expect(meets(0.7, { within: [0.7, 0.9] })).toBe(true);
    expect(meets(0.69, { within: [0.7, 0.9] })).toBe(false);
    expect(meets(0.91, { within: [0.7, 0.9] })).toBe(false);
    expect(meets(Number.NaN, { atLeast: 0 })).toBe(false);
    expect(describeAim({ below: 2, unit: 'ms' })).toBe('under 2 ms');
    expect(describeAim({ within: [0.7, 0.9] })).toBe('0.7 to 0.9');
  });

  it('under --check, exits with the missed-aim code and lists the figure that missed', () => {
    const r = runAims(true, MISSING_ONE);
    expect(r.stdout).toContain('p50 1.5 ms (aim: under 2 ms, met)');
    expect(r.stdout).toContain('recall 0.97 (aim: at least 0.99, MISSED)');
    expect(r.stdout).toContain('aims missed:\n  recall@10: 0.97 (aim: at least 0.99)');
    expect(r.status).toBe(MISSED_AIM_EXIT);
  });

  it('without --check, prints the miss and exits 0', () => {
    const r = runAims(false, MISSING_ONE);
    expect(r.stdout).toContain('MISSED');
    expect(r.status).toBe(0);
  });
});
