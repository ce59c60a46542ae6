/**
 * Rewrites a store's manifest so that the size and sha256 it lists for each named file match what the
 * file now holds: the edit an attacker makes so that the checksum check is bypassed and only the
 * checks behind it stand. Works from the manifest's own file list, whatever files the store has.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { MANIFEST_NAME } from '../../src/store/manifest.ts';
import { sha256Hex } from '../../src/store/sha256Hex.ts';

interface LooseManifest {
  files: Record<string, { sha256: string; bytes: number }>;
  [key: string]: unknown;
}

/** The manifest as JSON (any content), and the names of the files it lists. */
export function readManifestLoose(storeDir: string): LooseManifest {
  return JSON.parse(readFileSync(join(storeDir, MANIFEST_NAME), 'utf8'));
}

export function listedFiles(storeDir: string): string[] {
  return Object.keys(readManifestLoose(storeDir).files).sort();
}

export function resealStore(storeDir: string, names: readonly string[]): void {
  const manifest = readManifestLoose(storeDir);
  for (const name of names) {
    const bytes = readFileSync(join(storeDir, name));
    manifest.files[name] = { sha256: sha256Hex(bytes), bytes: bytes.length };
  }
  writeFileSync(join(storeDir, MANIFEST_NAME), JSON.stringify(manifest));
}

/** Swaps the contents of two files of a store (and, with `reseal`, rewrites their manifest entries). */
export function swapStoreFiles(storeDir: string, a: string, b: string, reseal: boolean): void {
  const pa = join(storeDir, a);
  const pb = join(storeDir, b);
  const bytesA = readFileSync(pa);
  writeFileSync(pa, readFileSync(pb));
  writeFileSync(pb, bytesA);
  if (reseal) resealStore(storeDir, [a, b]);
}
