import type { LocalRelationId } from '../derive/types.ts';
import type { LocalRelation } from './localRelation.ts';
import { log10 } from '../math/index.ts';

const RV15 = 'Reines & Volonteri 2015, ApJ 813, 82';
const KH13 = 'Kormendy & Ho 2013, ARA&A 51, 511';

/** The local M_BH relations, keyed by id. */
export const LOCAL_RELATIONS: Readonly<Record<LocalRelationId, LocalRelation>> = {
  rv15_agn: {
    id: 'rv15_agn', label: 'Reines & Volonteri 2015, local AGN (M_BH–M*)', x: 'logMstar',
    a: 7.45, b: 1.05, pivot: 11,
    scatterDex: 0.55, // rms scatter, from memory: confirm against RV15
    scatterProvenance: 'from memory',
    reference: `${RV15}, eq. 4 (AGN sample)`,
    massScale: 'rv15_f4.3', // their single-epoch Hα masses (their eq. 5)
    validity: { x: [9.5, 12] },
    notes: 'Total stellar mass of the host, not the bulge.',
  },
  rv15_early: {
    id: 'rv15_early', label: 'Reines & Volonteri 2015, ellipticals and classical bulges (M_BH–M*)', x: 'logMstar',
    a: 8.95, b: 1.4, pivot: 11,
    scatterDex: 0.47, // from memory: confirm against RV15
    scatterProvenance: 'from memory',
    reference: `${RV15}, eq. 4 with the elliptical/classical-bulge coefficients`,
    massScale: 'dynamical',
    validity: { x: [10, 12.5] },
    notes: 'Coefficients and scatter from memory; confirm against the paper.',
  },
  kh13_mbulge: {
    id: 'kh13_mbulge', label: 'Kormendy & Ho 2013, M_BH–M_bulge', x: 'logMbulge',
    // Eq. 10 is printed as M/1e9 = 0.49 (M_bulge/1e11)^1.16; the zero point is its log.
    // Slope: 1.16 here; some transcriptions give 1.17 (published-checks.md): confirm against the paper.
    a: 9 + log10(0.49), b: 1.16, pivot: 11,
    scatterDex: 0.29, // KH13 quote 0.28–0.29 dex intrinsic scatter (published-checks.md)
    scatterProvenance: 'published',
    reference: `${KH13}, eq. 10`,
    massScale: 'dynamical',
    validity: { x: [9.5, 12.5] },
    notes: 'Bulge mass of classical bulges and ellipticals. Passing the total M* treats it as the bulge mass (an upper limit on M_bulge).',
  },
  kh13_sigma: {
    id: 'kh13_sigma', label: 'Kormendy & Ho 2013, M_BH–σ*', x: 'logSigma',
    // Eq. 7 is printed as M/1e9 = 0.309 (σ/200 km/s)^4.38.
    a: 9 + log10(0.309), b: 4.38, pivot: log10(200),
    scatterDex: 0.29,
    scatterProvenance: 'published',
    reference: `${KH13}, eq. 7`,
    massScale: 'dynamical',
    validity: { x: [log10(70), log10(400)] },
  },
};

/**
 * A local relation by id; throws a one-line error naming the unknown id.
 * @param id - 'rv15_agn' | 'rv15_early' | 'kh13_mbulge' | 'kh13_sigma'.
 */
export function getLocalRelation(id: LocalRelationId | string): LocalRelation {
  const rel = (LOCAL_RELATIONS as Record<string, LocalRelation | undefined>)[id];
  if (!rel) throw new Error(`unknown local relation '${id}' (known: ${Object.keys(LOCAL_RELATIONS).join(', ')})`);
  return rel;
}
