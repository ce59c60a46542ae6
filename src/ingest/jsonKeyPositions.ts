/** Where a key (or a JSON text position) sits in the text: 1-based line and column. */
export interface TextPosition {
  readonly line: number;
  readonly column: number;
}

/**
 * The line and column of every object key of a JSON text, by its path of
 * keys joined with "." (e.g. `columns.batting.csv.SO`; array elements are not
 * descended into). Expects text that JSON.parse accepted; a later key with
 * the same path keeps the first position.
 *
 * @example
 * jsonKeyPositions('{\n  "files": {"a.csv": "b"}\n}').get('files.a.csv'); // => { line: 2, column: 13 }
 */
export function jsonKeyPositions(text: string): Map<string, TextPosition> {
  const out = new Map<string, TextPosition>();
  /** One frame per open object or array: the object's path and whether the next string is a key. */
  const stack: { path: string; isObject: boolean; expectKey: boolean }[] = [];
  let lastKey = '';
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (ch === '\n') {
      line += 1;
      lineStart = i + 1;
    } else if (ch === '"') {
      const start = i;
      let value = '';
      for (i += 1; i < text.length && text[i] !== '"'; i++) {
        if (text[i] === '\\') {
          i += 1;
          value += text[i] === 'n' ? '\n' : text[i] === 't' ? '\t' : (text[i] ?? '');
        } else value += text[i];
      }
      const top = stack[stack.length - 1];
      if (top !== undefined && top.isObject && top.expectKey) {
        const path = top.path === '' ? value : `${top.path}.${value}`;
        if (!out.has(path)) out.set(path, { line, column: start - lineStart + 1 });
        lastKey = path;
        top.expectKey = false;
      }
    } else if (ch === '{' || ch === '[') {
      const top = stack[stack.length - 1];
      const path = top === undefined ? '' : top.isObject ? lastKey : `${top.path}[]`;
      stack.push({ path, isObject: ch === '{', expectKey: ch === '{' });
    } else if (ch === '}' || ch === ']') {
      stack.pop();
    } else if (ch === ',') {
      const top = stack[stack.length - 1];
      if (top !== undefined && top.isObject) top.expectKey = true;
    }
  }
  return out;
}

/** The line and column of a 0-based offset into a text. */
export function positionAt(text: string, offset: number): TextPosition {
  let line = 1;
  let lineStart = 0;
  const end = Math.min(Math.max(offset, 0), text.length);
  for (let i = 0; i < end; i++) {
    if (text[i] === '\n') {
      line += 1;
      lineStart = i + 1;
    }
  }
  return { line, column: end - lineStart + 1 };
}
