import type { Readable } from 'node:stream';

/** The line `kindred serve` prints on stdout once it listens (the URL is what a user opens). */
export const servingLine = (url: string, store: string): string => `Kindred is serving ${url} from ${store}\n`;

/**
 * The URL a `kindred serve` started as a child process announces (servingLine on its stdout), for the
 * benches and tests that start one; rejects when the child ends before listening, with `why()`
 * (for instance the tail of its stderr) in the message.
 */
export function servingUrl(child: { readonly stdout: Readable; once(event: 'exit', listener: (code: number | null) => void): unknown }, why: () => string = () => ''): Promise<string> {
  return new Promise<string>((resolve, reject) => {
    let out = '';
    child.stdout.on('data', (c: Buffer) => {
      out += c.toString('utf8');
      const m = /Kindred is serving (http:\/\/\S+)/.exec(out);
      if (m?.[1]) resolve(m[1]);
    });
    child.once('exit', (code) => reject(new Error(`kindred serve exited with ${code ?? 'a signal'} before listening${why() ? `: ${why()}` : ''}`)));
  });
}
