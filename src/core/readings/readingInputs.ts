import type { LineId, Measured, ObjectInputs } from '../derive/types.ts';
import { LINES } from '../derive/types.ts';
import type { Reading } from './reading.ts';
import type { ReadingFlagId } from './readingFlags.ts';

/** Inputs with the intrinsic core widths a catalog may carry (`fwhm_<line>_core`, km s⁻¹). */
export interface CoreWidthInputs {
  fwhmCoreKms?: Partial<Record<LineId, Measured>>;
}

/** An object's inputs as the readings see them: the derivation's, plus core widths. */
export type ReadingObjectInputs = ObjectInputs & CoreWidthInputs;

/** A measurement divided by `d` (value and errors). */
function deflate(m: Measured, d: number): Measured {
  const out: Measured = { value: m.value / d };
  if (m.errLo !== undefined) out.errLo = m.errLo / d;
  if (m.errHi !== undefined) out.errHi = m.errHi / d;
  return out;
}

/** Which width each line ended up with under a reading. */
export type WidthSource = 'measured' | 'core' | 'deflated' | 'core_fallback';

/**
 * The inputs one object is derived from under `reading`: widths replaced by core widths or
 * deflated, and dust inputs dropped when the reading applies no dust correction. Never mutates
 * `inputs`. Returns the widths' sources per line, for the flags.
 * @param reading - the reading.
 * @param inputs - the object's validated inputs (km s⁻¹ widths).
 */
export function readingInputs(reading: Reading, inputs: ReadingObjectInputs): { inputs: ObjectInputs; widths: Partial<Record<LineId, WidthSource>>; flags: ReadingFlagId[] } {
  const flags: ReadingFlagId[] = [];
  const widths: Partial<Record<LineId, WidthSource>> = {};
  const w = reading.width;
  let lines = inputs.lines;
  if (w.mode !== 'measured') {
    lines = {};
    for (const line of LINES) {
      const li = inputs.lines[line];
      const core = inputs.fwhmCoreKms?.[line];
      if (!li && !core) continue;
      const copy = { ...li };
      if (w.mode === 'core' && core) {
        copy.fwhmKms = core;
        widths[line] = 'core';
      } else if (copy.fwhmKms) {
        copy.fwhmKms = deflate(copy.fwhmKms, w.mode === 'core' ? w.fallbackDeflation : w.deflation);
        widths[line] = w.mode === 'core' ? 'core_fallback' : 'deflated';
      }
      lines[line] = copy;
    }
  }
  const out: ObjectInputs = { ...inputs, lines };
  delete (out as ReadingObjectInputs).fwhmCoreKms;
  if (reading.dust === 'none') {
    delete out.av;
    delete out.balmerDecrement;
    flags.push('dust_off_by_reading');
  }
  return { inputs: out, widths, flags };
}
