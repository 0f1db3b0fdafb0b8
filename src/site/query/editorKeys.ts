/**
 * Keyboard behaviour of the SQL textarea: Ctrl/Cmd-Enter runs the query; Tab inserts two
 * spaces (Shift-Tab and Escape-then-Tab still leave the field, so keyboard users are not
 * trapped: after Escape, the next Tab moves focus as usual).
 */
export function attachEditorKeys(textarea: HTMLTextAreaElement, run: () => void): void {
  let escaped = false;
  textarea.addEventListener('keydown', (e) => {
    if (e.key === 'Enter' && (e.ctrlKey || e.metaKey)) {
      e.preventDefault();
      run();
      return;
    }
    if (e.key === 'Escape') {
      escaped = true;
      return;
    }
    if (e.key === 'Tab' && !e.shiftKey && !escaped && !e.ctrlKey && !e.altKey && !e.metaKey) {
      e.preventDefault();
      const { selectionStart: s, selectionEnd: t, value } = textarea;
      textarea.value = value.slice(0, s) + '  ' + value.slice(t);
      textarea.selectionStart = textarea.selectionEnd = s + 2;
      textarea.dispatchEvent(new Event('input', { bubbles: true }));
      return;
    }
    escaped = false;
  });
}
