import { Command } from 'commander';
import { isAbsolute, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { CliIo } from '../CliIo.ts';
import { buildStore } from '../../pipeline/buildStore.ts';
import { openProfileStore } from '../../store/openProfileStore.ts';
import { answerComps } from '../../request/answerComps.ts';
import { JobRequest } from '../../request/JobRequest.ts';
import { compsTable } from '../../report/compsTable.ts';
import { storeBacktest } from './storeBacktest.ts';
import { formatBuildSummary } from './buildCommand.ts';
import { DEFAULT_STORE } from '../../request/parameters.ts';
import type { ProfileStore } from '../../store/ProfileStore.ts';
import type { TargetRow } from '../../query/selectTargetRow.ts';

/** The bundled invented league. */
export const DEMO_ROSTER = fileURLToPath(new URL('../../../demo-roster', import.meta.url));

/** The demo roster's folder as the user sees it: relative to the working folder when inside it. */
function shownRoster(): string {
  const rel = relative(process.cwd(), DEMO_ROSTER);
  return rel === '' || rel.startsWith('..') || isAbsolute(rel) ? DEMO_ROSTER : rel;
}

/** The demo's featured target: the top level's catcher with the most plate appearances in the latest season. */
export function featuredTarget(store: ProfileStore): TargetRow | undefined {
  const g = store.groups.get('C');
  if (!g) return undefined;
  const top = store.levels.length - 1;
  let best = -1;
  let latest = -Infinity;
  for (let i = 0; i < g.n; i++) if ((g.level[i] as number) === top) latest = Math.max(latest, g.season[i] as number);
  for (let i = 0; i < g.n; i++) {
    if (g.level[i] !== top || g.season[i] !== latest) continue;
    if (best < 0 || (g.sample[i] as number) > (g.sample[best] as number)) best = i;
  }
  return best < 0 ? undefined : { group: 'C', row: best };
}

export function demoCommand(io: CliIo): Command {
  return new Command('demo')
    .description('build a store from the bundled invented league and show comps for one of its catchers')
    .option('--store <dir>', 'where to write the demo store', DEFAULT_STORE)
    .action(async (raw: { store: string }) => {
      io.stderr.write(`Building the demo store from ${shownRoster()} (an invented league)...\n`);
      const summary = await buildStore(DEMO_ROSTER, raw.store, { lenient: false });
      io.stderr.write(formatBuildSummary(summary));
      await storeBacktest(raw.store, io);
      const store = await openProfileStore(raw.store);
      const at = featuredTarget(store);
      if (!at) {
        io.stderr.write('The demo roster has no catcher at the top level.\n');
        return;
      }
      // answered as `kindred comps <id>` is: the request's default pool (his position, levels within one, half his PA)
      const featured = store.players[store.groups.get(at.group)?.player[at.row] ?? -1]?.playerId ?? '';
      const result = answerComps(store, new JobRequest('comps', { player: featured, season: store.groups.get(at.group)?.season[at.row] ?? 0, level: store.levels[store.groups.get(at.group)?.level[at.row] ?? -1] ?? '' }));
      io.stdout.write('\n' + compsTable(result, store.groups.get('C')?.dims ?? []));
      const id = result.query.player_id ?? '';
      io.stdout.write(
        [
          '',
          'Try next:',
          `  npx kindred comps ${id} --format json`,
          `  npx kindred comps --want "pop_2b_s=1.90,obp=.340" --position C`,
          `  npx kindred comps ${id} --pool-level Top --age 25-30 --preset glove`,
          '  npx kindred dims --position C',
          '',
        ].join('\n'),
      );
    });
}
