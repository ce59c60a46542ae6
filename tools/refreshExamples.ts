/**
 * Keeps the documentation's examples true: re-runs every command shown in a ```text block of the given
 * Markdown files (lines starting with "$ ") from the repository root and writes back what it printed
 * (stdout and stderr, in order). `npx kindred` runs as `node bin/kindred.js`, so that a command
 * started in the background (`&`, `$!`) is the server itself. A line "$ ..." whose
 * block should keep only its first lines can end in "  # first N lines".
 *
 *   node --import tsx tools/refreshExamples.ts README.md docs/jobs.md
 */
import { execFileSync } from 'node:child_process';
import { readFile, rename, writeFile } from 'node:fs/promises';

const root = new URL('..', import.meta.url).pathname;

function run(command: string): string {
  const shell = command.replace(/\s+#\s*first \d+ lines\s*$/, '').replaceAll('npx kindred', 'node bin/kindred.js');
  try {
    return execFileSync('bash', ['-c', `{ ${shell} ; } 2>&1`], { cwd: root, encoding: 'utf8', maxBuffer: 1 << 26 });
  } catch (e) {
    // a command that exits non-zero (an error example) still prints; keep what it printed
    if (typeof e === 'object' && e !== null && 'stdout' in e && typeof e.stdout === 'string') return e.stdout;
    throw e;
  }
}

// the examples run the compiled CLI: compile it first, so that no "older than src/" line is written into the docs
execFileSync('npm', ['run', '--silent', 'build:cli'], { cwd: root, stdio: 'inherit' });
for (const file of process.argv.slice(2)) {
  const text = await readFile(file, 'utf8');
  const out: string[] = [];
  const lines = text.split('\n');
  for (let i = 0; i < lines.length; i++) {
    out.push(lines[i] as string);
    if (lines[i] !== '```text' || !(lines[i + 1] ?? '').startsWith('$ ')) continue;
    let end = i + 1;
    while (end < lines.length && lines[end] !== '```') end++;
    for (let j = i + 1; j < end; j++) {
      const line = lines[j] as string;
      if (!line.startsWith('$ ')) continue;
      const command = line.slice(2);
      const keep = /#\s*first (\d+) lines\s*$/.exec(command);
      const text = run(command).replace(/\s+$/, '');
      let printed = text === '' ? [] : text.split('\n');
      if (keep) printed = [...printed.slice(0, Number(keep[1])), '...'];
      out.push(line, ...printed.map((l) => l.trimEnd()));
    }
    i = end - 1;
  }
  await writeFile(`${file}.tmp`, out.join('\n'));
  await rename(`${file}.tmp`, file);
  console.log(`refreshed ${file}`);
}
