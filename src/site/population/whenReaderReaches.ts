/**
 * Calls `then` once, the first time the reader reaches into `root`: a pointer over it, a touch,
 * or keyboard focus. The static charts stay as they are until then, so a first view loads no
 * chart code and no database.
 */
export function whenReaderReaches(root: HTMLElement, then: () => unknown): void {
  const events = ['pointerover', 'touchstart', 'focusin'] as const;
  const go = () => {
    for (const e of events) root.removeEventListener(e, go);
    void then();
  };
  for (const e of events) root.addEventListener(e, go, { passive: true });
}
