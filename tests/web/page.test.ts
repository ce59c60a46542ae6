/**
 * The page end to end in headless Chromium (a system Chromium, or the npm one; see findBrowser) driven by playwright-core:
 * search a player, run each job, check the table, the charts and the exports against the API.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { createServer, type RunningServer } from '../../src/server/createServer.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import type { CompsResult } from '../../src/query/CompsResult.ts';
import { buildDemoStore, tempDir } from '../server/serverFixture.ts';
import { ensureWebBuilt } from './ensureWebBuilt.ts';
import { findBrowser } from '../helpers/findBrowser.ts';
import { poolPositions } from '../../src/query/adjacentPositions.ts';
import { defaultOf } from '../../src/request/parameters.ts';

const ARTIFACTS = join(process.cwd(), 'tests', '.artifacts');

let srv: RunningServer;
let browser: Browser;
let context: BrowserContext;
let page: Page;
let store: ProfileStore;
let remove: () => Promise<void> = async () => {};
const problems: string[] = [];

async function api(path: string): Promise<CompsResult> {
  const r = await fetch(new URL(path, srv.url));
  expect(r.status).toBe(200);
  return (await r.json()) as CompsResult;
}

/** A catcher whose name no other player has, and the first four letters of his last name. */
function uniqueCatcher(): { id: string; name: string; part: string } {
  const counts = new Map<string, number>();
  for (const p of store.players) counts.set(p.name, (counts.get(p.name) ?? 0) + 1);
  const g = store.groups.get('C');
  const seasonsOf = (i: number): number => (g ? Array.from(g.player).filter((p) => p === i).length : 0);
  const i = store.players.findIndex((p, idx) => counts.get(p.name) === 1 && seasonsOf(idx) >= 2);
  const p = store.players[i];
  if (!p) throw new Error('the demo store has no catcher with a unique name and two seasons');
  return { id: p.playerId, name: p.name, part: (p.name.split(' ')[1] ?? p.name).slice(0, 4) };
}

/** A player with a unique name among those with a season matching `accept`, and the first four letters of his last name. */
function uniquePlayer(group: 'IF' | 'SP' | 'C', accept: (row: number) => boolean, skip = 0): { id: string; name: string; part: string; season: number; level: string } {
  const counts = new Map<string, number>();
  for (const p of store.players) counts.set(p.name, (counts.get(p.name) ?? 0) + 1);
  const g = store.groups.get(group);
  let seen = 0;
  for (let i = 0; g && i < g.n; i++) {
    const p = store.players[g.player[i] as number];
    if (!p || counts.get(p.name) !== 1 || !accept(i)) continue;
    if (seen++ < skip) continue;
    return { id: p.playerId, name: p.name, part: p.name.slice(2), season: g.season[i] as number, level: store.levels[g.level[i] as number] ?? '' };
  }
  throw new Error(`no ${group} player to pick`);
}

/** A young infielder at the second-highest level of the demo league, for the prospect outlook. */
function prospectTarget(): ReturnType<typeof uniquePlayer> {
  const g = store.groups.get('IF');
  const high = store.levels.indexOf('High');
  return uniquePlayer('IF', (i) => g?.level[i] === high && (g?.age[i] ?? 0) >= 19 && (g?.age[i] ?? 99) <= 22 && (g?.season[i] ?? 0) >= 2018);
}

/** A top-level infielder paid more than $3M, for cheaper comps. */
function cheaperTarget(): ReturnType<typeof uniquePlayer> {
  const g = store.groups.get('IF');
  const top = store.levels.indexOf('Top');
  return uniquePlayer('IF', (i) => g?.level[i] === top && (store.salaries.get(g.player[i] as number)?.get(g.season[i] as number) ?? 0) > 3e6);
}

/** Types part of a name into a picker, picks the player and his season. */
async function pick(prefix: string, who: { name: string; part: string; season: number; level: string }): Promise<void> {
  await page.fill(`#${prefix}-input`, who.part);
  const option = page.locator(`#${prefix}-suggestions li[role="option"]`, { hasText: who.name });
  await option.waitFor();
  await option.click();
  const value = await page.locator(`#${prefix}-season option`, { hasText: `${who.season} · ${who.level} ·` }).first().getAttribute('value');
  await page.selectOption(`#${prefix}-season`, value ?? '');
}

/** A fresh page (no filters left from an earlier test) on one of the jobs. */
async function openView(id: string): Promise<void> {
  await page.goto(srv.url);
  await page.waitForSelector('body[data-ready="true"]');
  await page.click(`nav button[data-view="${id}"]`);
}

async function marks(selector: string): Promise<number> {
  return page.locator(`${selector} svg .role-mark path, ${selector} svg .role-mark line, ${selector} svg .role-mark text`).count();
}

beforeAll(async () => {
  const t = await tempDir('kindred-web-');
  remove = t.remove;
  const storeDir = join(t.dir, 'store');
  await Promise.all([ensureWebBuilt(), buildDemoStore(storeDir), mkdir(ARTIFACTS, { recursive: true })]);
  store = await openProfileStore(storeDir);
  srv = await createServer({ storeDir, port: 0 });
  const found = await findBrowser();
  browser = await chromium.launch({ executablePath: found.executablePath, args: [...found.args] });
  context = await browser.newContext({ acceptDownloads: true, viewport: { width: 1400, height: 1000 } });
  page = await context.newPage();
  // 30 s: under a full suite on 2 cores an answer drawn on the page took more than 10 s once.
  page.setDefaultTimeout(30_000);
  page.on('console', (m) => {
    if (m.type() === 'error') problems.push(`console: ${m.text()}`);
  });
  page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => console.error(`content security policy blocked ${e.blockedURI} (${e.violatedDirective})`));
  });
  page.on('requestfailed', (r) => problems.push(`request failed: ${r.url()}`));
  page.on('request', (r) => {
    if (!r.url().startsWith(srv.url) && !r.url().startsWith('blob:')) problems.push(`request off the server: ${r.url()}`);
  });
  await page.goto(srv.url);
  await page.waitForSelector('body[data-ready="true"]');
});

afterAll(async () => {
  await browser?.close();
  await srv?.close();
  await remove();
});

describe('the landing page', () => {
  it('shows no chart caption above an empty chart, on every job before it runs', async () => {
    for (const view of ['comps', 'target', 'prospect', 'cheaper', 'match']) {
      await openView(view);
      expect(await page.locator('figcaption:visible').count(), view).toBe(0);
    }
    await openView('comps');
  });
});

describe('the comps view', () => {
  it('suggests players as a name is typed and shows the chosen one\'s comps, table and charts', async () => {
    const who = uniqueCatcher();
    await page.fill('#player-input', who.part);
    const option = page.locator('#player-suggestions li[role="option"]', { hasText: who.name });
    await option.waitFor();
    await option.click();
    expect(await page.inputValue('#player-input')).toBe(who.name);
    const seasons = await page.locator('#player-season option').allTextContents();
    expect(seasons.length).toBeGreaterThanOrEqual(2);
    const second = await page.locator('#player-season option').nth(1).getAttribute('value');
    await page.selectOption('#player-season', second ?? '');
    await page.click('#run');
    await page.waitForSelector('#comps-table tbody tr');
    await page.waitForSelector('#map-chart svg');
    const [season, level, position] = (second ?? '').split('|');
    const expected = await api(`/api/comps?player=${who.id}&season=${season}&level=${level}&position=${position}`);
    const names = await page.locator('#comps-table tbody tr td:nth-child(2)').allTextContents();
    expect(names).toEqual(expected.comps.map((c) => c.name));
    expect(await page.textContent('#summary')).toContain(who.name);
    const dimsShown = expected.comps[0]?.dimensions.filter((d) => d.target_grade !== null && d.comp_grade !== null).length ?? 0;
    expect(await page.locator('#grade-chart svg .mark-symbol.role-mark path').count()).toBe(2 * dimsShown);
    expect(await page.locator('#grade-chart svg .mark-text.role-mark text').count()).toBe((expected.comps[0]?.alike.length ?? 0) + (expected.comps[0]?.apart.length ?? 0));
    const groupSize = store.groups.get('C')?.n ?? 0;
    expect(await page.locator('#map-chart svg .mark-symbol.role-mark path').count()).toBe(groupSize);
    await page.screenshot({ path: join(ARTIFACTS, 'comps.png'), fullPage: true });
  });

  it('draws the grades of the comp a row is clicked on', async () => {
    const third = (await page.locator('#comps-table tbody tr').nth(2).locator('td').nth(1).textContent()) ?? '';
    await page.locator('#comps-table tbody tr').nth(2).click();
    await page.waitForFunction((name) => document.querySelector('#grade-chart')?.parentElement?.querySelector('figcaption')?.textContent?.includes(name), third);
    expect(await page.locator('#comps-table tbody tr.selected td:nth-child(2)').textContent()).toBe(third);
    expect(await marks('#grade-chart')).toBeGreaterThan(0);
  });

  it('applies the filters and k, and exports the table as CSV and the answer as JSON', async () => {
    await page.fill('#opt-k', '5');
    await page.check('input[name="pool-level"][value="Elite"]');
    await page.check('input[name="pool-level"][value="Top"]');
    await page.fill('#opt-age-from', '22');
    await page.fill('#opt-age-to', '30');
    await page.click('#run');
    await page.waitForFunction(() => document.querySelectorAll('#comps-table tbody tr').length === 5);
    const levels = await page.locator('#comps-table tbody tr td:nth-child(4)').allTextContents();
    for (const l of levels) expect(['Elite', 'Top']).toContain(l);
    const ages = (await page.locator('#comps-table tbody tr td:nth-child(6)').allTextContents()).map(Number);
    for (const a of ages) expect(a >= 22 && a <= 30).toBe(true);

    const [csvDownload] = await Promise.all([page.waitForEvent('download'), page.click('#export-csv')]);
    expect(csvDownload.suggestedFilename()).toBe('kindred-comps.csv');
    const csv = await readFile(await csvDownload.path(), 'utf8');
    const lines = csv.trimEnd().split('\n');
    // the CLI's CSV convention, values included: each dimension's value, grade and share after alike and apart
    // comps default to windows of 5 seasons: each window's first season beside its last
    expect(lines[0]?.startsWith('target_player_id,target_first_season,target_season,target_level,rank,player_id,name,first_season,season,level,position,age,sample,sample_unit,ip,likeness,distance,coverage,alike,apart,')).toBe(true);
    expect(lines[0]).toContain(',obp,obp_grade,obp_share,');
    expect(lines.length).toBe(6);

    const [jsonDownload] = await Promise.all([page.waitForEvent('download'), page.click('#export-json')]);
    const exported = JSON.parse(await readFile(await jsonDownload.path(), 'utf8')) as CompsResult;
    expect(exported.comps.length).toBe(5);
    // the levels checked replace the default levels; the default position and playing-time floor stay
    expect(exported.pool.filters).toMatchObject({ levels: ['Elite', 'Top'], age_min: 22, age_max: 30, positions: [exported.query.position] });
    expect(exported.pool.filters.min_sample).toBe(exported.pool.sample_floor?.min);
    expect(await page.textContent('#pool-rules')).toBe(`Pool: ${exported.pool.summary}`);
    expect(exported.query.window).toBe(5);
    expect(lines.slice(1).map((l) => l.split(',')[5])).toEqual(exported.comps.map((c) => c.player_id));
  });

  it('shows a refused parameter in page language (its field\'s label, no flag, no code) and clears the previous chart caption', async () => {
    await page.fill('#opt-weights', 'obpp=2');
    await page.click('#run');
    await page.waitForSelector('.message.error');
    const message = (await page.textContent('.message.error')) ?? '';
    expect(message).toMatch(/^Weights: no dimension "obpp" \(did you mean obp\?\)/);
    expect(message).not.toMatch(/--|kindred\./);
    expect(await page.textContent('figure:has(#grade-chart) figcaption')).toBe('Grades by dimension');
    expect(await page.locator('figcaption:visible').count()).toBe(0);
    await page.fill('#opt-weights', '');
  });

  it('chooses a suggestion with the arrow keys and Enter', async () => {
    const who = uniqueCatcher();
    await page.fill('#player-input', '');
    await page.type('#player-input', who.part);
    await page.locator('#player-suggestions li[role="option"]').first().waitFor();
    const firstName = await page.locator('#player-suggestions li[role="option"] .name').first().textContent();
    await page.press('#player-input', 'ArrowDown');
    await page.press('#player-input', 'Enter');
    expect(await page.inputValue('#player-input')).toBe(firstName);
    expect(await page.locator('#player-suggestions').isHidden()).toBe(true);
  });
});

describe('the pool controls', () => {
  it('show each job\'s own default reach (cheaper: his level, his season and the 2 before) and none for the prospect outlook', async () => {
    await openView('cheaper');
    expect(await page.inputValue('#opt-level-span')).toBe(String(defaultOf('levelSpan', 'cheaper')));
    expect(await page.inputValue('#opt-recent')).toBe(String(defaultOf('recent', 'cheaper')));
    expect(await page.inputValue('#opt-sample-floor')).toBe(String(defaultOf('sampleFloor', 'cheaper')));
    expect(await page.isChecked('#opt-adjacent')).toBe(defaultOf('adjacent', 'cheaper'));
    await openView('comps');
    expect(await page.inputValue('#opt-level-span')).toBe(String(defaultOf('levelSpan', 'comps')));
    expect(await page.inputValue('#opt-recent')).toBe('all');
    await openView('prospect');
    expect(await page.locator('#pool-reach').isHidden()).toBe(true);
  });

  it('send the positions next to his, the levels around his, the least playing time and the seasons back, and say how the pool was chosen', async () => {
    await openView('comps');
    const g = store.groups.get('IF');
    const ss = uniquePlayer('IF', (i) => g?.position[i] === 'SS' && store.levels[g.level[i] as number] === 'High' && (g?.season[i] ?? 0) >= 2015);
    await pick('player', ss);
    await page.check('#opt-adjacent');
    await page.selectOption('#opt-level-span', '0');
    await page.fill('#opt-sample-floor', '0.25');
    await page.selectOption('#opt-recent', '5');
    await page.click('#run');
    // the sentence on how the pool was chosen is drawn with this answer only
    await page.waitForFunction(() => document.querySelector('#pool-choice')?.textContent?.includes('next to it') === true);
    const [csvDownload] = await Promise.all([page.waitForEvent('download'), page.click('#export-json')]);
    const shown = JSON.parse(await readFile(await csvDownload.path(), 'utf8')) as CompsResult;
    expect(shown.pool.filters.positions).toEqual(poolPositions('SS', true));
    expect(shown.pool.filters.levels).toEqual(['High']);
    expect(shown.pool.filters.season_from).toBe(ss.season - 4);
    expect(shown.pool.sample_floor?.share).toBe(0.25);
    const expected = await api(`/api/comps?player=${ss.id}&season=${ss.season}&level=High&position=SS&adjacent=true&level-span=0&sample-floor=0.25&recent=5`);
    expect(await page.locator('#comps-table tbody tr td:nth-child(2)').allTextContents()).toEqual(expected.comps.map((c) => c.name));
    const choice = (await page.textContent('#pool-choice')) ?? '';
    expect(choice).toBe('Chosen by: positions: his and the ones next to it; levels: his level only; seasons: his and the 4 before; playing time: at least 25% of his.');
    expect(choice).not.toMatch(/--|kindred\.|level-span|sample-floor/);
  });
});

describe('the build-a-target view', () => {
  it('finds comps for a profile set in grades and natural units', async () => {
    await openView('target');
    await page.selectOption('#want-position', 'SS');
    // the rows are the chosen position's once the builder marks them so (the first position's may come first)
    await page.waitForSelector('#want-rows[data-position="SS"] #want-grade-obp');
    await page.locator('#want-grade-obp').fill('65');
    await page.fill('#want-value-iso', '.180');
    await page.locator('#want-grade-k_pct').fill('40');
    await page.fill('#opt-k', '10');
    await page.click('#run');
    // The view's summary names the hand-built profile only once this answer is drawn (a table from the
    // view shown before may still be on the page until then).
    await page.waitForFunction(() => document.querySelector('#summary')?.textContent?.includes('hand-built SS profile') === true);
    await page.waitForSelector('#comps-table tbody tr');
    await page.waitForSelector('#map-chart svg');
    const expected = await api(`/api/comps?want=${encodeURIComponent('k_pct=40g,obp=65g,iso=.180')}&position=SS`);
    const names = await page.locator('#comps-table tbody tr td:nth-child(2)').allTextContents();
    expect(names).toEqual(expected.comps.map((c) => c.name));
    expect(await page.textContent('#summary')).toContain('hand-built SS profile');
    expect(await page.locator('#grade-chart svg .mark-symbol.role-mark path').count()).toBe(6);
    await page.screenshot({ path: join(ARTIFACTS, 'target.png'), fullPage: true });
  });
});

describe('the prospect view', () => {
  it('shows the comps at his level and age, what became of them, and the outcome chart', async () => {
    await openView('prospect');
    const who = prospectTarget();
    await pick('player', who);
    expect(await page.inputValue('#opt-k')).toBe('25');
    // the page shows, and so sends, the server's own least coverage for prospect comps (0.25, not the comps 0.5)
    expect(await page.inputValue('#opt-min-coverage')).toBe('0.25');
    await page.click('#run');
    await page.waitForSelector('#comps-table tbody tr');
    await page.waitForSelector('#extra-chart svg');
    const expected = (await api(`/api/prospect?player=${who.id}&season=${who.season}&level=${who.level}&position=${''}`.replace('&position=', ''))) as CompsResult & { outlook: { comps_used: number } };
    const names = await page.locator('#comps-table tbody tr td:nth-child(2)').allTextContents();
    expect(names).toEqual(expected.comps.map((c) => c.name));
    expect(await page.textContent('#result-note')).toContain(`from ${expected.outlook.comps_used} comps`);
    // Two share bars, plus a median tick per distribution that has values (rect marks too).
    expect(await page.locator('#extra-chart svg .mark-rect.role-mark path').count()).toBeGreaterThanOrEqual(2);
    const peaks = (expected.comps as unknown[]).filter((c) => {
      const o = typeof c === 'object' && c !== null && 'outcome' in c ? c.outcome : null;
      const censored = typeof c === 'object' && c !== null && 'censored' in c && c.censored === true;
      return !censored && typeof o === 'object' && o !== null && (('peak_ops_plus' in o && o.peak_ops_plus !== null) || ('peak_fip_minus' in o && o.peak_fip_minus !== null));
    }).length;
    expect(await page.locator('#extra-chart svg .mark-symbol.role-mark path').count()).toBe(peaks);
    expect(await page.locator('#comps-table thead th').allTextContents()).toContain('Reached top level');
    await page.screenshot({ path: join(ARTIFACTS, 'prospect.png'), fullPage: true });
  });
});

describe('the cheaper comps view', () => {
  it('lists comps under a salary limit with the value frontier chart', async () => {
    await openView('cheaper');
    const who = cheaperTarget();
    await pick('player', who);
    await page.fill('#opt-max-salary', '2,000,000');
    await page.click('#run');
    await page.waitForSelector('#comps-table tbody tr');
    await page.waitForSelector('#extra-chart svg');
    const expected = await api(`/api/cheaper?player=${who.id}&season=${who.season}&level=${who.level}&max-salary=2000000&k=10`);
    const names = await page.locator('#comps-table tbody tr td:nth-child(2)').allTextContents();
    expect(names).toEqual(expected.comps.map((c) => c.name));
    expect(await page.textContent('#result-note')).toContain('Salary limit $2,000,000');
    expect(await page.locator('#extra-chart svg .mark-symbol.role-mark path').count()).toBe(expected.comps.length);
    const [csvDownload] = await Promise.all([page.waitForEvent('download'), page.click('#export-csv')]);
    const header = (await readFile(await csvDownload.path(), 'utf8')).split('\n')[0];
    expect(header).toContain(',likeness,distance,coverage,salary_usd,value_score,frontier,alike,apart,');
    await page.screenshot({ path: join(ARTIFACTS, 'cheaper.png'), fullPage: true });
  });
});

describe('the one-to-one view', () => {
  it('compares a candidate with a target: percentile, grades and the closest in the pool', async () => {
    await openView('match');
    const g = store.groups.get('SP');
    const top = store.levels.indexOf('Top');
    const a = uniquePlayer('SP', (i) => g?.level[i] === top);
    const b = uniquePlayer('SP', (i) => g?.level[i] === top && store.players[g.player[i] as number]?.playerId !== a.id, 3);
    await pick('player', a);
    await pick('other', b);
    await page.click('#run');
    await page.waitForSelector('#comps-table tbody tr');
    await page.waitForSelector('#grade-chart svg');
    const r = await fetch(new URL(`/api/match?player=${a.id}&season=${a.season}&level=${a.level}&candidate=${b.id}&season-b=${b.season}&level-b=${b.level}&k=10`, srv.url));
    const expected = (await r.json()) as { candidate: { name: string; percentile: number }; closest: { name: string } | null };
    const names = await page.locator('#comps-table tbody tr td:nth-child(2)').allTextContents();
    expect(names[0]).toBe(expected.candidate.name);
    if (expected.closest && expected.closest.name !== expected.candidate.name) expect(names[1]).toBe(expected.closest.name);
    expect(await page.textContent('#result-note')).toContain(`more alike than ${expected.candidate.percentile.toFixed(0)}%`);
    // a percentile reads as a whole share of the pool, not as a bare figure with a decimal
    expect(await page.locator('#comps-table tbody tr').first().locator('td[data-label="More alike than"]').textContent()).toMatch(/^\d{1,3}% of the pool$/);
    expect(await page.locator('#grade-chart svg .mark-symbol.role-mark path').count()).toBeGreaterThan(2);
    const [jsonDownload] = await Promise.all([page.waitForEvent('download'), page.click('#export-json')]);
    expect(JSON.parse(await readFile(await jsonDownload.path(), 'utf8'))).toEqual(expected);
    await page.screenshot({ path: join(ARTIFACTS, 'match.png'), fullPage: true });
  });
});

/** Runs the prospect outlook or cheaper comps of their target and waits for that job's own answer (its note). */
async function runWidest(job: 'prospect' | 'cheaper'): Promise<void> {
  await openView(job);
  await pick('player', job === 'prospect' ? prospectTarget() : cheaperTarget());
  if (job === 'cheaper') await page.fill('#opt-max-salary', '2,000,000');
  await page.click('#run');
  await page.waitForFunction((word) => document.querySelector('#result-note')?.textContent?.startsWith(word) === true && document.querySelector('#comps-table tbody tr') !== null, job === 'prospect' ? 'Outlook over' : 'Salary limit');
}

/** Widths of the window, the page, the table's box and the table, and where the controls and results sit. */
async function layout(): Promise<{ window: number; page: number; box: number; table: number; tableRight: number; boxRight: number; controlsBottom: number; resultsTop: number; cardRows: number }> {
  return page.evaluate(() => {
    const box = document.querySelector('.table-wrap');
    const table = document.querySelector('#comps-table');
    const controls = document.querySelector('#controls');
    const results = document.querySelector('#results-slot');
    if (!box || !table || !controls || !results) throw new Error('the page lacks its table or controls');
    const rows = Array.from(document.querySelectorAll('#comps-table tbody tr'));
    return {
      window: document.documentElement.clientWidth,
      page: document.documentElement.scrollWidth,
      box: box.clientWidth,
      table: box.scrollWidth,
      tableRight: table.getBoundingClientRect().right,
      boxRight: box.getBoundingClientRect().right,
      controlsBottom: controls.getBoundingClientRect().bottom,
      resultsTop: results.getBoundingClientRect().top,
      cardRows: rows.filter((tr) => getComputedStyle(tr).display === 'grid').length,
    };
  });
}

describe('the page at 1366 px and 820 px wide', () => {
  afterAll(async () => {
    await page.setViewportSize({ width: 1400, height: 1000 });
  });

  it('shows the widest tables (prospect outlook, cheaper comps) whole beside the controls at 1366 px', async () => {
    await page.setViewportSize({ width: 1366, height: 900 });
    for (const job of ['prospect', 'cheaper'] as const) {
      await runWidest(job);
      const m = await layout();
      // nothing cut: the table is no wider than its box, and the page no wider than the window
      expect(m.table, job).toBeLessThanOrEqual(m.box);
      expect(m.tableRight, job).toBeLessThanOrEqual(m.boxRight + 0.5);
      expect(m.page, job).toBeLessThanOrEqual(m.window);
      // two columns: the results start beside the controls, above their bottom
      expect(m.resultsTop, job).toBeLessThan(m.controlsBottom);
      expect(m.cardRows, job).toBe(0);
      await page.screenshot({ path: join(ARTIFACTS, `${job}-1366.png`), fullPage: true });
    }
  });

  it('reflows at 820 px: the controls above the results, each comp a card of labelled cells, nothing wider than the window', async () => {
    await page.setViewportSize({ width: 820, height: 1000 });
    for (const job of ['prospect', 'cheaper'] as const) {
      await runWidest(job);
      const m = await layout();
      expect(m.controlsBottom, job).toBeLessThanOrEqual(m.resultsTop);
      expect(m.table, job).toBeLessThanOrEqual(m.box);
      expect(m.page, job).toBeLessThanOrEqual(m.window);
      const rows = await page.locator('#comps-table tbody tr').count();
      expect(m.cardRows, job).toBe(rows);
      expect(await page.locator('#comps-table tbody tr').first().locator('td').nth(1).getAttribute('data-label')).toBe('Name');
      await page.screenshot({ path: join(ARTIFACTS, `${job}-820.png`), fullPage: true });
    }
  });
});

describe('the page as a whole', () => {
  it('loaded nothing from outside the server and logged no error', () => {
    expect(problems.filter((p) => !p.includes('status of 400'))).toEqual([]);
  });
});
