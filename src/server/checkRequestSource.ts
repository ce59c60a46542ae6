import type { IncomingMessage } from 'node:http';
import { HttpError } from './HttpError.ts';

/**
 * Refuses a request not meant for this server or sent by another site's page:
 * - no Host header, or more than one: 400;
 * - a Host that is not one of `hosts` (DNS rebinding: a foreign name pointing at 127.0.0.1): 421;
 * - an Origin header other than `http://<an allowed host>` (including "null"): 403;
 * - Sec-Fetch-Site cross-site or same-site (a browser telling us the page was elsewhere): 403.
 * No CORS header is ever sent, so a foreign page cannot read an answer either.
 */
export function checkRequestSource(req: IncomingMessage, hosts: ReadonlySet<string>): void {
  const raw = req.headersDistinct.host;
  if (!raw || raw.length !== 1 || raw[0] === undefined || raw[0] === '') {
    throw new HttpError(400, 'kindred.http.badHost', 'the request needs exactly one Host header');
  }
  const host = raw[0].toLowerCase();
  if (!hosts.has(host)) {
    throw new HttpError(421, 'kindred.http.misdirected', `this server does not answer for host "${raw[0]}"; use one of: ${[...hosts].join(', ')}`);
  }
  const origin = req.headers.origin;
  if (origin !== undefined) {
    const m = /^http:\/\/([^/]+)$/i.exec(origin);
    if (!m || !hosts.has((m[1] ?? '').toLowerCase())) {
      throw new HttpError(403, 'kindred.http.foreignOrigin', `requests from origin "${origin}" are refused: this server answers only its own page`);
    }
  }
  const site = req.headers['sec-fetch-site'];
  if (site === 'cross-site' || site === 'same-site') {
    throw new HttpError(403, 'kindred.http.foreignOrigin', `requests from another site (Sec-Fetch-Site: ${site}) are refused`);
  }
}
