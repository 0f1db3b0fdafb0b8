import type { CensusConfig } from './CensusConfig.ts';

/**
 * What a published site will lack because the config leaves it out, as one line for `site build`
 * to print (null when nothing is missing): without a title the site is headed with the tool's
 * name; without a description its landing page says nothing of the catalog; without a licence
 * or a preferred citation, readers are not told how they may reuse it or how to cite it. A config
 * written by `dawn-census init` has these commented out until the group fills them in.
 */
export function publicationGaps(config: Pick<CensusConfig, 'title' | 'description' | 'licence' | 'citation'>, configName: string): string | null {
  const blank = (s: string | undefined): boolean => s === undefined || s.trim() === '';
  const missing = (['title', 'description', 'licence', 'citation'] as const).filter((k) => blank(config[k]));
  if (missing.length === 0) return null;
  const effects: string[] = [];
  if (missing.includes('title')) effects.push('the site is headed "Dawn Census"');
  if (missing.includes('description')) effects.push('its landing page does not describe the catalog');
  if (missing.includes('licence') || missing.includes('citation')) effects.push('readers are not told how to reuse or cite it');
  return `note: ${configName} gives no ${missing.join(', ')}: ${effects.join('; ')} (set ${missing.length === 1 ? 'it' : 'them'} in ${configName})`;
}
