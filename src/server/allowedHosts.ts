/** Host names that always mean this machine. */
const LOOPBACK_NAMES = ['localhost', '127.0.0.1', '[::1]'];
/** Bind addresses that are not a name a client would type. */
const WILDCARDS = new Set(['0.0.0.0', '::', '[::]']);

/**
 * The Host header values the server answers to: the loopback names and the bound host, each with
 * the port (and without it when the port is 80, which browsers then omit). Lower case; an IPv6
 * host in brackets.
 */
export function allowedHosts(boundHost: string, port: number): ReadonlySet<string> {
  const bound = boundHost.includes(':') && !boundHost.startsWith('[') ? `[${boundHost}]` : boundHost;
  const names = new Set(LOOPBACK_NAMES);
  if (!WILDCARDS.has(bound)) names.add(bound.toLowerCase());
  const out = new Set<string>();
  for (const n of names) {
    out.add(`${n}:${port}`);
    if (port === 80) out.add(n);
  }
  return out;
}
