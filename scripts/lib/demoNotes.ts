/**
 * Picks the short free-text note of an invented object: empty for about 45 % of them,
 * otherwise one that fits the object (its line, a flux limit, lensing) or a generic one.
 */
import type { Rng } from './demoRandom.ts';
import type { DemoTruth } from './demoTruth.ts';
import { NOTES_ANY, NOTES_HALPHA, NOTES_HBETA, NOTES_LENSED, NOTES_LIMIT, NOTES_MGII, NOTE_EMPTY_FRACTION } from './demoNames.ts';

/**
 * @param rng the row's generator (always consumes two deviates)
 * @param truth the object's true properties (the note must not contradict them)
 */
export function pickNote(rng: Rng, truth: Pick<DemoTruth, 'branch' | 'isLimit' | 'lensed'>): string {
  const u = rng();
  const v = rng();
  if (u < NOTE_EMPTY_FRACTION) return '';
  const byLine = { halpha: NOTES_HALPHA, hbeta: NOTES_HBETA, mgii: NOTES_MGII } as const;
  const specific = truth.isLimit ? NOTES_LIMIT : truth.lensed ? NOTES_LENSED : byLine[truth.branch];
  // Limits and lensed objects nearly always say so; the others mostly get a generic note.
  const useSpecific = truth.isLimit || truth.lensed ? u < 0.9 : u < 0.62;
  const list = useSpecific ? specific : NOTES_ANY;
  return list[Math.floor(v * list.length)] ?? '';
}
