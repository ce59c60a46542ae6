import { describe, expect, it } from 'vitest';
import { jsonKeyPositions, positionAt } from '../../src/ingest/jsonKeyPositions.ts';

describe('jsonKeyPositions(text)', () => {
  it('gives each key path its line and column (the worked example), nested objects included', () => {
    const text = '{\n  "files": {"a.csv": "b"},\n  "columns": {\n    "a.csv": { "PA": "pa", "H": "h,\\"x" }\n  }\n}';
    const at = jsonKeyPositions(text);
    expect(at.get('files')).toEqual({ line: 2, column: 3 });
    expect(at.get('files.a.csv')).toEqual({ line: 2, column: 13 });
    expect(at.get('columns.a.csv.PA')).toEqual({ line: 4, column: 16 });
    expect(at.get('columns.a.csv.H')).toEqual({ line: 4, column: 28 });
    expect(at.has('pa')).toBe(false);
  });
});

describe('positionAt(text, offset)', () => {
  it('counts lines and columns from 1', () => {
    expect(positionAt('ab\ncd', 4)).toEqual({ line: 2, column: 2 });
    expect(positionAt('ab', 0)).toEqual({ line: 1, column: 1 });
  });
});
