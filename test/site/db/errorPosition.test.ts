import { describe, expect, it } from 'vitest';
import { errorPosition } from '../../../src/site/db/errorPosition.ts';

describe('where DuckDB found the error', () => {
  it('reads the caret under the LINE diagram as an offset into the text', () => {
    // The diagram as DuckDB-WASM 1.28.0 printed it in the browser for this query (measured).
    const sql = 'SELECT id FORM census';
    const msg = 'Parser Error: syntax error at or near "census"\nLINE 1: SELECT id FORM census\n                       ^';
    expect(errorPosition(msg, sql)).toEqual({ from: 15, line: 1, column: 16 });
    expect(sql.slice(15)).toBe('census');
  });

  it('counts the lines before the one with the error', () => {
    const sql = 'SELECT *\nFROM census WHERE nope > 1';
    const msg = 'Binder Error: Referenced column "nope" not found in FROM clause!\nLINE 2: FROM census WHERE nope > 1\n                          ^';
    const at = errorPosition(msg, sql)!;
    expect(at.line).toBe(2);
    expect(sql.slice(at.from, at.from + 4)).toBe('nope');
  });

  it('finds a trimmed line ("..." in front) in the text', () => {
    const pad = 'x, '.repeat(40);
    const sql = `SELECT ${pad}nope FROM census`;
    const shown = `...${pad.slice(-30)}nope FROM census`;
    const caret = ' '.repeat('LINE 1: '.length + 3 + 30) + '^';
    const at = errorPosition(`Binder Error: no\nLINE 1: ${shown}\n${caret}`, sql)!;
    expect(sql.slice(at.from, at.from + 4)).toBe('nope');
  });

  it('gives null when the message has no diagram', () => {
    expect(errorPosition('Catalog Error: Table with name x does not exist!', 'SELECT * FROM x')).toBeNull();
  });
});
