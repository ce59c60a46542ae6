import { readFile } from 'node:fs/promises';
import { z } from 'zod';
import { KindredError } from '../errors/KindredError.ts';
import { formatIssue, InputError, type InputIssue } from '../errors/InputError.ts';
import { columnsOf, formerColumnsOf, renamedColumn, ROSTER_FILES, type RosterFile } from './fileColumns.ts';
import { jsonKeyPositions, positionAt, type TextPosition } from './jsonKeyPositions.ts';

/**
 * How a club's export differs from the canonical roster format: its file
 * names and its column names, keyed by the canonical names.
 */
export interface ColumnMap {
  /** Canonical file name -> the club's file name. */
  readonly files: Readonly<Partial<Record<RosterFile, string>>>;
  /** Canonical file name -> canonical column -> the club's column name. */
  readonly columns: Readonly<Partial<Record<RosterFile, Readonly<Record<string, string>>>>>;
  /** The map file and where each key sits in it, for errors found when the roster is read. */
  readonly source?: ColumnMapSource;
  /** One line per key given under a column's earlier name (read as the current name). */
  readonly notices?: readonly string[];
}

export interface ColumnMapSource {
  readonly path: string;
  /** Key path (e.g. `files.fielding.csv`) -> its line and column in the file. */
  readonly positions: ReadonlyMap<string, TextPosition>;
}

export const EMPTY_COLUMN_MAP: ColumnMap = { files: {}, columns: {} };

/** One problem of a column map: the key path, the offending value, what was expected. */
export interface MapProblem {
  readonly key: string;
  readonly value: string;
  readonly expected: string;
  /** Where it is in the file when it is not the key's own position (a JSON syntax error). */
  readonly at?: TextPosition;
}

const clubName = z.string().trim().min(1, 'a non-empty name');

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
            z.object(Object.fromEntries([...columnsOf(f), ...formerColumnsOf(f)].map((c) => [c, clubName.optional()]))).strict().optional(),
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
 * both parts optional. Unknown file or column keys, empty names, two
 * canonical columns mapped to one club column (also a club name that is
 * another canonical column's own, unmapped name) are refused with
 * `kindred.input.badColumnMap`, naming the key and its line and column.
 */
export async function loadColumnMap(path: string): Promise<ColumnMap> {
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (cause) {
    throw new KindredError('kindred.input.missingFile', `${path}: cannot read the column map (${String(cause)})`, { path });
  }
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  let json: unknown;
  try {
    json = JSON.parse(body);
  } catch (cause) {
    const message = cause instanceof Error ? cause.message : String(cause);
    const offset = /position (\d+)/.exec(message)?.[1];
    const at = positionAt(body, offset === undefined ? body.length : Number(offset));
    throw mapError({ path, positions: new Map() }, [{ key: '', value: '', expected: `valid JSON (${message})`, at }]);
  }
  const source: ColumnMapSource = { path, positions: jsonKeyPositions(body) };
  const parsed = columnMapSchema.safeParse(json);
  if (!parsed.success) {
    throw mapError(
      source,
      parsed.error.issues.flatMap((issue): MapProblem[] => {
        const at = issue.path.map(String).join('.');
        if (issue.code === 'unrecognized_keys') {
          const where = at === '' ? '' : `${at}.`;
          const known = at === '' ? ['files', 'columns'] : at === 'files' || at === 'columns' ? ROSTER_FILES : columnsOfKey(at);
          const what = at === '' ? 'a known key' : at === 'files' || at === 'columns' ? 'a roster file' : `a column of ${at.slice('columns.'.length)}`;
          return issue.keys.map((k) => ({ key: where + k, value: k, expected: `${what}: one of ${known.join(', ')}` }));
        }
        const given = shownValue(json, issue.path);
        if (issue.code === 'invalid_type') return [{ key: at, value: given, expected: `${issue.expected === 'object' ? 'an object of names' : 'a name as text'} (${issue.message})` }];
        return [{ key: at, value: given, expected: issue.message }];
      }),
    );
  }
  return toColumnMap(source, parsed.data);
}

function columnsOfKey(at: string): readonly string[] {
  const file = ROSTER_FILES.find((f) => at === `columns.${f}`);
  return file === undefined ? [] : columnsOf(file);
}

function toColumnMap(source: ColumnMapSource, data: z.infer<typeof columnMapSchema>): ColumnMap {
  const files: Partial<Record<RosterFile, string>> = {};
  const columns: Partial<Record<RosterFile, Record<string, string>>> = {};
  const problems: MapProblem[] = [];
  const notices: string[] = [];
  for (const file of ROSTER_FILES) {
    const name = data.files?.[file];
    if (name !== undefined) files[file] = name;
    const cols = data.columns?.[file];
    if (cols === undefined) continue;
    const renamed: Record<string, string> = {};
    const seen = new Map<string, string>();
    for (const [key, club] of Object.entries(cols)) {
      if (club === undefined) continue;
      const current = renamedColumn(file, key);
      const canonical = current ?? key;
      if (current !== undefined) {
        if (cols[current] !== undefined) {
          problems.push({ key: `columns.${file}.${key}`, value: club, expected: `one key for the column (${key} is the former name of ${current}, which the map also gives)` });
        }
        notices.push(`${source.path}: key ${key} of ${file} read as ${current}, its new name (rename the key to ${current})`);
      }
      const earlier = seen.get(club);
      if (earlier !== undefined) {
        problems.push({ key: `columns.${file}.${key}`, value: club, expected: `a column of its own ("${club}" is already the column of ${earlier})` });
      }
      seen.set(club, canonical);
      renamed[canonical] = club;
    }
    // A club name that is another canonical column's own name, that column not mapped elsewhere: both would read it.
    for (const [canonical, club] of Object.entries(renamed)) {
      if (club === canonical || !columnsOf(file).includes(club) || renamed[club] !== undefined) continue;
      problems.push({
        key: `columns.${file}.${canonical}`, value: club,
        expected: `a column of its own ("${club}" is where ${club} itself is read; map ${club} to another column too, or ${canonical} to its own)`,
      });
    }
    columns[file] = renamed;
  }
  const clubFiles = new Map<string, RosterFile>();
  for (const [canonical, club] of Object.entries(files)) {
    const earlier = clubFiles.get(club);
    if (earlier !== undefined) problems.push({ key: `files.${canonical}`, value: club, expected: `a file of its own ("${club}" is already the file of ${earlier})` });
    const file = ROSTER_FILES.find((f) => f === canonical);
    if (file !== undefined) clubFiles.set(club, file);
  }
  if (problems.length > 0) throw mapError(source, problems);
  return { files, columns, source, notices };
}

/** A column map problem as an input issue located at its key (line 1 when the key cannot be found). */
export function mapIssue(source: ColumnMapSource, p: MapProblem): InputIssue {
  const at = p.at ?? source.positions.get(p.key) ?? { line: 1, column: 1 };
  return { code: 'kindred.input.badColumnMap', file: source.path, line: at.line, column: at.column, field: p.key, value: p.value, expected: p.expected };
}

function mapError(source: ColumnMapSource, problems: readonly MapProblem[]): InputError {
  const issues = problems.map((p) => mapIssue(source, p));
  const first = issues[0];
  const summary = first === undefined ? `${source.path}: bad column map` : `bad column map: ${formatIssue(first)}`;
  return new InputError(issues, summary);
}

/** The value the map gives at a path, as JSON text (`3`, `[]`), so that a refused value is shown as written. */
function shownValue(json: unknown, path: readonly PropertyKey[]): string {
  let v: unknown = json;
  for (const k of path) v = isObject(v) && typeof k !== 'symbol' ? v[String(k)] : undefined;
  return v === undefined ? '' : typeof v === 'string' ? v : JSON.stringify(v);
}

function isObject(v: unknown): v is Readonly<Record<string, unknown>> {
  return typeof v === 'object' && v !== null;
}
