import type { CompletionResult, CompletionSource } from '@codemirror/autocomplete';

/** An SQL identifier ending at the cursor. */
const WORD_BEFORE = /[A-Za-z_][\w$]*$/;

/**
 * `source`, with a result that starts at the cursor moved back to the start of the identifier
 * the cursor ends (and the list then filtered by what was typed). @codemirror/lang-sql finds the
 * identifier in the syntax tree, which is parsed within a time budget: on a busy machine it can
 * lag the text by a few keystrokes, and the column source then offers every column from the
 * cursor, so that a chosen one is appended to the half-typed name ("log_mb" + "age_gyr"). A result
 * that already starts elsewhere (the identifier found, after a dot or a quote) is left as it is.
 */
export function anchorAtWord(source: CompletionSource): CompletionSource {
  return (context) => {
    const word = context.matchBefore(WORD_BEFORE);
    const anchor = (result: CompletionResult | null): CompletionResult | null =>
      result && word && word.from < context.pos && result.from === context.pos ? { ...result, from: word.from, validFor: /^[\w$]*$/ } : result;
    const result = source(context);
    return result instanceof Promise ? result.then(anchor) : anchor(result);
  };
}
