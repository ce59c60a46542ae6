import { answerDims } from '../../request/answerDims.ts';
import { readRequest } from '../../request/readRequest.ts';
import type { ServerEndpoint } from '../Endpoint.ts';

/** `GET /api/dims[?position=P]`: what `kindred dims [--position P] --format json` prints (the dimensions need no store). */
export const dimsEndpoint: ServerEndpoint = {
  methods: ['GET'],
  cacheable: false,
  answer: ({ query }) => answerDims(readRequest('dims', 'http', query)),
};
