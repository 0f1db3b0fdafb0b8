import type { LineId } from './types.ts';
import type { ContinuumBand } from '../bolometric/fixedCorrections.ts';

/**
 * The role of each measurement in an object's draws: its deviates in the DrawBank. A role
 * names what is measured, not how it is used, so the same measurement draws the same deviates
 * under every reading; a reading's width (deflated, or the core width) takes the deviates of
 * the line's width, so a reading's shift in mass is paired draw by draw.
 */
export const DRAW_ROLES = {
  mu: 'mu',
  av: 'dust_av',
  decrement: 'dust_decrement',
  luminosity: {
    halpha: 'lum_halpha',
    hbeta: 'lum_hbeta',
    mgii: 'lum_mgii',
    civ: 'lum_civ',
    l5100: 'lum_l5100',
    l3000: 'lum_l3000',
    l1350: 'lum_l1350',
  } satisfies Record<LineId | ContinuumBand, string>,
  width: { halpha: 'width_halpha', hbeta: 'width_hbeta', mgii: 'width_mgii', civ: 'width_civ' } satisfies Record<LineId, string>,
  /** The virial calibration's intrinsic scatter (deviates × the calibration's σ). */
  massScatter: 'mass_scatter',
  /** The host quantity of the local relation (log M*, or σ*). */
  host: 'host',
  /** A local black hole's place about the local relation (deviates × the relation's σ). */
  localScatter: 'local_scatter',
} as const;
