/**
 * The installed entry point: bin/kindred.js runs the CLI compiled at install (dist/cli.js) and falls
 * back, with one line saying so, to the TypeScript sources when that build is missing.
 * Each case lays out a copy of bin/ beside links to the real src/ and node_modules/.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { execFileSync, spawnSync } from 'node:child_process';
import { copyFile, mkdir, mkdtemp, readFile, rm, symlink } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const repo = process.cwd();
const version = (JSON.parse(await readFile(join(repo, 'package.json'), 'utf8')) as { version: string }).version;
let dir = '';

async function layout(name: string): Promise<string> {
  const root = join(dir, name);
  await mkdir(join(root, 'bin'), { recursive: true });
  await copyFile(join(repo, 'bin', 'kindred.js'), join(root, 'bin', 'kindred.js'));
  await symlink(join(repo, 'src'), join(root, 'src'));
  await symlink(join(repo, 'node_modules'), join(root, 'node_modules'));
  return root;
}

function kindred(root: string, ...args: string[]): { status: number | null; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [join(root, 'bin', 'kindred.js'), ...args], { encoding: 'utf8', timeout: 120_000 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'kindred-bin-'));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('bin/kindred.js', () => {
  it('runs the compiled build quietly when it is newer than every source', async () => {
    const root = await layout('built');
    execFileSync(process.execPath, ['--import', 'tsx', join(repo, 'tools', 'buildCli.ts'), join(root, 'dist', 'cli.js')], { cwd: repo });
    const r = kindred(root, '--version');
    expect(r.stderr).toBe('');
    expect(r.stdout.trim()).toBe(version);
    expect(r.status).toBe(0);
  });

  it('says in one line that the build is missing and still answers from the sources', async () => {
    const root = await layout('unbuilt');
    const r = kindred(root, '--version');
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toContain('dist/cli.js is missing');
    expect(r.stderr).toContain('npm run build');
    expect(r.stdout.trim()).toBe(version);
    expect(r.status).toBe(0);
  });
});
