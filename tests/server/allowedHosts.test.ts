import { describe, expect, it } from 'vitest';
import { allowedHosts } from '../../src/server/allowedHosts.ts';

describe('allowedHosts(boundHost, port)', () => {
  it('allows the loopback names with the port', () => {
    expect([...allowedHosts('127.0.0.1', 8080)].sort()).toEqual(['127.0.0.1:8080', '[::1]:8080', 'localhost:8080']);
  });
  it('adds a bound name or address (IPv6 in brackets), never a wildcard address', () => {
    expect(allowedHosts('kindred.lan', 9000).has('kindred.lan:9000')).toBe(true);
    expect(allowedHosts('::1', 9000).has('[::1]:9000')).toBe(true);
    expect(allowedHosts('0.0.0.0', 9000).has('0.0.0.0:9000')).toBe(false);
    expect(allowedHosts('::', 9000).has('[::]:9000')).toBe(false);
  });
  it('allows the bare names on port 80 only (browsers omit the default port)', () => {
    expect(allowedHosts('127.0.0.1', 80).has('localhost')).toBe(true);
    expect(allowedHosts('127.0.0.1', 8080).has('localhost')).toBe(false);
  });
});
