/** Fills the place page's `#place-readings-body` with the new object under every reading embedded at build time. */
import type { DeriveSettings, ObjectInputs } from '../../core/derive/types.ts';
import type { Reading } from '../../core/readings/reading.ts';
import { placeReadingsTable, placeUnderReadings } from './placeUnderReadings.ts';

export function showUnderReadings(doc: Document, inputs: ObjectInputs, settings: DeriveSettings): void {
  const mount = doc.getElementById('place-readings-body');
  const readings = JSON.parse(doc.getElementById('place-readings')?.textContent ?? '[]') as Reading[];
  if (!mount || readings.length === 0) return;
  try {
    mount.replaceChildren(placeReadingsTable(doc, placeUnderReadings(inputs, settings, readings)));
  } catch (err) {
    mount.textContent = `The object could not be derived under the readings: ${err instanceof Error ? err.message : String(err)}`;
  }
}
