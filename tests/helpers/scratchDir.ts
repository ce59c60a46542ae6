import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** The folders made by scratchDir in this test file, removed after its last test (tests/setup/removeScratchDirs.ts). */
const made: string[] = [];

/**
 * A new empty folder under the system's temp folder, named `<prefix>XXXXXX`, removed with all it holds once
 * the test file is done: the rosters and stores tests write are invented player data, and nothing of it
 * should pile up in /tmp run after run.
 */
export async function scratchDir(prefix: string): Promise<string> {
  const dir = await mkdtemp(join(tmpdir(), prefix));
  made.push(dir);
  return dir;
}

/** Removes every folder scratchDir made so far (each at most once). */
export async function removeScratchDirs(): Promise<void> {
  const dirs = made.splice(0);
  await Promise.all(dirs.map((dir) => rm(dir, { recursive: true, force: true })));
}
