import { describe, expect, it } from 'vitest';
import { fluxLimitAt } from '../../../src/core/population/fluxLimitAt.ts';
import type { FluxLimit } from '../../../src/core/population/surveySpec.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// An invented sensitivity table (no survey): limits in erg s⁻¹ cm⁻² at observed wavelengths in Å.
const table: FluxLimit = { kind: 'table', lamObsAngstrom: [10000, 20000, 30000, 40000, 50000], fluxCgs: [4e-18, 2e-18, 1e-18, 3e-18, 5e-18] };

describe('fluxLimitAt', () => {
  it('gives a constant limit at every wavelength', () => {
    const c: FluxLimit = { kind: 'constant', fluxCgs: 7.5e-19 };
    expect(fluxLimitAt(c, 1)).toBe(7.5e-19);
    expect(fluxLimitAt(c, 1e9)).toBe(7.5e-19);
  });

  it('gives the table value at each node, the first and last included', () => {
    table.lamObsAngstrom.forEach((x, k) => expect(fluxLimitAt(table, x)).toBe(table.fluxCgs[k]));
  });

  it('interpolates linearly between the two nodes around the wavelength, in every interval', () => {
    // Linear interpolation, closed form: y0 + (x − x0)/(x1 − x0) · (y1 − y0).
    expectClose(fluxLimitAt(table, 12500), 4e-18 + 0.25 * (2e-18 - 4e-18), { rtol: 1e-14, source: 'linear interpolation, closed form' });
    expectClose(fluxLimitAt(table, 27500), 2e-18 + 0.75 * (1e-18 - 2e-18), { rtol: 1e-14, source: 'linear interpolation, closed form' });
    expectClose(fluxLimitAt(table, 31000), 1e-18 + 0.1 * (3e-18 - 1e-18), { rtol: 1e-14, source: 'linear interpolation, closed form' });
    expectClose(fluxLimitAt(table, 49999), 3e-18 + 0.9999 * (5e-18 - 3e-18), { rtol: 1e-13, source: 'linear interpolation, closed form' });
  });

  it('is infinite (nothing detectable) outside the table, just below its first and just above its last wavelength', () => {
    expect(fluxLimitAt(table, 9999.999)).toBe(Infinity);
    expect(fluxLimitAt(table, 50000.001)).toBe(Infinity);
    expect(fluxLimitAt(table, NaN)).toBe(Infinity);
  });

  it('takes the value of a table with one node at that node', () => {
    expect(fluxLimitAt({ kind: 'table', lamObsAngstrom: [20000], fluxCgs: [2e-18] }, 20000)).toBe(2e-18);
    expect(fluxLimitAt({ kind: 'table', lamObsAngstrom: [20000], fluxCgs: [2e-18] }, 20001)).toBe(Infinity);
  });
});
