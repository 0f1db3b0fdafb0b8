/** The publication fields a site shows from the catalog's metadata. */
export const PUBLICATION_FIELDS = ['title', 'description', 'licence', 'citation'] as const;
export type PublicationText = Partial<Record<(typeof PUBLICATION_FIELDS)[number], string>>;

const blank = (s: string | undefined): boolean => s === undefined || s.trim() === '';

/**
 * Notes for `site build` about the publication fields, one line each (none when all is well).
 * The site shows the title, description, licence and citation recorded in the catalog's
 * `.meta.json` when it was derived, not the config's of today. So: a field recorded by neither
 * (without a title the site is headed with the tool's name; without a description its landing
 * page says nothing of the catalog; without a licence or a citation readers are not told how to
 * reuse or cite it), and a field the config gives now but differently from (or instead of) what
 * was recorded, which needs another derive. A config written by `dawn-census init` has them
 * commented out until the group fills them in.
 */
export function publicationNotes(recorded: PublicationText, config: PublicationText, names: { config: string; meta: string }): string[] {
  const notes: string[] = [];
  const missing = PUBLICATION_FIELDS.filter((k) => blank(recorded[k]) && blank(config[k]));
  if (missing.length > 0) {
    const effects: string[] = [];
    if (missing.includes('title')) effects.push('the site is headed "Dawn Census"');
    if (missing.includes('description')) effects.push('its landing page does not describe the catalog');
    if (missing.includes('licence') || missing.includes('citation')) effects.push('readers are not told how to reuse or cite it');
    notes.push(`note: no ${missing.join(', ')} in ${names.config}: ${effects.join('; ')} (set ${missing.length === 1 ? 'it' : 'them'} there, then derive again)`);
  }
  const stale = PUBLICATION_FIELDS.filter((k) => !blank(config[k]) && config[k]!.trim() !== (recorded[k] ?? '').trim());
  if (stale.length > 0) {
    const one = stale.length === 1;
    notes.push(
      `note: the ${stale.join(', ')} in ${names.config} ${one ? 'is not the one' : 'are not the ones'} ${names.meta} recorded when the catalog was derived; ` +
        `the site shows the recorded ${one ? 'one' : 'ones'}: derive again to publish ${one ? 'it' : 'them'}`,
    );
  }
  return notes;
}
