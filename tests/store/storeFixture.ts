import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** A fresh parent folder for stores, and what is left in it (to prove no temp folder stays behind). */
export function makeParent(): { parent: string; leftovers: () => string[]; remove: () => void } {
  const parent = mkdtempSync(join(tmpdir(), 'kindred-store-'));
  return {
    parent,
    leftovers: () => readdirSync(parent).sort(),
    remove: () => rmSync(parent, { recursive: true, force: true }),
  };
}
