import { z } from 'zod';
import { prospectCommand } from '../../cli/commands/prospectCommand.ts';
import { targetFrom } from '../../cli/commands/compsCommand.ts';
import { compsOptionsFrom, parseQueryOptions } from '../../cli/commands/queryOptions.ts';
import { StoreError, UsageError } from '../../errors/KindredError.ts';
import { findProspectComps } from '../../outlook/findProspectComps.ts';
import type { ProspectResult } from '../../outlook/types.ts';
import type { LoadedStore } from '../LoadedStore.ts';
import { captureIo } from '../captureIo.ts';
import { commandParameters, parseParameters } from '../commandParameters.ts';
import type { Endpoint } from '../Endpoint.ts';
import { NOT_OVER_HTTP } from './compsEndpoint.ts';

/** The parameters of /api/prospect: the options of `kindred prospect` (its own definition and defaults) and `player`. */
export const PROSPECT_PARAMETERS = commandParameters(prospectCommand(captureIo().io, () => {}), NOT_OVER_HTTP, ['player']);

const prospectSchema = z.object({ horizon: z.number().int().positive(), path: z.number().int().positive(), includeCensored: z.boolean() });

/**
 * `GET /api/prospect?player=ID...`: what `kindred prospect ID ... --format json` prints: earlier
 * players at his level and age, and what became of them (outcomes read with the store).
 */
export function answerProspect(loaded: LoadedStore, query: URLSearchParams): ProspectResult {
  const { options, extra } = parseParameters(query, PROSPECT_PARAMETERS);
  const store = loaded.store;
  const o = parseQueryOptions({ ...options, store: store.dir, format: 'json' });
  const p = prospectSchema.safeParse(options);
  if (!p.success) throw new UsageError(`parameter ${p.error.issues[0]?.path.join('.') ?? '?'}: ${p.error.issues[0]?.message ?? 'invalid'}`);
  if (loaded.outcomes instanceof StoreError) throw loaded.outcomes;
  const comps = compsOptionsFrom(o, store);
  const target = targetFrom(store, extra.get('player'), o);
  return findProspectComps(store, loaded.outcomes, target, { comps, horizon: p.data.horizon, path: p.data.path, includeCensored: p.data.includeCensored });
}

export const prospectEndpoint: Endpoint = {
  methods: ['GET'],
  cacheable: true,
  answer: ({ holder, query }) => answerProspect(holder.current, query),
};
