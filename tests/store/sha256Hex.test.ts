import { describe, expect, it } from 'vitest';
import { sha256Hex } from '../../src/store/sha256Hex.ts';

describe('sha256Hex(bytes)', () => {
  it('gives the published digests of "abc" and the empty message (FIPS 180-2 appendix B.1; NIST examples)', () => {
    expect(sha256Hex(new TextEncoder().encode('abc'))).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    expect(sha256Hex(new Uint8Array(0))).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
  });
});
