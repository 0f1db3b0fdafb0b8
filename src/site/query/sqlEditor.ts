/**
 * The SQL editor of the workspace, on CodeMirror 6: SQL highlighting in the site's colours,
 * completion of SQL keywords and of the census columns (each with its unit and meaning, the
 * meaning clear of the list on a narrow screen: see infoClearOfList),
 * the place of an error marked in the text, undo history, bracket matching.
 *
 * Keys: Ctrl/Cmd-Enter runs the query; Tab indents; Escape then Tab leaves the editor (so
 * keyboard users are never trapped); Ctrl-Space opens the completion list.
 */
import { autocompletion, closeBrackets, closeBracketsKeymap, completionKeymap, type Completion } from '@codemirror/autocomplete';
import { defaultKeymap, history, historyKeymap, indentWithTab, temporarilySetTabFocusMode } from '@codemirror/commands';
import { PostgreSQL, schemaCompletionSource, sql } from '@codemirror/lang-sql';
import { bracketMatching, HighlightStyle, syntaxHighlighting } from '@codemirror/language';
import { lintGutter, setDiagnostics } from '@codemirror/lint';
import { EditorState, Prec } from '@codemirror/state';
import { EditorView, keymap } from '@codemirror/view';
import { tags } from '@lezer/highlight';
import { anchorAtWord } from './anchorAtWord.ts';
import { CLEAR_OF_LIST_CLASS, infoClearOfList } from './infoClearOfList.ts';

/** A catalog column as the completion list shows it. */
export interface ColumnInfo {
  name: string;
  unit: string;
  description: string;
}

/** What the workspace needs from the editor. */
export interface SqlEditor {
  readonly view: EditorView;
  value(): string;
  setValue(text: string): void;
  focus(): void;
  /** Marks `message` at offset `from` (to the end of the word there), or clears every mark (null). */
  markError(from: number | null, message?: string): void;
}

const highlight = HighlightStyle.define([
  { tag: tags.keyword, color: '#7a2e0e', fontWeight: '600' },
  { tag: [tags.string, tags.special(tags.string)], color: '#2f6b3a' },
  { tag: [tags.number, tags.bool, tags.null], color: '#1f5c8a' },
  { tag: tags.comment, color: '#6b6b6b', fontStyle: 'italic' },
  { tag: [tags.operator, tags.punctuation], color: '#4a4a4a' },
  { tag: tags.typeName, color: '#6b3f8a' },
]);

const theme = EditorView.theme({
  '&': { border: '1px solid #b9af9b', borderRadius: '4px', background: '#fff', fontSize: '0.92rem' },
  '&.cm-focused': { outline: '3px solid var(--focus, #f2b705)', outlineOffset: '1px' },
  '.cm-content': { fontFamily: 'var(--mono, ui-monospace, monospace)', minHeight: '8.5rem', padding: '0.5rem 0' },
  '.cm-scroller': { maxHeight: '22rem', overflow: 'auto' },
  '.cm-tooltip-autocomplete .cm-completionDetail': { fontStyle: 'normal', color: '#6b6b6b', marginLeft: '0.6em' },
  '.cm-completionInfo': { maxWidth: '22rem', fontFamily: 'var(--sans, sans-serif)', fontSize: '0.85rem' },
  // On a narrow screen the meaning sits just below (or above) the list: a gap tells the two apart.
  [`.cm-completionInfo.${CLEAR_OF_LIST_CLASS}`]: { marginTop: '2px', boxShadow: '0 2px 6px rgba(0, 0, 0, 0.15)' },
});

/** Completion entries for the catalog's columns: name, unit as the detail, meaning as the info. */
export function columnCompletions(columns: readonly ColumnInfo[]): Completion[] {
  return columns.map((c) => ({ label: c.name, type: 'property', detail: c.unit || undefined, info: c.description || undefined, boost: 1 }));
}

/** Replaces `textarea` (kept, hidden, for pages read without JavaScript) with the editor. */
export function createSqlEditor(textarea: HTMLTextAreaElement, options: { columns: readonly ColumnInfo[]; table: string; run: () => void; onChange?: () => void }): SqlEditor {
  // The language with its keyword completion; the columns' completion is added below, anchored
  // at the word being typed (see anchorAtWord).
  const language = sql({ dialect: PostgreSQL, upperCaseKeywords: true });
  const columnSource = schemaCompletionSource({
    dialect: PostgreSQL,
    schema: { [options.table]: columnCompletions(options.columns) },
    defaultTable: options.table,
  });
  const columns = language.language.data.of({ autocomplete: anchorAtWord(columnSource) });
  const runKeys = Prec.highest(
    keymap.of([
      { key: 'Mod-Enter', run: () => (options.run(), true) },
      { key: 'Escape', run: temporarilySetTabFocusMode },
    ]),
  );
  const view = new EditorView({
    state: EditorState.create({
      doc: textarea.value,
      extensions: [
        runKeys,
        history(),
        closeBrackets(),
        bracketMatching(),
        autocompletion({ icons: false, positionInfo: infoClearOfList }),
        lintGutter(),
        keymap.of([...closeBracketsKeymap, ...defaultKeymap, ...historyKeymap, ...completionKeymap, indentWithTab]),
        language,
        columns,
        syntaxHighlighting(highlight),
        EditorView.lineWrapping,
        theme,
        EditorView.contentAttributes.of({ 'aria-label': 'SQL query', 'aria-describedby': textarea.getAttribute('aria-describedby') ?? '', 'data-sql-input': '' }),
        EditorView.updateListener.of((u) => {
          if (!u.docChanged) return;
          textarea.value = u.state.doc.toString();
          options.onChange?.();
        }),
      ],
    }),
  });
  textarea.hidden = true;
  textarea.after(view.dom);
  return {
    view,
    value: () => view.state.doc.toString(),
    setValue(text: string) {
      view.dispatch({ changes: { from: 0, to: view.state.doc.length, insert: text } });
    },
    focus: () => view.focus(),
    markError(from: number | null, message = '') {
      if (from === null) {
        view.dispatch(setDiagnostics(view.state, []));
        return;
      }
      const doc = view.state.doc;
      const start = Math.max(0, Math.min(from, doc.length));
      const word = /^[\w"'.]+/.exec(doc.sliceString(start, Math.min(doc.length, start + 80)))?.[0].length ?? 0;
      const end = Math.min(doc.length, start + Math.max(1, word));
      view.dispatch(setDiagnostics(view.state, [{ from: start, to: end, severity: 'error', message }]));
    },
  };
}
