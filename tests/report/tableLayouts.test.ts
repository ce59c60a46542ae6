/**
 * The prospect, cheaper, match, dims and backtest texts as a reader gets them, checked against their
 * documented layout (README and docs/jobs.md): every line within 100 columns without trailing spaces,
 * the headings in order, each value of the JSON answer under its heading, ranges shown with their
 * stated coverage (no percentile table), and footnotes wrapped rather than cut.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.ts';
import { buildSimStore, type SimStore } from '../outlook/simStore.ts';
import { expectUnderHeadings, findHeadings, terminalLines, type Heading } from '../helpers/terminalLayout.ts';
import { storeBacktest } from '../../src/cli/commands/storeBacktest.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProspectResult } from '../../src/jobs/ProspectResult.ts';
import type { CheaperResult } from '../../src/jobs/CheaperResult.ts';
import type { MatchResult } from '../../src/jobs/MatchResult.ts';
import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import type { PositionGroup } from '../../src/profiles/positionGroup.ts';

let sim: SimStore;
let store: ProfileStore;
const quiet = { stdout: { write: () => true }, stderr: { write: () => true }, isTTY: false };

/** Player id and season of rows of a group at a level, last season first. */
function rowsAt(group: PositionGroup, level: string, test: (row: number) => boolean = () => true): [string, number][] {
  const g = store.groups.get(group);
  const lv = store.levels.indexOf(level);
  const out: [string, number][] = [];
  for (let i = (g?.n ?? 0) - 1; g && i >= 0; i--) {
    if (g.level[i] === lv && test(i)) out.push([store.players[g.player[i] as number]?.playerId ?? '', g.season[i] as number]);
  }
  return out;
}

beforeAll(async () => {
  sim = await buildSimStore();
  await storeBacktest(sim.storeDir, quiet);
  store = await openProfileStore(sim.storeDir);
}, 300_000);
afterAll(() => sim.remove());

/** The text and the JSON answer of one command. */
async function both<T>(args: readonly string[]): Promise<{ text: string; answer: T }> {
  const text = await runCli(...args, '--store', sim.storeDir);
  expect(text.code, text.stderr).toBe(0);
  const json = await runCli(...args, '--store', sim.storeDir, '--format', 'json');
  return { text: text.stdout, answer: JSON.parse(json.stdout) as T };
}

const pct = (x: number): string => `${Math.round(100 * x)}%`;

describe.each(['IF', 'SP'] as const)('prospect text for a %s prospect', (group) => {
  it('lists the comps under # Player Season Age, PA (BF IP), Like Cov "First top" "Top yrs" and the peak, within 100 columns', async () => {
    const g = store.groups.get(group);
    const [id, season] = rowsAt(group, 'High', (i) => (g?.season[i] ?? 0) >= 2025 && !Number.isNaN(g?.age[i] ?? NaN))[0] ?? ['', 0];
    const { text, answer } = await both<ProspectResult>(['prospect', id, '--season', String(season), '--level', 'High']);
    const lines = terminalLines(text);
    const peak = group === 'SP' ? 'Best FIP-' : 'Peak OPS+';
    const time: Heading[] = group === 'SP' ? [{ title: 'BF', align: 'right' }, { title: 'IP', align: 'right' }] : [{ title: 'PA', align: 'right' }];
    const headings: Heading[] = [
      { title: '#', align: 'right' }, { title: 'Player', align: 'left' }, { title: 'Season', align: 'left' },
      { title: 'Age', align: 'right' }, ...time, { title: 'Like', align: 'right' }, { title: 'Cov', align: 'right' }, { title: 'First top', align: 'right' },
      { title: 'Top yrs', align: 'right' }, { title: peak, align: 'right' },
    ];
    expect(answer.comps.length).toBeGreaterThan(0);
    const { line, at } = findHeadings(lines, headings);
    answer.comps.forEach((c, i) => {
      const o = c.outcome;
      const best = o.kind === 'hitter' ? o.peak_ops_plus : o.peak_fip_minus;
      // the name on the comp's line, the id under it
      expect((lines[line + 2 + 2 * i] ?? '').slice(at[1]).startsWith(c.player_id)).toBe(true);
      expectUnderHeadings(lines[line + 1 + 2 * i] ?? '', headings, at, [
        `${c.rank}${c.censored ? '*' : ''}`, c.name, String(c.season), c.age === null ? '-' : String(c.age),
        ...(group === 'SP' ? [String(c.sample), c.ip ?? '-'] : [String(c.sample)]), String(Math.round(c.likeness)), pct(c.coverage), o.first_top_level_season === null ? '-' : String(o.first_top_level_season),
        String(o.top_level_seasons), best === null ? '-' : String(Math.round(best)),
      ]);
    });
  });

  it('shows the outlook as ranges with their stated coverage, never as a p10 / p50 / p90 table', async () => {
    const g = store.groups.get(group);
    const [id, season] = rowsAt(group, 'High', (i) => (g?.season[i] ?? 0) >= 2025 && !Number.isNaN(g?.age[i] ?? NaN))[0] ?? ['', 0];
    const { text, answer } = await both<ProspectResult>(['prospect', id, '--season', String(season), '--level', 'High']);
    const lines = terminalLines(text);
    expect(text).not.toMatch(/p10|p50|p90/);
    const o = answer.outlook;
    const headings: Heading[] = [{ title: 'Comps', align: 'right' }, { title: 'Base rate', align: 'right' }];
    const { line, at } = findHeadings(lines, headings);
    const row = (label: string): string => lines.slice(line + 1).find((l) => l.startsWith(label)) ?? '';
    expectUnderHeadings(row('Reached the top level'), headings, at, [pct(o.reached_top_level ?? NaN), pct(o.baseline.reached_top_level ?? NaN)]);
    const s = o.top_level_seasons;
    const bs = o.baseline.top_level_seasons;
    const span = (lo: number | null, hi: number | null): string => (lo === null || hi === null ? '-' : `${Math.round(lo)} to ${Math.round(hi)}`);
    expectUnderHeadings(row('  middle 80% of players'), headings, at, [span(s.p10, s.p90), span(bs.p10, bs.p90)]);
    // the calibrated outlook: each range beside what it held when replayed, the stated coverage said once
    const c = o.calibrated;
    expect(c, o.calibration_note ?? '').toBeTruthy();
    if (!c) return;
    expect(text).toContain('each range is meant to hold 80% of outcomes');
    const cal: Heading[] = [{ title: 'Calibrated', align: 'right' }, { title: `Replayed at ${c.backtest.cuts[0]}-${c.backtest.cuts[c.backtest.cuts.length - 1]}, the range held`, align: 'right' }];
    const found = findHeadings(lines, cal);
    const calRow = (label: string): string => lines.slice(found.line + 1).find((l) => l.startsWith(label)) ?? '';
    expectUnderHeadings(calRow(group === 'SP' ? 'Best FIP-' : 'Peak OPS+'), cal, found.at, [
      span(c.peak.p10, c.peak.p90), `${pct(c.backtest.peak_coverage.value ?? NaN)} of realised values`,
    ]);
    expectUnderHeadings(calRow('Top-level seasons'), cal, found.at, [
      span(c.top_level_seasons.p10, c.top_level_seasons.p90), `${pct(c.backtest.seasons_coverage.value ?? NaN)} of realised counts`,
    ]);
  });
});

describe('cheaper text', () => {
  it('lists the comps under # Player Season Lvl Pos BF IP Like Salary Value Front, money with separators, within 100 columns', async () => {
    const [id, season] = rowsAt('RP', 'Top', (i) => (store.salaries.get(store.groups.get('RP')?.player[i] ?? -1)?.get(store.groups.get('RP')?.season[i] ?? 0) ?? 0) > 4e6)[0] ?? ['', 0];
    const { text, answer } = await both<CheaperResult>(['cheaper', id, '--season', String(season), '--level', 'Top', '--k', '8', '--recent', 'all']);
    const lines = terminalLines(text);
    const headings: Heading[] = [
      { title: '#', align: 'right' }, { title: 'Player', align: 'left' }, { title: 'Season', align: 'left' }, { title: 'Lvl', align: 'left' },
      { title: 'Pos', align: 'left' }, { title: 'BF', align: 'right' }, { title: 'IP', align: 'right' }, { title: 'Like', align: 'right' },
      { title: 'Salary', align: 'right' }, { title: 'Value', align: 'right' }, { title: 'Front', align: 'left' },
    ];
    expect(answer.comps.length).toBeGreaterThan(0);
    const { line, at } = findHeadings(lines, headings);
    answer.comps.forEach((c, i) => {
      const row = lines[line + 1 + 2 * i] ?? '';
      expect((lines[line + 2 + 2 * i] ?? '').slice(at[1]).startsWith(c.player_id)).toBe(true);
      // "Front" is empty off the frontier: check the others, then the flag
      expectUnderHeadings(row, headings.slice(0, 10), at, [
        String(c.rank), c.name, String(c.season), c.level, c.position, String(c.sample), c.ip ?? '-', String(Math.round(c.likeness)),
        `$${Math.round(c.salary_usd).toLocaleString('en-US')}`, c.value_score === null ? '-' : c.value_score.toFixed(1),
      ]);
      expect(row.slice(at[10]).trim()).toBe(c.frontier ? 'yes' : c.above_likeness_floor ? '' : 'low');
    });
  });
});

describe('match text', () => {
  it('lists every dimension under Dimension Target Candidate Share, within 100 columns', async () => {
    const [[a] = [''], [b] = ['']] = rowsAt('SP', 'Top');
    const { text, answer } = await both<MatchResult>(['match', a, b]);
    const lines = terminalLines(text);
    const headings: Heading[] = [{ title: 'Dimension', align: 'left' }, { title: 'Target', align: 'right' }, { title: 'Candidate', align: 'right' }, { title: 'Share', align: 'right' }];
    const { line, at } = findHeadings(lines, headings);
    const dims = store.groups.get('SP')?.dims ?? [];
    const shown = answer.candidate.dimensions.filter((d) => d.target !== null || d.comp !== null);
    expect(shown.length).toBeGreaterThan(5);
    shown.forEach((d, i) => {
      const row = lines[line + 1 + i] ?? '';
      const label = dims.find((x) => x.name === d.name)?.label ?? d.name;
      expect(row.startsWith(`${label} `), row).toBe(true);
      expectUnderHeadings(row, headings.slice(3), at.slice(3), [d.missing ? 'n/a' : pct(d.share)]);
    });
  });
});

describe('dims text', () => {
  it('fits 100 columns without trailing spaces and names every dimension with its label on one row', async () => {
    const out = await runCli('dims');
    expect(out.code).toBe(0);
    const lines = terminalLines(out.stdout);
    const json = JSON.parse((await runCli('dims', '--format', 'json')).stdout) as Record<string, { name: string; label: string }[]>;
    for (const list of Object.values(json)) {
      for (const d of list) {
        expect(lines.some((l) => new RegExp(`^│ ${d.name} +│ ${d.label.replace(/[+%]/g, (c) => `\\${c}`)} +│`).test(l)), `${d.name} / ${d.label}`).toBe(true);
      }
    }
  });
});

describe('backtest text', () => {
  it('fits 100 columns without trailing spaces and says each figure of the JSON file', async () => {
    const out = await runCli('backtest', '--store', sim.storeDir);
    expect(out.code).toBe(0);
    const lines = terminalLines(out.stdout);
    const file = JSON.parse((await runCli('backtest', '--store', sim.storeDir, '--format', 'json')).stdout) as {
      kinds: { kind: string; targets: number; brier: { calibrated: number } }[];
    };
    for (const k of file.kinds) {
      expect(lines.some((l) => l.startsWith(`${k.kind === 'hitter' ? 'Hitters' : 'Pitchers'}: ${k.targets.toLocaleString('en-US')} prospect forecasts`))).toBe(true);
      expect(out.stdout).toContain(`calibrated ${k.brier.calibrated.toFixed(4)}`);
    }
    // two full backtests of the store: 99 s once under a full suite on 2 shared cores (alone: about 10 s)
  }, 240_000);
});
