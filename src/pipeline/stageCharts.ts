import { randomBytes } from 'node:crypto';
import { mkdir, readdir, rename, rm, writeFile } from 'node:fs/promises';
import { StoreError } from '../errors/KindredError.ts';
import { withCause } from '../errors/withCause.ts';

/** The names of the charts Kindred writes (storeFileNames.groupChartNames); a folder holding anything else is not replaced. */
const CHART_NAME = /^[A-Z0-9]+-(learning|drivers)\.svg$/;

/** Charts written into a temporary folder, waiting to replace the real one. */
export interface StagedCharts {
  /** Replaces `<dir>` by the staged folder (an existing chart folder is renamed away, then removed). */
  commit(): Promise<void>;
  /** Removes the staged folder. */
  discard(): Promise<void>;
}

/**
 * Writes SVG charts (file name to text) into `<dir>.tmp-<pid>-<random>`, to be swapped in with
 * `commit` once the store itself is written (the same two-rename swap as writeStore), so the folder
 * holds one build's charts, never a mix. With no charts, `commit` removes an existing chart folder
 * (a store built without an embedding has none), but only one holding nothing but Kindred's chart files.
 * Failures are StoreError `kindred.store.writeFailed`.
 */
export async function stageCharts(dir: string, charts: ReadonlyMap<string, string>): Promise<StagedCharts> {
  const suffix = `${process.pid}-${randomBytes(4).toString('hex')}`;
  const temp = `${dir}.tmp-${suffix}`;
  const fail = (what: string, cause: unknown): StoreError =>
    withCause(new StoreError('kindred.store.writeFailed', `cannot write the charts at ${dir}: ${what}`, { dir }), cause);
  if (charts.size > 0) {
    try {
      await mkdir(temp);
      for (const [name, svg] of charts) await writeFile(`${temp}/${name}`, svg, 'utf8');
    } catch (error) {
      await rm(temp, { recursive: true, force: true });
      throw fail(error instanceof Error ? error.message : String(error), error);
    }
  }
  return {
    async commit(): Promise<void> {
      const old = `${dir}.old-${suffix}`;
      let hadOld = false;
      try {
        const entries = await readdir(dir).catch(() => null);
        if (entries !== null) {
          if (!entries.every((e) => CHART_NAME.test(e))) {
            if (charts.size === 0) return;
            throw new Error(`${dir} holds files Kindred did not write (expected only <group>-learning.svg and <group>-drivers.svg); move them away first`);
          }
          await rename(dir, old);
          hadOld = true;
        }
        if (charts.size > 0) await rename(temp, dir);
        if (hadOld) await rm(old, { recursive: true, force: true });
      } catch (error) {
        if (hadOld) await rename(old, dir).catch(() => undefined);
        await rm(temp, { recursive: true, force: true });
        throw fail(error instanceof Error ? error.message : String(error), error);
      }
    },
    async discard(): Promise<void> {
      await rm(temp, { recursive: true, force: true });
    },
  };
}
