/**
 * Finds a Chromium for the browser tests the way a newcomer's machine allows: a system Chromium when one
 * is installed, otherwise the headless build that `npm ci` brings from the npm registry
 * (`@sparticuz/chromium`, Linux only), otherwise one clear line saying what to install.
 *
 * KINDRED_BROWSER chooses: unset or `auto` (system, then bundled), `system`, `bundled`, or a path to a
 * Chromium executable.
 */
import { accessSync, constants } from 'node:fs';
import { delimiter, join } from 'node:path';

export interface FoundBrowser {
  readonly executablePath: string;
  readonly args: readonly string[];
  readonly source: 'system' | 'bundled' | 'chosen';
}

/** Flags every run uses: headless, no first-run chores, nothing fetched from outside. */
const COMMON_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--no-first-run', '--disable-sync', '--disable-quic'];
/** The npm build is a headless shell made to run as one process. */
const BUNDLED_ARGS = ['--no-zygote', '--single-process'];

const SYSTEM_NAMES = ['chromium', 'chromium-browser', 'google-chrome-stable', 'google-chrome'];
const SYSTEM_PATHS = [
  '/usr/bin/chromium',
  '/usr/bin/chromium-browser',
  '/snap/bin/chromium',
  '/Applications/Chromium.app/Contents/MacOS/Chromium',
  '/Applications/Google Chrome.app/Contents/MacOS/Google Chrome',
];

export const NO_BROWSER =
  'No browser for the page tests: install Chromium (for instance /usr/bin/chromium), or run `npm ci` on Linux to get @sparticuz/chromium, or set KINDRED_BROWSER=/path/to/chromium.';

function isExecutable(path: string): boolean {
  try {
    accessSync(path, constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

/** The first system Chromium on the usual paths or on PATH, if any. */
export function systemChromium(env: NodeJS.ProcessEnv = process.env): string | undefined {
  const onPath = (env['PATH'] ?? '').split(delimiter).filter((dir) => dir !== '').flatMap((dir) => SYSTEM_NAMES.map((name) => join(dir, name)));
  return [...SYSTEM_PATHS, ...onPath].find(isExecutable);
}

/** The Chromium shipped inside the @sparticuz/chromium package, unpacked on first use; undefined when it cannot run here. */
export async function bundledChromium(): Promise<string | undefined> {
  if (process.platform !== 'linux') return undefined;
  try {
    const { default: chromium } = await import('@sparticuz/chromium');
    chromium.setGraphicsMode = false;
    const path = await chromium.executablePath();
    return isExecutable(path) ? path : undefined;
  } catch {
    return undefined;
  }
}

export async function findBrowser(env: NodeJS.ProcessEnv = process.env): Promise<FoundBrowser> {
  const choice = env['KINDRED_BROWSER'] ?? 'auto';
  if (choice !== 'auto' && choice !== 'system' && choice !== 'bundled') {
    if (!isExecutable(choice)) throw new Error(`KINDRED_BROWSER=${choice} is not an executable file. ${NO_BROWSER}`);
    return { executablePath: choice, args: COMMON_ARGS, source: 'chosen' };
  }
  if (choice !== 'bundled') {
    const system = systemChromium(env);
    if (system) return { executablePath: system, args: COMMON_ARGS, source: 'system' };
  }
  if (choice !== 'system') {
    const bundled = await bundledChromium();
    if (bundled) return { executablePath: bundled, args: [...COMMON_ARGS, ...BUNDLED_ARGS], source: 'bundled' };
  }
  throw new Error(NO_BROWSER);
}
