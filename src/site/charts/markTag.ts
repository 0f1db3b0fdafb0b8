/**
 * Names a mark's group: a class `census-<name>` (what tests and page scripts select) and the
 * same words as its aria-description (what assistive technology reads).
 */
export function tag(name: string): { className: string; ariaDescription: string } {
  return { className: markClass(name), ariaDescription: name };
}

/** The class {@link tag} gives a mark named `name`. */
export function markClass(name: string): string {
  return 'census-' + name.replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '').toLowerCase();
}
