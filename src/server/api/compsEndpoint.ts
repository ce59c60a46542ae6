import { compsCommand, targetFrom } from '../../cli/commands/compsCommand.ts';
import { compsOptionsFrom, parseQueryOptions } from '../../cli/commands/queryOptions.ts';
import { findComps } from '../../query/findComps.ts';
import type { ProfileStore } from '../../query/ProfileStore.ts';
import type { CompsResult } from '../../query/types.ts';
import { captureIo } from '../captureIo.ts';
import { commandParameters, parseParameters } from '../commandParameters.ts';
import type { Endpoint } from '../Endpoint.ts';

/** Options of `kindred comps` that name files or output formats, not a query: refused over HTTP. */
export const NOT_OVER_HTTP = ['store', 'batch', 'format'] as const;

/** The parameters of /api/comps: the options of `kindred comps` (from its own definition) and `player`. */
export const COMPS_PARAMETERS = commandParameters(compsCommand(captureIo().io, () => {}), NOT_OVER_HTTP, ['player']);

/**
 * `GET /api/comps?player=ID&season=Y&k=N...`: what `kindred comps ID --season Y --k N --format json`
 * prints, checked by the same parsers and option checks as the CLI.
 */
export function answerComps(store: ProfileStore, query: URLSearchParams): CompsResult {
  const { options, extra } = parseParameters(query, COMPS_PARAMETERS);
  const o = parseQueryOptions({ ...options, store: store.dir, format: 'json' });
  const want = typeof options.want === 'string' ? options.want : undefined;
  const compsOptions = compsOptionsFrom(o, store);
  const target = targetFrom(store, extra.get('player'), { ...o, want });
  return findComps(store, target, compsOptions);
}

export const compsEndpoint: Endpoint = {
  methods: ['GET'],
  cacheable: true,
  answer: ({ holder, query }) => answerComps(holder.current.store, query),
};
