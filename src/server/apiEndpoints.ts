import type { Endpoint } from './Endpoint.ts';
import { compsEndpoint } from './api/compsEndpoint.ts';
import { dimsEndpoint } from './api/dimsEndpoint.ts';
import { infoEndpoint } from './api/infoEndpoint.ts';
import { mapEndpoint } from './api/mapEndpoint.ts';
import { playersEndpoint } from './api/playersEndpoint.ts';
import { reloadEndpoint } from './api/reloadEndpoint.ts';
import { prospectEndpoint } from './api/prospectEndpoint.ts';
import { cheaperEndpoint } from './api/cheaperEndpoint.ts';
import { matchEndpoint } from './api/matchEndpoint.ts';
import { backtestEndpoint } from './api/backtestEndpoint.ts';

/** Every JSON endpoint by its exact path. */
export const API_ENDPOINTS: ReadonlyMap<string, Endpoint> = new Map<string, Endpoint>([
  ['/api/comps', compsEndpoint],
  ['/api/prospect', prospectEndpoint],
  ['/api/cheaper', cheaperEndpoint],
  ['/api/match', matchEndpoint],
  ['/api/backtest', backtestEndpoint],
  ['/api/players', playersEndpoint],
  ['/api/dims', dimsEndpoint],
  ['/api/map', mapEndpoint],
  ['/api/info', infoEndpoint],
  ['/api/reload', reloadEndpoint],
]);
