import { describe, it } from 'vitest';
import { getCalibration } from '../../../src/core/virial/calibrations.ts';
import { virialLogMass } from '../../../src/core/virial/virialCalibration.ts';
import { logLbolFromContinuum } from '../../../src/core/bolometric/logLbolFromContinuum.ts';
import { logEddingtonRatio } from '../../../src/core/eddington/eddingtonLuminosity.ts';
import { L_EDD_PER_MSUN_CONVENTIONAL } from '../../../src/core/constants/eddington.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Shen et al. 2011 (ApJS 194, 45) catalog, quasar J1205+3422, values as transcribed from the
// catalog file (published-checks.md). Inputs and outputs carry 6 decimals in dex; input rounding
// moves the results by < 5e-7, so atol 1e-6.
const LOG_L3000 = 46.368802;
const LOG_L1350 = 46.634681;
const FWHM_MGII = 4729.8126;
const FWHM_CIV = 5230.7139;
const SRC = 'Shen et al. 2011 catalog, J1205+3422 (published-checks.md)';

describe('Shen et al. 2011 quasar J1205+3422', () => {
  it('gets log M = 9.394089 from Mg II with Vestergaard & Osmer 2009', () => {
    expectClose(virialLogMass(getCalibration('vo09_mgii'), LOG_L3000, Math.log10(FWHM_MGII)), 9.394089, { atol: 1e-6, source: SRC });
  });

  it('gets log M = 9.558345 from Mg II with the Shen et al. 2011 calibration', () => {
    expectClose(virialLogMass(getCalibration('s11_mgii'), LOG_L3000, Math.log10(FWHM_MGII)), 9.558345, { atol: 1e-6, source: SRC });
  });

  it('gets log M = 9.493503 from C IV with Vestergaard & Peterson 2006', () => {
    expectClose(virialLogMass(getCalibration('vp06_civ'), LOG_L1350, Math.log10(FWHM_CIV)), 9.493503, { atol: 1e-6, source: SRC });
  });

  it('gets log L_bol = 47.215606 from λL1350 × 3.81', () => {
    expectClose(logLbolFromContinuum('bc1350', LOG_L1350), 47.215606, { atol: 1e-6, source: SRC });
  });

  it('gets log λ_Edd = −0.378268 with the C IV mass and 1.26e38', () => {
    const logM = virialLogMass(getCalibration('vp06_civ'), LOG_L1350, Math.log10(FWHM_CIV));
    const logLbol = logLbolFromContinuum('bc1350', LOG_L1350);
    expectClose(logEddingtonRatio(logLbol, logM, L_EDD_PER_MSUN_CONVENTIONAL), -0.378268, { atol: 1e-6, source: SRC });
  });
});
