/**
 * The caveats of the trade, stated wherever derived numbers are shown. Plain sentences; the
 * methods page adds the calibration-specific ones.
 */
export const CAVEATS: readonly string[] = [
  'Single-epoch virial black-hole masses carry a systematic uncertainty of 0.3–0.5 dex, and the calibrations behind them were made on local AGN.',
  'Broad lines in compact, red sources with dense gas may not trace virial motion: widths can be broadened by scattering or outflows, or the line may arise from gas that is not bound to the black hole.',
  'Lensing magnification and dust corrections carry their own uncertainty, which enters the luminosities and so the masses.',
  'The 16–84 % intervals include the measurement errors the catalog gives and the virial calibration’s intrinsic scatter; not the scatter of the bolometric corrections (made on luminous quasars’ spectra) or of the line–continuum relation that turns a broad line into L5100, so L_bol, λ_Edd and P(λ_Edd > 1) are less certain than their intervals look. Values that rest on an upper-limit flux are bounds, not measurements.',
  'The local black-hole–host relations are extrapolated to the low host masses of these galaxies, whose stellar masses are themselves uncertain at z > 4: an offset from a relation is a comparison with a local sample, not a measurement of the relation at high redshift.',
];

/** The extra caveat of the methods page. */
export const EXTRAPOLATION_CAVEAT = 'The calibrations are local and are extrapolated here to z > 4, where nothing tests them directly.';
