import type { ColumnDoc } from '../metadata/columnDoc.ts';
import type { TableDoc } from '../publish/tableDoc.ts';

/**
 * The three tables `dawn-census population` writes, documented as the catalog's columns are: a
 * unit in VOUnits (dex units as astropy writes them) for every number, a UCD1+ 1.5 word list
 * and a description, so that astropy and VO tools show what each column holds.
 */
const OBJECT_COLUMNS: readonly ColumnDoc[] = [
  { name: 'id', kind: 'string', group: 'key', ucd: 'meta.id;meta.main', description: 'Object identifier, as in the catalog' },
  { name: 'survey_field', kind: 'string', group: 'derived', ucd: 'meta.id;obs.field', description: "Survey field the object lies in (the population config's fields); empty when none claims it" },
  { name: 'detection_line', kind: 'string', group: 'derived', ucd: 'meta.code;spect.line', description: "Broad line the object's mass comes from; its flux limit decides out to which redshift the object would be detected" },
  { name: 'vmax_cmpc3', kind: 'float', group: 'derived', unit: 'Mpc**3', ucd: 'phys.volume;stat.max', description: 'Comoving volume within which the object would still be detected, over the survey area (V_max; Schmidt 1968)', reference: 'Schmidt 1968, ApJ 151, 393' },
  { name: 'v_over_vmax', kind: 'float', group: 'derived', unit: '', ucd: 'phys.volume;arith.ratio', description: "Comoving volume out to the object's redshift over its V_max; uniform on [0, 1] for a complete sample (Schmidt 1968)", reference: 'Schmidt 1968, ApJ 151, 393' },
  { name: 'below_survey_limit', kind: 'bool', group: 'derived', ucd: 'meta.code.qual', description: "True where the object falls below its field's line-flux limit, S/N cut or wavelength window at its own redshift, or its line flux is an upper limit" },
  { name: 'no_vmax_reason', kind: 'string', group: 'derived', ucd: 'meta.note', description: 'Why the object has no V_max (an invalid row, no redshift or field, no mass line, no line flux, an upper limit, below the limit); empty when it has one' },
];

const DENSITY_COLUMNS: readonly ColumnDoc[] = [
  { name: 'quantity', kind: 'string', group: 'key', ucd: 'meta.code', description: 'Quantity the function bins: log_mbh (black-hole mass function) or log_lbol (bolometric luminosity function)' },
  { name: 'z_lo', kind: 'float', group: 'key', unit: '', ucd: 'src.redshift;stat.min', description: 'Lower end of the redshift range' },
  { name: 'z_hi', kind: 'float', group: 'key', unit: '', ucd: 'src.redshift;stat.max', description: 'Upper end of the redshift range' },
  { name: 'bin_lo', kind: 'float', group: 'key', unit: 'dex', ucd: 'stat.value;stat.min', description: 'Lower edge of the bin in the binned quantity: log10 of solMass for log_mbh, of erg s-1 for log_lbol' },
  { name: 'bin_hi', kind: 'float', group: 'key', unit: 'dex', ucd: 'stat.value;stat.max', description: 'Upper edge of the bin in the binned quantity: log10 of solMass for log_mbh, of erg s-1 for log_lbol' },
  { name: 'count', kind: 'int', group: 'derived', unit: '', ucd: 'meta.number', description: 'Objects in the bin' },
  { name: 'phi', kind: 'float', group: 'derived', unit: 'Mpc**-3', ucd: 'src.density', description: 'Space density per comoving Mpc3 per dex of the binned quantity: the sum of 1/V_max over the bin divided by its width (Schmidt 1968)', reference: 'Schmidt 1968, ApJ 151, 393' },
  { name: 'phi_poisson_lo', kind: 'float', group: 'derived', unit: 'Mpc**-3', ucd: 'src.density;stat.min', description: 'Lower end of the Poisson 1σ interval on phi (Gehrels 1986), per comoving Mpc3 per dex', reference: 'Gehrels 1986, ApJ 303, 336' },
  { name: 'phi_poisson_hi', kind: 'float', group: 'derived', unit: 'Mpc**-3', ucd: 'src.density;stat.max', description: 'Upper end of the Poisson 1σ interval on phi (Gehrels 1986; for an empty bin, the 1σ upper limit), per comoving Mpc3 per dex', reference: 'Gehrels 1986, ApJ 303, 336' },
  { name: 'phi_p16', kind: 'float', group: 'derived', unit: 'Mpc**-3', ucd: 'src.density;stat.percentile', description: "16th percentile of phi over the Monte Carlo draws of the objects' values, per comoving Mpc3 per dex" },
  { name: 'phi_p84', kind: 'float', group: 'derived', unit: 'Mpc**-3', ucd: 'src.density;stat.percentile', description: "84th percentile of phi over the Monte Carlo draws of the objects' values, per comoving Mpc3 per dex" },
];

const POSTERIOR_COLUMNS: readonly ColumnDoc[] = [
  { name: 'fit', kind: 'string', group: 'key', ucd: 'meta.code', description: 'Which fit the sample belongs to: selection_aware (the survey selection modelled) or naive (the detected objects alone)' },
  { name: 'alpha', kind: 'float', group: 'derived', unit: 'dex(solMass)', ucd: 'stat.fit.param;phys.mass', description: 'Posterior sample of alpha in log M_BH = alpha + beta (log M* − 10) with intrinsic scatter sigma: log10 of the black-hole mass at M* = 1e10 solMass' },
  { name: 'beta', kind: 'float', group: 'derived', unit: '', ucd: 'stat.fit.param', description: 'Posterior sample of beta, the slope of log M_BH against log M*' },
  { name: 'sigma', kind: 'float', group: 'derived', unit: 'dex', ucd: 'stat.stdev;stat.fit.param', description: 'Posterior sample of sigma, the intrinsic scatter of log M_BH about the relation' },
];

/** The population tables' descriptions, by file. */
export const POPULATION_TABLES = {
  objects: { name: 'dawn_census_population_objects', description: "Each object's detection volume (V_max) in the survey the population config describes", columns: OBJECT_COLUMNS },
  densities: { name: 'dawn_census_population_densities', description: 'Black-hole mass and bolometric luminosity functions by 1/V_max, one row per bin', columns: DENSITY_COLUMNS },
  posterior: { name: 'dawn_census_population_posterior', description: 'Posterior samples of the black-hole–host-mass relation, with and without the survey selection modelled', columns: POSTERIOR_COLUMNS },
} as const satisfies Record<string, Omit<TableDoc, 'meta'>>;
