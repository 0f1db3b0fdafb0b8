import type { ReadingObjectInputs } from '../../core/readings/readingInputs.ts';
import { LINES, type LineId, type LineInputs, type Measured, type ObjectInputs } from '../../core/derive/types.ts';

/** Stores one measured quantity into the inputs. */
type Setter = (inputs: ObjectInputs, m: Measured) => void;

const line = (o: ObjectInputs, l: LineId): LineInputs => (o.lines[l] ??= {});

/** Canonical measured column → where it goes in ObjectInputs. */
export const MEASURED_TARGETS: ReadonlyMap<string, Setter> = new Map<string, Setter>([
  ...LINES.flatMap((l): [string, Setter][] => [
    [`fwhm_${l}`, (o, m) => void (line(o, l).fwhmKms = m)],
    [`fwhm_${l}_core`, (o, m) => void (((o as ReadingObjectInputs).fwhmCoreKms ??= {})[l] = m)],
    [`flux_${l}`, (o, m) => void (line(o, l).fluxCgs = m)],
    [`lum_${l}`, (o, m) => void (line(o, l).lumErgS = m)],
  ]),
  ['lam_l_5100', (o, m) => void (o.lamL5100 = m)],
  ['lam_l_3000', (o, m) => void (o.lamL3000 = m)],
  ['lam_l_1350', (o, m) => void (o.lamL1350 = m)],
  ['mu', (o, m) => void (o.mu = m)],
  ['log_mstar', (o, m) => void (o.logMstar = m)],
  ['sigma_star', (o, m) => void (o.sigmaStarKms = m)],
  ['av', (o, m) => void (o.av = m)],
  ['balmer_decrement', (o, m) => void (o.balmerDecrement = m)],
]);

/** Positions (in a row's value array) of one measured quantity and its errors; -1 where absent. */
export interface MeasuredSlot {
  set: Setter;
  value: number;
  err: number;
  errLo: number;
  errHi: number;
}

/** Position of each line's `flux_<line>_is_limit` flag; -1 where absent. */
export type LimitSlots = Record<LineId, number>;

/**
 * Builds an object's inputs from its validated canonical values (`values[i]`, NaN where
 * empty; `flags[i]`, null where empty). `_err` sets both errors; `_err_lo`/`_err_hi` override
 * one side. A line appears only when it has a width, flux or luminosity.
 */
export function buildInputs(
  id: string,
  z: number,
  values: Float64Array,
  flags: (boolean | null)[],
  slots: readonly MeasuredSlot[],
  limits: LimitSlots,
): ObjectInputs {
  const inputs: ObjectInputs = { id, z, lines: {} };
  for (const s of slots) {
    const v = values[s.value] as number;
    if (Number.isNaN(v)) continue;
    const m: Measured = { value: v };
    if (s.err >= 0) {
      const e = values[s.err] as number;
      if (!Number.isNaN(e)) m.errLo = m.errHi = e;
    }
    if (s.errLo >= 0) {
      const e = values[s.errLo] as number;
      if (!Number.isNaN(e)) m.errLo = e;
    }
    if (s.errHi >= 0) {
      const e = values[s.errHi] as number;
      if (!Number.isNaN(e)) m.errHi = e;
    }
    s.set(inputs, m);
  }
  for (const l of LINES) {
    const pos = limits[l];
    const li = inputs.lines[l];
    if (pos < 0 || !li) continue;
    const f = flags[pos];
    if (f !== null && f !== undefined) li.fluxIsLimit = f;
  }
  return inputs;
}
