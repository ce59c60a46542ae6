import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawn, type ChildProcessWithoutNullStreams } from 'node:child_process';
import { join } from 'node:path';
import { main } from '../../src/cli/main.ts';
import { captureIo } from '../helpers/captureIo.ts';
import { port, cacheSize } from '../../src/cli/commands/serveCommand.ts';
import { buildDemoStore, tempDir } from './serverFixture.ts';

let storeDir = '';
let remove: () => Promise<void> = async () => {};

beforeAll(async () => {
  const t = await tempDir('kindred-serve-cmd-');
  remove = t.remove;
  storeDir = join(t.dir, 'store');
  await buildDemoStore(storeDir);
});
afterAll(async () => remove());

/** Resolves when the child's stream has printed text matching `re`. */
function waitFor(stream: NodeJS.ReadableStream, re: RegExp, ms = 20_000): Promise<RegExpExecArray> {
  return new Promise((resolve, reject) => {
    let text = '';
    const timer = setTimeout(() => reject(new Error(`timed out waiting for ${re} in: ${text}`)), ms);
    const onData = (c: Buffer): void => {
      text += c.toString('utf8');
      const m = re.exec(text);
      if (m) {
        clearTimeout(timer);
        stream.off('data', onData);
        resolve(m);
      }
    };
    stream.on('data', onData);
  });
}

describe('kindred serve', () => {
  it('serves until SIGTERM, reloads the store on SIGHUP and exits 0', async () => {
    const bin = join(process.cwd(), 'bin', 'kindred.js');
    const child: ChildProcessWithoutNullStreams = spawn(process.execPath, [bin, 'serve', '--store', storeDir, '--port', '0']);
    const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
    try {
      const [, url = ''] = await waitFor(child.stdout, /Kindred is serving (http:\/\/127\.0\.0\.1:\d+\/)/);
      const info = (await (await fetch(new URL('/api/info', url))).json()) as { generation: number };
      expect(info.generation).toBe(1);
      const reloaded = waitFor(child.stderr, /reloaded .* \(generation 2\)/);
      child.kill('SIGHUP');
      await reloaded;
      const after = (await (await fetch(new URL('/api/info', url))).json()) as { generation: number };
      expect(after.generation).toBe(2);
      child.kill('SIGTERM');
      expect(await exited).toBe(0);
    } finally {
      if (child.exitCode === null) child.kill('SIGKILL');
    }
  });

  it('stops when started by npm exec (`npx kindred serve &`) and npm is killed: npm does not pass the signal on, so the server would keep the port', async () => {
    const bin = join(process.cwd(), 'bin', 'kindred.js');
    // A shell between, as npm exec puts one (`; :` keeps sh from replacing itself with node).
    const wrapper = spawn('sh', ['-c', `"${process.execPath}" "${bin}" serve --store "${storeDir}" --port 0; :`], {
      env: { ...process.env, npm_command: 'exec' },
    });
    try {
      const [, url = ''] = await waitFor(wrapper.stdout, /Kindred is serving (http:\/\/127\.0\.0\.1:\d+\/)/);
      expect((await fetch(new URL('/api/info', url))).status).toBe(200);
      const stopped = waitFor(wrapper.stderr, /the npm process that started the server has ended: stopping/, 10_000);
      wrapper.kill('SIGKILL');
      await stopped;
      await new Promise((r) => setTimeout(r, 500));
      await expect(fetch(new URL('/api/info', url))).rejects.toThrow();
    } finally {
      if (wrapper.exitCode === null) wrapper.kill('SIGKILL');
    }
  });

  it('refuses a bad port with exit code 2 and a store that is not there with exit code 1', async () => {
    const a = captureIo();
    expect(await main(['serve', '--store', storeDir, '--port', '70000'], a.io)).toBe(2);
    expect(a.stderr()).toMatch(/expected a port from 0 to 65535, got "70000"/);
    const b = captureIo();
    expect(await main(['serve', '--store', join(storeDir, 'nope'), '--port', '0'], b.io)).toBe(1);
    expect(b.stderr()).toMatch(/kindred\.store\./);
  });
});

describe('option parsers', () => {
  it('port(value) takes 0 to 65535', () => {
    expect([port('0'), port('8080'), port('65535')]).toEqual([0, 8080, 65535]);
    for (const bad of ['-1', '65536', '80.5', 'http', '']) expect(() => port(bad), bad).toThrow(/expected a port/);
  });
  it('cacheSize(value) takes 0 or a whole number', () => {
    expect([cacheSize('0'), cacheSize('1000')]).toEqual([0, 1000]);
    expect(() => cacheSize('-3')).toThrow(/whole number/);
  });
});
