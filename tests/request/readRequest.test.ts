import { describe, expect, it } from 'vitest';
import { ParameterError } from '../../src/errors/ParameterError.ts';
import { MAX_PARAMETER_LENGTH, readRequest } from '../../src/request/readRequest.ts';
import { CLI_NAMES } from '../../src/cli/requestOptions.ts';
import { apiMessage } from '../../src/server/errorResponse.ts';

const q = (text: string): URLSearchParams => new URLSearchParams(text);

describe('readRequest(job, front, pairs)', () => {
  it('parses each value with its parser and reads defaults for the job when a value is not given', () => {
    const req = readRequest('comps', 'http', q('pool-level=AA,%20AAA&k=3&exact=&player=p1'));
    expect(req.get('poolLevel')).toEqual(['AA', 'AAA']);
    expect(req.get('k')).toBe(3);
    expect(req.get('exact')).toBe(true);
    expect(req.get('player')).toBe('p1');
    expect(readRequest('comps', 'http', q('')).get('k')).toBe(10);
    expect(readRequest('prospect', 'http', q('')).get('k')).toBe(25);
    expect(readRequest('comps', 'http', q('')).has('k')).toBe(false);
  });
  it('refuses unknown, repeated, empty and over-long parameters, and those of another front end', () => {
    expect(() => readRequest('comps', 'http', q('kk=1'))).toThrow(/unknown parameter "kk" \(did you mean k\?\)/);
    expect(() => readRequest('comps', 'http', q('k=1&k=2'))).toThrow(/^k: given more than once$/);
    expect(() => readRequest('comps', 'http', q('level='))).toThrow(/needs a value/);
    expect(() => readRequest('comps', 'http', q(`player=${'x'.repeat(MAX_PARAMETER_LENGTH + 1)}`))).toThrow(/characters long/);
    expect(() => readRequest('comps', 'http', q('store=x'))).toThrow(/unknown parameter "store"/);
    expect(() => readRequest('comps', 'cli', q('q=x'))).toThrow(/unknown parameter "q"/);
    expect(() => readRequest('comps', 'http', q('horizon=3'))).toThrow(/unknown parameter "horizon"/);
  });
  it('names the parameter at fault in the error, which each front end spells its own way', () => {
    let caught: unknown;
    try {
      readRequest('comps', 'http', q('k=0'));
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(ParameterError);
    if (!(caught instanceof ParameterError)) return;
    expect(caught.parameter).toBe('k');
    expect(caught.code).toBe('kindred.usage.badOption');
    expect(caught.exitCode).toBe(2);
    expect(caught.render(CLI_NAMES)).toBe('--k: expected a whole number of 1 or more, got "0"');
    expect(apiMessage(caught)).toBe('parameter k: expected a whole number of 1 or more, got "0"');
  });
  it('reads malformed ranges as usage errors naming the value', () => {
    expect(() => readRequest('comps', 'http', q('age=2530'))).toThrow(/^age: expected ages like .*"2530"/);
    expect(() => readRequest('comps', 'http', q('pool-season=20152020'))).toThrow(/^pool-season: expected seasons like .*"20152020"/);
    expect(() => readRequest('comps', 'http', q('age=100'))).toThrow(/"100"/);
    expect(() => readRequest('comps', 'http', q('weights=obp%3D2,obp%3D0'))).toThrow(/^weights: obp is given more than once/);
  });
});

describe('ParameterError', () => {
  it('spells every parameter of a sentence through the namer', () => {
    const e = new ParameterError('max-share', (n) => `give either ${n('max-salary')} or ${n('max-share')}, not both`, { prefixed: false });
    expect(e.render(CLI_NAMES)).toBe('give either --max-salary or --max-share, not both');
    expect(apiMessage(e)).toBe('give either max-salary or max-share, not both');
    expect(e.message).toBe('give either max-salary or max-share, not both');
  });
});
