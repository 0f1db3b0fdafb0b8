/** Shows the database start-up state in a `[data-db-status]` element: loading, then hidden, or the failure in words. */
import { onDbState } from './duckdb.ts';

export function bindDbStatus(el: HTMLElement | null, loadingText = 'Starting the in-browser database and opening the catalog…'): void {
  if (!el) return;
  onDbState((s) => {
    if (s.phase === 'starting') {
      el.hidden = false;
      el.dataset.kind = 'loading';
      el.textContent = loadingText;
    } else if (s.phase === 'failed') {
      el.hidden = false;
      el.dataset.kind = 'error';
      el.setAttribute('role', 'alert');
      el.textContent = s.message;
    } else {
      el.hidden = true;
    }
  });
}
