import type { CheaperResult, CompsResult, DimensionInfo, MatchResult, PlayerHit, PoolMap, ProspectResult, StoreInfo } from '../request/apiContract.ts';

/** An error answered by the API: its stable code, message and the parameter at fault (if any). */
export class ApiError extends Error {
  readonly code: string;
  readonly status: number;
  readonly parameter: string | undefined;

  constructor(status: number, code: string, message: string, parameter?: string) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.parameter = parameter;
  }
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null;
}

/** GETs (or POSTs) a JSON endpoint of this server; an error body becomes an ApiError. */
export async function getJson(path: string, params: URLSearchParams = new URLSearchParams(), method: 'GET' | 'POST' = 'GET'): Promise<unknown> {
  const qs = params.toString();
  const res = await fetch(qs ? `${path}?${qs}` : path, { method, headers: { Accept: 'application/json' } });
  const body: unknown = await res.json().catch(() => null);
  if (!res.ok) {
    const err = isRecord(body) && isRecord(body.error) ? body.error : {};
    throw new ApiError(
      res.status,
      typeof err.code === 'string' ? err.code : 'unknown',
      typeof err.message === 'string' ? err.message : `the server answered HTTP ${res.status}`,
      typeof err.parameter === 'string' ? err.parameter : undefined,
    );
  }
  return body;
}

/*
 * The server is this page's own (same build, same contract types), so its answers are taken as the
 * declared shapes after a check of their top-level fields.
 */

export async function fetchInfo(): Promise<StoreInfo> {
  const v = await getJson('/api/info');
  if (!isInfo(v)) throw new ApiError(0, 'badAnswer', '/api/info answered an unexpected shape');
  return v;
}

export async function fetchPlayers(q: string, limit = 10): Promise<readonly PlayerHit[]> {
  const v = await getJson('/api/players', new URLSearchParams({ q, limit: String(limit) }));
  if (!isRecord(v) || !Array.isArray(v.players)) throw new ApiError(0, 'badAnswer', '/api/players answered an unexpected shape');
  return v.players.filter(isPlayerHit);
}

export async function fetchComps(path: string, params: URLSearchParams): Promise<CompsResult> {
  const v = await getJson(path, params);
  if (!isCompsResult(v)) throw new ApiError(0, 'badAnswer', `${path} answered an unexpected shape`);
  return v;
}

export async function fetchProspect(params: URLSearchParams): Promise<ProspectResult> {
  const v = await getJson('/api/prospect', params);
  if (!isProspect(v)) throw new ApiError(0, 'badAnswer', '/api/prospect answered an unexpected shape');
  return v;
}

export async function fetchCheaper(params: URLSearchParams): Promise<CheaperResult> {
  const v = await getJson('/api/cheaper', params);
  if (!isCheaper(v)) throw new ApiError(0, 'badAnswer', '/api/cheaper answered an unexpected shape');
  return v;
}

export async function fetchMatch(params: URLSearchParams): Promise<MatchResult> {
  const v = await getJson('/api/match', params);
  if (!isMatch(v)) throw new ApiError(0, 'badAnswer', '/api/match answered an unexpected shape');
  return v;
}

export async function fetchMap(group: string): Promise<PoolMap> {
  const v = await getJson('/api/map', new URLSearchParams({ group }));
  if (!isPoolMap(v)) throw new ApiError(0, 'badAnswer', '/api/map answered an unexpected shape');
  return v;
}

export async function fetchDims(position: string): Promise<readonly DimensionInfo[]> {
  const v = await getJson('/api/dims', new URLSearchParams({ position }));
  if (!isRecord(v)) throw new ApiError(0, 'badAnswer', '/api/dims answered an unexpected shape');
  const list = Object.values(v)[0];
  return Array.isArray(list) ? list.filter(isDimensionInfo) : [];
}

function isInfo(v: unknown): v is StoreInfo {
  return isRecord(v) && Array.isArray(v.levels) && isRecord(v.groups) && Array.isArray(v.presets);
}
function isPlayerHit(v: unknown): v is PlayerHit {
  return isRecord(v) && typeof v.player_id === 'string' && typeof v.name === 'string' && Array.isArray(v.seasons);
}
function isCompsResult(v: unknown): v is CompsResult {
  return isRecord(v) && isRecord(v.query) && isRecord(v.pool) && Array.isArray(v.comps);
}
function isProspect(v: unknown): v is ProspectResult {
  return isCompsResult(v) && 'outlook' in v && isRecord(v.outlook) && isRecord(v.outlook.baseline);
}
function isCheaper(v: unknown): v is CheaperResult {
  return isCompsResult(v) && 'salary' in v.pool && isRecord(v.pool.salary);
}
function isMatch(v: unknown): v is MatchResult {
  return isRecord(v) && isRecord(v.query) && isRecord(v.pool) && isRecord(v.candidate) && Array.isArray(v.candidate.dimensions);
}
function isPoolMap(v: unknown): v is PoolMap {
  return isRecord(v) && typeof v.group === 'string' && Array.isArray(v.x) && Array.isArray(v.y) && Array.isArray(v.player_id) && Array.isArray(v.season);
}
function isDimensionInfo(v: unknown): v is DimensionInfo {
  return isRecord(v) && typeof v.name === 'string' && typeof v.label === 'string' && typeof v.direction === 'string';
}
