/**
 * The black-hole mass scale a virial calibration or a local relation rests on. Masses on
 * different scales differ systematically (the virial factor f, or virial versus dynamical
 * masses), so an offset from a local relation built on another scale mixes the two.
 * - 'rv15_f4.3': single-epoch Hα masses of Reines & Volonteri 2015 (f = 4.3, ε = 1.075).
 * - 'gh05_f0.75': Greene & Ho 2005 Hα masses (spherical BLR, f = 0.75 with FWHM; from memory).
 * - 'vp06_f5.5': reverberation masses with ⟨f⟩ = 5.5 (Onken et al. 2004), the scale of
 *   Vestergaard & Peterson 2006 and of the calibrations tied to it (Vestergaard & Osmer 2009,
 *   Shen et al. 2011).
 * - 'dynamical': stellar- or gas-dynamical masses of inactive galaxies (Kormendy & Ho 2013,
 *   Reines & Volonteri 2015's ellipticals and classical bulges).
 */
export type MassScale = 'rv15_f4.3' | 'gh05_f0.75' | 'vp06_f5.5' | 'dynamical';
