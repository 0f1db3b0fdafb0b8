import { describe, expect, it } from 'vitest';
import { lineRedshiftWindow } from '../../../src/core/population/lineRedshiftWindow.ts';
import { expectClose } from '../../helpers/expectClose.ts';

/** Hα and Hβ vacuum wavelengths, Å (Vanden Berk et al. 2001, as in src/core/dust/lineWavelengths.ts). */
const HALPHA = 6564.61;
const HBETA = 4862.68;

describe('lineRedshiftWindow', () => {
  it('gives the redshifts at which the line falls in the observed range: λ_obs = λ_rest (1 + z)', () => {
    const w = lineRedshiftWindow('halpha', [9000, 53000])!;
    expectClose(w.zMin, 9000 / HALPHA - 1, { rtol: 1e-14, source: 'λ_obs = λ_rest (1 + z), closed form' });
    expectClose(w.zMax, 53000 / HALPHA - 1, { rtol: 1e-14, source: 'λ_obs = λ_rest (1 + z), closed form' });
  });

  it('starts at z = 0 when the range reaches below the rest wavelength', () => {
    const w = lineRedshiftWindow('hbeta', [3000, 9000])!;
    expect(w.zMin).toBe(0);
    expectClose(w.zMax, 9000 / HBETA - 1, { rtol: 1e-14, source: 'λ_obs = λ_rest (1 + z), closed form' });
  });

  it('is empty when the range lies wholly blueward of the line, or has no width', () => {
    expect(lineRedshiftWindow('halpha', [3000, 6000])).toBeNull();
    expect(lineRedshiftWindow('halpha', [13129.22, 13129.22])).toBeNull();
  });
});
