/**
 * The browser finder: a chosen path must exist, and the Chromium that `npm ci` brings from the npm
 * registry (@sparticuz/chromium) unpacks and runs here without any system browser.
 */
import { describe, expect, it } from 'vitest';
import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import { findBrowser, NO_BROWSER } from '../helpers/findBrowser.ts';

const run = promisify(execFile);

describe('findBrowser', () => {
  it('refuses a KINDRED_BROWSER path that is not an executable, in one line naming what to install', async () => {
    const error = await findBrowser({ KINDRED_BROWSER: '/no/such/chromium' }).then(
      () => undefined,
      (e: unknown) => e,
    );
    expect(error).toBeInstanceOf(Error);
    const message = error instanceof Error ? error.message : '';
    expect(message).toContain('/no/such/chromium');
    expect(message).toContain(NO_BROWSER);
    expect(message).not.toContain('\n');
  });

  it.runIf(process.platform === 'linux')('falls back to the npm build, which reports a Chromium version when run', async () => {
    const found = await findBrowser({ KINDRED_BROWSER: 'bundled' });
    expect(found.source).toBe('bundled');
    const { stdout } = await run(found.executablePath, ['--version'], { timeout: 30_000 });
    expect(stdout).toMatch(/Chromium \d+\.\d+/);
  });
});
