import { dimsCommand } from '../../cli/commands/dimsCommand.ts';
import { captureIo } from '../captureIo.ts';
import { commandParameters, parseParameters } from '../commandParameters.ts';
import type { Endpoint } from '../Endpoint.ts';

export const DIMS_PARAMETERS = commandParameters(dimsCommand(captureIo().io), ['format']);

/**
 * `GET /api/dims[?position=P]`: what `kindred dims [--position P] --format json` prints, got by
 * running that command in-process (the dimensions need no store).
 */
export async function answerDims(query: URLSearchParams): Promise<unknown> {
  const { options } = parseParameters(query, DIMS_PARAMETERS);
  const args = ['--format', 'json', ...(typeof options.position === 'string' ? ['--position', options.position] : [])];
  const out = captureIo();
  await dimsCommand(out.io).exitOverride().parseAsync(args, { from: 'user' });
  return JSON.parse(out.stdout()) as unknown;
}

export const dimsEndpoint: Endpoint = {
  methods: ['GET'],
  cacheable: false,
  answer: ({ query }) => answerDims(query),
};
