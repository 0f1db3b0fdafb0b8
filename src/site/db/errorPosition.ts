/**
 * Where in the SQL text DuckDB found the error. DuckDB appends a diagram to parser and binder
 * errors:
 *
 *     LINE 1: SELECT * FORM census
 *                      ^
 *
 * The line shown may be trimmed around the error ("..." at either end). This finds the shown
 * text in that line of `sql` and returns the offset of the caret in the whole text.
 */

/** An error's place in the SQL text: `from` is an offset into the text; line and column count from 1. */
export interface ErrorPosition {
  from: number;
  line: number;
  column: number;
}

export function errorPosition(message: string, sql: string): ErrorPosition | null {
  const m = /LINE (\d+): ([^\n]*)\n( *)\^/.exec(message);
  if (!m) return null;
  const lineNo = Number(m[1]);
  const prefix = `LINE ${m[1]}: `.length;
  let shown = m[2]!;
  let caret = m[3]!.length - prefix;
  if (shown.startsWith('...')) {
    shown = shown.slice(3);
    caret -= 3;
  }
  if (shown.endsWith('...')) shown = shown.slice(0, -3);
  const lines = sql.split('\n');
  if (lineNo < 1 || lineNo > lines.length || caret < 0) return null;
  const lineText = lines[lineNo - 1]!;
  const at = lineText.indexOf(shown.trimEnd());
  const column = Math.min(lineText.length, (at >= 0 ? at : 0) + caret);
  let from = 0;
  for (let i = 0; i < lineNo - 1; i++) from += lines[i]!.length + 1;
  return { from: from + column, line: lineNo, column: column + 1 };
}
