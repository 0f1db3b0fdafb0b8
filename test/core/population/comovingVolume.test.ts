import { describe, expect, it } from 'vitest';
import { comovingVolumeMpc3Sr } from '../../../src/core/population/comovingVolume.ts';
import { createCosmology, getCosmology } from '../../../src/core/cosmology/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('comovingVolumeMpc3Sr', () => {
  it('is (D_M(z2)³ − D_M(z1)³)/3 per steradian in a flat universe (Hogg 1999 eq. 29)', () => {
    const c = getCosmology('planck18');
    const dm = (z: number) => c.transverseComovingDistanceMpc(z);
    expectClose(comovingVolumeMpc3Sr(c, 4, 6), (dm(6) ** 3 - dm(4) ** 3) / 3, { rtol: 1e-12, source: 'Hogg 1999 eq. 29, closed form' });
  });

  it('integrates the differential volume in a curved universe, as astropy does', () => {
    const open = createCosmology({ name: 'open', H0: 70, Om0: 0.25, Ode0: 0.6, Tcmb0: 2.725, Neff: 3.04, mNuEv: [0.02, 0.03, 0.05], reference: 'test model' });
    // astropy 5.2.1: LambdaCDM(70, 0.25, 0.6, Tcmb0=2.725, Neff=3.04, m_nu=[0.02, 0.03, 0.05] eV).comoving_volume(z) / 4π,
    // printed to 16 digits; astropy's quad at epsrel 1.49e-8: rtol 2e-8.
    expectClose(comovingVolumeMpc3Sr(open, 4, 6), 77844420969.59831, { rtol: 2e-8, source: 'computed with astropy 5.2.1, V(6) − V(4) over 4π' });
    expectClose(comovingVolumeMpc3Sr(open, 0, 2), 46473335414.6144, { rtol: 2e-8, source: 'computed with astropy 5.2.1, V(2) over 4π' });
  });

  it('is zero for an empty or reversed redshift range', () => {
    const c = getCosmology('planck18');
    expect(comovingVolumeMpc3Sr(c, 5, 5)).toBe(0);
    expect(comovingVolumeMpc3Sr(c, 6, 4)).toBe(0);
  });
});
