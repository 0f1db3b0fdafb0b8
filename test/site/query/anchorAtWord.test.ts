import { CompletionContext, type CompletionResult, type CompletionSource } from '@codemirror/autocomplete';
import { PostgreSQL, schemaCompletionSource, sql } from '@codemirror/lang-sql';
import { ensureSyntaxTree } from '@codemirror/language';
import { EditorState } from '@codemirror/state';
import { describe, expect, it } from 'vitest';
import { anchorAtWord } from '../../../src/site/query/anchorAtWord.ts';

const COLUMNS = ['age_gyr', 'log_mbh', 'log_mbh_p16', 'z'].map((label) => ({ label, type: 'property' }));
const columnSource = schemaCompletionSource({ dialect: PostgreSQL, schema: { census: COLUMNS }, defaultTable: 'census' });

/** The completion asked for explicitly (Ctrl-Space) at the end of `doc`, with or without its syntax tree parsed. */
function complete(source: CompletionSource, doc: string, parsed: boolean): CompletionResult | null {
  const state = EditorState.create({ doc, extensions: parsed ? [sql({ dialect: PostgreSQL })] : [] });
  if (parsed) expect(ensureSyntaxTree(state, doc.length, 1000)).not.toBeNull();
  return source(new CompletionContext(state, doc.length, true)) as CompletionResult | null;
}

describe('anchorAtWord', () => {
  it('starts the column list at the half-typed name when the syntax tree lags the text', () => {
    // Without a parsed tree lang-sql offers every column from the cursor: choosing one would append it.
    const lagging = complete(columnSource, 'SELECT log_mb', false)!;
    expect(lagging.from).toBe(13);
    const anchored = complete(anchorAtWord(columnSource), 'SELECT log_mb', false)!;
    expect(anchored.from).toBe(7);
    expect(anchored.options.map((o) => o.label)).toEqual(lagging.options.map((o) => o.label));
    expect(anchored.validFor).toBeInstanceOf(RegExp);
    expect((anchored.validFor as RegExp).test('log_mbh_p')).toBe(true);
  });

  it('leaves a list that already starts at the name, or after a dot, a space or a quote, as it is', () => {
    const parsed = complete(columnSource, 'SELECT log_mb', true)!;
    expect(parsed.from).toBe(7);
    expect(complete(anchorAtWord(columnSource), 'SELECT log_mb', true)).toEqual(parsed);
    for (const doc of ['SELECT census.', 'SELECT ', 'SELECT "log_mb']) {
      const plain = complete(columnSource, doc, true);
      expect(complete(anchorAtWord(columnSource), doc, true), doc).toEqual(plain);
    }
  });

  it('anchors an answer that comes later as well', async () => {
    const later: CompletionSource = (context) => Promise.resolve({ from: context.pos, options: COLUMNS });
    const state = EditorState.create({ doc: 'SELECT z, log_' });
    const result = await anchorAtWord(later)(new CompletionContext(state, 14, true));
    expect(result!.from).toBe(10);
    expect(await anchorAtWord(() => Promise.resolve(null))(new CompletionContext(state, 14, true))).toBeNull();
  });
});
