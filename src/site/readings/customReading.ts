/**
 * The reader's own reading, from the Readings page's form: a width deflation, L_bol/λL5100,
 * dust on or off and ε, checked by the core's reading parser (the same ranges as a config file).
 */
import type { Reading } from '../../core/readings/reading.ts';
import { parseReadingSpec } from '../../core/readings/parseReadingSpec.ts';
import type { CustomReadingParams } from './readingsUrl.ts';

/** Id of the reader's reading on the page. */
export const CUSTOM_READING_ID = 'custom';

/** The reading the form describes; throws ReadingSpecError (one line naming the field) when a value is out of range. */
export function customReading(p: CustomReadingParams): Reading {
  return parseReadingSpec(
    {
      id: CUSTOM_READING_ID,
      label: 'Your reading',
      premise: 'Set by the reader on this page.',
      references: ['set by the reader on the Readings page'],
      ...(p.deflation !== 1 ? { width: 'deflated', deflation: p.deflation } : {}),
      ...(p.l5100Ratio !== null ? { l5100_ratio: p.l5100Ratio } : {}),
      dust: p.dust,
      ...(p.efficiency !== null ? { efficiency: p.efficiency } : {}),
    },
    'your reading',
  );
}
