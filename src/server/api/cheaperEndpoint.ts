import { z } from 'zod';
import { cheaperCommand } from '../../cli/commands/cheaperCommand.ts';
import { targetFrom } from '../../cli/commands/compsCommand.ts';
import { compsOptionsFrom, parseQueryOptions } from '../../cli/commands/queryOptions.ts';
import { UsageError } from '../../errors/KindredError.ts';
import { DEFAULT_SALARY_LIMIT, findCheaperComps, type SalaryLimit } from '../../outlook/findCheaperComps.ts';
import type { CheaperResult } from '../../outlook/types.ts';
import type { ProfileStore } from '../../query/ProfileStore.ts';
import { captureIo } from '../captureIo.ts';
import { commandParameters, parseParameters } from '../commandParameters.ts';
import type { Endpoint } from '../Endpoint.ts';
import { NOT_OVER_HTTP } from './compsEndpoint.ts';

/** The parameters of /api/cheaper: the options of `kindred cheaper` and `player`. */
export const CHEAPER_PARAMETERS = commandParameters(cheaperCommand(captureIo().io, () => {}), NOT_OVER_HTTP, ['player']);

const cheaperSchema = z.object({ maxSalary: z.number().nonnegative().optional(), maxShare: z.number().optional(), want: z.string().optional() });

/**
 * `GET /api/cheaper?player=ID&max-salary=USD...`: what `kindred cheaper ID ... --format json` prints:
 * comps with a known salary under the limit (default: half the target's), the value frontier marked.
 */
export function answerCheaper(store: ProfileStore, query: URLSearchParams): CheaperResult {
  const { options, extra } = parseParameters(query, CHEAPER_PARAMETERS);
  const o = parseQueryOptions({ ...options, store: store.dir, format: 'json' });
  const p = cheaperSchema.safeParse(options);
  if (!p.success) throw new UsageError(`parameter ${p.error.issues[0]?.path.join('.') ?? '?'}: ${p.error.issues[0]?.message ?? 'invalid'}`);
  const { maxSalary, maxShare, want } = p.data;
  if (maxSalary !== undefined && maxShare !== undefined) throw new UsageError('give either --max-salary or --max-share, not both');
  const limit: SalaryLimit =
    maxSalary !== undefined ? { kind: 'max-salary', usd: maxSalary } : maxShare !== undefined ? { kind: 'max-share', share: maxShare } : DEFAULT_SALARY_LIMIT;
  const comps = compsOptionsFrom(o, store);
  return findCheaperComps(store, targetFrom(store, extra.get('player'), { ...o, want }), { comps, limit });
}

export const cheaperEndpoint: Endpoint = {
  methods: ['GET'],
  cacheable: true,
  answer: ({ holder, query }) => answerCheaper(holder.current.store, query),
};
