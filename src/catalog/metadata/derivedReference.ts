import type { LineId } from '../../core/derive/types.ts';
import type { ReferenceTopic } from './derivedColumns.ts';
import type { SettingsProvenance } from './settingsProvenance.ts';

const text = (v: unknown): string | undefined => (typeof v === 'string' && v !== '' ? v : undefined);

/**
 * The reference(s) a derived column rests on under these settings: the cosmology for ages and
 * distances, the calibration of each measured line (in priority order) for masses, and so on.
 */
export function derivedReference(topic: ReferenceTopic, p: SettingsProvenance, lines: readonly LineId[]): string | undefined {
  switch (topic) {
    case 'cosmology':
      return text(p.cosmology.reference);
    case 'lineLuminosity':
      return [text(p.dustCurve.reference), `intrinsic Hα/Hβ: ${p.intrinsicBalmer.reference}`].filter(Boolean).join('; ');
    case 'continuum': {
      const gh05 = p.bolometric.records.find((r) => typeof r.reference === 'string' && r.reference.includes('eq. 1'));
      return gh05 ? `From broad Hα where no continuum is measured: ${String(gh05.reference)} (inverted)` : undefined;
    }
    case 'virial': {
      const used = p.settings.linePriority.filter((l) => lines.includes(l));
      const refs = used.map((l) => text(p.calibrations[l]?.reference) ?? String(p.calibrations[l]?.id ?? p.settings.calibrations[l]));
      return refs.length ? refs.join('; ') : undefined;
    }
    case 'bolometric':
      return p.bolometric.reference || undefined;
    case 'eddington':
      return p.eddington.reference;
    case 'growth':
      return p.growth.reference;
    case 'local':
      return text(p.localRelation.reference);
  }
}
