import { readFile } from 'node:fs/promises';
import { z } from 'zod';
import { KindredError } from '../errors/KindredError.ts';
import { InputError, type InputIssue } from '../errors/InputError.ts';
import { columnsOf, ROSTER_FILES, type RosterFile } from './fileColumns.ts';

/**
 * How a club's export differs from the canonical roster format: its file
 * names and its column names, keyed by the canonical names.
 */
export interface ColumnMap {
  /** Canonical file name -> the club's file name. */
  readonly files: Readonly<Partial<Record<RosterFile, string>>>;
  /** Canonical file name -> canonical column -> the club's column name. */
  readonly columns: Readonly<Partial<Record<RosterFile, Readonly<Record<string, string>>>>>;
}

export const EMPTY_COLUMN_MAP: ColumnMap = { files: {}, columns: {} };

const clubName = z.string().trim().min(1, 'expected a non-empty name');

const columnMapSchema = z
  .object({
    files: z
      .object(Object.fromEntries(ROSTER_FILES.map((f) => [f, clubName.optional()])))
      .strict()
      .optional(),
    columns: z
      .object(
        Object.fromEntries(
          ROSTER_FILES.map((f) => [
            f,
            z.object(Object.fromEntries(columnsOf(f).map((c) => [c, clubName.optional()]))).strict().optional(),
          ]),
        ),
      )
      .strict()
      .optional(),
  })
  .strict();

/**
 * Reads and checks a column map (`--columns map.json`):
 * `{ "files": { "batting.csv": "their_export.csv" }, "columns": { "batting.csv": { "PA": "plate_app" } } }`,
 * both parts optional. Unknown file or column keys, empty names and two
 * canonical columns mapped to one club column are refused with
 * `kindred.input.badColumnMap`, naming the key.
 */
export async function loadColumnMap(path: string): Promise<ColumnMap> {
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (cause) {
    throw new KindredError('kindred.input.missingFile', `${path}: cannot read the column map (${String(cause)})`, { path });
  }
  let json: unknown;
  try {
    json = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  } catch (cause) {
    throw mapError(path, [{ key: '', message: `not valid JSON (${cause instanceof Error ? cause.message : String(cause)})` }]);
  }
  const parsed = columnMapSchema.safeParse(json);
  if (!parsed.success) {
    throw mapError(
      path,
      parsed.error.issues.map((issue) => {
        const at = issue.path.map(String).join('.');
        const keys = issue.code === 'unrecognized_keys' ? issue.keys : [];
        if (keys.length > 0) {
          const where = at === '' ? '' : `${at}.`;
          const known = at === '' ? ['files', 'columns'] : at === 'files' || at === 'columns' ? ROSTER_FILES : columnsOfKey(at);
          return {
            key: keys.map((k) => where + k).join(', '),
            message: `unknown key (expected one of ${known.join(', ')})`,
          };
        }
        return { key: at, message: issue.message };
      }),
    );
  }
  return toColumnMap(path, parsed.data);
}

function columnsOfKey(at: string): readonly string[] {
  const file = ROSTER_FILES.find((f) => at === `columns.${f}`);
  return file === undefined ? [] : columnsOf(file);
}

function toColumnMap(path: string, data: z.infer<typeof columnMapSchema>): ColumnMap {
  const files: Partial<Record<RosterFile, string>> = {};
  const columns: Partial<Record<RosterFile, Record<string, string>>> = {};
  const problems: { key: string; message: string }[] = [];
  for (const file of ROSTER_FILES) {
    const name = data.files?.[file];
    if (name !== undefined) files[file] = name;
    const cols = data.columns?.[file];
    if (cols === undefined) continue;
    const renamed: Record<string, string> = {};
    const seen = new Map<string, string>();
    for (const [canonical, club] of Object.entries(cols)) {
      if (club === undefined) continue;
      const earlier = seen.get(club);
      if (earlier !== undefined) {
        problems.push({ key: `columns.${file}.${canonical}`, message: `"${club}" is already the column of ${earlier}` });
      }
      seen.set(club, canonical);
      renamed[canonical] = club;
    }
    columns[file] = renamed;
  }
  const clubFiles = new Map<string, RosterFile>();
  for (const [canonical, club] of Object.entries(files)) {
    const earlier = clubFiles.get(club);
    if (earlier !== undefined) problems.push({ key: `files.${canonical}`, message: `"${club}" is already the file of ${earlier}` });
    const file = ROSTER_FILES.find((f) => f === canonical);
    if (file !== undefined) clubFiles.set(club, file);
  }
  if (problems.length > 0) throw mapError(path, problems);
  return { files, columns };
}

function mapError(path: string, problems: readonly { key: string; message: string }[]): InputError {
  const issues: InputIssue[] = problems.map((p) => ({
    code: 'kindred.input.badColumnMap',
    file: path,
    line: 0,
    column: 0,
    field: p.key,
    value: '',
    expected: p.message,
  }));
  const first = problems[0];
  const summary = first === undefined ? `${path}: bad column map` : `${path}: bad column map: ${first.key === '' ? '' : `${first.key}: `}${first.message}`;
  return new InputError(issues, summary);
}
