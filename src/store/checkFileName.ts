import { MANIFEST_NAME } from './manifest.ts';

/**
 * Why `name` cannot be a data file of a store, or undefined when it can. Names are flat (no folder
 * separators, not `.` or `..`, no NUL) and may not take the manifest's own name.
 *
 * @example
 * fileNameProblem('rows.f32'); // => undefined
 * fileNameProblem('a/b'); // => 'contains a folder separator'
 */
export function fileNameProblem(name: string): string | undefined {
  if (name.length === 0) return 'is empty';
  if (name === '.' || name === '..') return 'is a folder reference';
  if (name.includes('/') || name.includes('\\')) return 'contains a folder separator';
  if (name.includes('\0')) return 'contains a NUL character';
  if (name === MANIFEST_NAME) return `is reserved for the manifest`;
  return undefined;
}
