import { DEFAULT_SETTINGS } from '../../core/derive/defaultSettings.ts';
import { LINES } from '../../core/derive/types.ts';
import { BUILT_IN_READINGS } from '../../core/readings/builtInReadings.ts';
import { CANONICAL_BY_NAME } from '../normalize/canonicalColumns.ts';
import { escapeControls } from '../../shared/text/escapeControls.ts';
import type { ColumnGuesses } from './guessColumns.ts';
import { BOLOMETRIC_IDS, CALIBRATION_IDS_BY_LINE, COSMOLOGY_IDS, DUST_CURVE_IDS, HBETA_WITHOUT_CONTINUUM_IDS, LOCAL_RELATION_IDS } from './knownIds.ts';

/** Pass-through columns named in the starter config's comment; a wide catalog's others are counted. */
export const PASSTHROUGH_LISTED = 40;

/** Kinds of canonical column whose unit a starter config mentions when the file gives none. */
const UNIT_NOTE_KINDS: ReadonlySet<string> = new Set(['velocity', 'flux', 'luminosity']);

/** What a starter config is written from. */
export interface StarterInput {
  /** The tool's version, named in the file's first comment. */
  version: string;
  /** The JSON Schema's path relative to the config's folder (for editors' completion). */
  schemaPath: string;
  /** The config's own file name, for the command the comment suggests. */
  configName: string;
  /** The catalog: its path relative to the config's folder, format, columns (with their units) and rows; absent for a template. */
  catalog?: {
    path: string;
    format: string;
    rows?: number;
    columns: readonly { name: string; unit?: string }[];
    guesses: ColumnGuesses;
  };
  /** The output's path relative to the config's folder. */
  outputPath: string;
}

/** A string as a YAML scalar: double-quoted (JSON's escapes are YAML's) unless plainly safe. */
function yamlString(s: string): string {
  return /^[A-Za-z0-9_][A-Za-z0-9_.\-/]*$/.test(s) && !/^(true|false|yes|no|on|off|null|~|y|n)$/i.test(s) && !/^[0-9.+-]/.test(s) ? s : JSON.stringify(s);
}

/** A file's column name inside a YAML comment: its control characters as escapes, so a line break in a name cannot end the comment. */
const inComment = (name: string): string => escapeControls(name);

/** One column-mapping line, its comment aligned. */
function mappingLine(indent: string, body: string, note: string): string {
  return `${indent}${body.padEnd(44)} # ${note}`;
}

/**
 * A census config to start from, as YAML text: the catalog's columns mapped where init could
 * tell (each guess marked), the publication fields to fill in, and every derivation setting
 * written out at its default with the other allowed values beside it, so that the file records
 * the choices a derivation makes and shows where to change them. Loads as it is: the settings
 * it gives are exactly the defaults.
 */
export function starterConfig(input: StarterInput): string {
  const s = DEFAULT_SETTINGS;
  const out: string[] = [];
  const others = (ids: readonly string[], chosen: string): string => ids.filter((id) => id !== chosen).join(', ');
  out.push(`# yaml-language-server: $schema=${inComment(input.schemaPath)}`);
  const cat = input.catalog;
  out.push(
    cat
      ? `# A starting census config, written by dawn-census init ${input.version} from ${inComment(cat.path)} (${cat.format}, ${cat.columns.length} columns${cat.rows !== undefined ? `, ${cat.rows} rows` : ''}).`
      : `# A starting census config, written by dawn-census init ${input.version}.`,
  );
  out.push('# Check every column marked "guessed", fill in what the site says about the catalog, then run');
  out.push(`#   dawn-census derive -c ${inComment(input.configName)}`);
  out.push('# Every key and its allowed values: the README ("Your own catalog") and the JSON Schema named above.');
  out.push('');
  out.push('# What the site and the metadata say about the catalog (all optional; uncomment and fill in).');
  out.push('# title: "…"');
  out.push('# group: "…"');
  out.push('# description: >-');
  out.push('#   …');
  out.push('# licence: CC-BY-4.0');
  out.push('# citation: "…"');
  out.push('# authors: [{ name: "…", orcid: "0000-0002-1825-0097", affiliation: "…" }]');
  out.push('# version: "1.0"');
  out.push('# doi: 10.xxxx/…');
  out.push('');
  out.push('input:');
  out.push(`  path: ${yamlString(cat ? cat.path : 'catalog.csv')}${cat ? '' : '   # your catalog, relative to this file'}`);
  if (cat) out.push(`  format: ${cat.format}`);
  out.push('');
  out.push(...columnsBlock(cat));
  out.push('');
  out.push('# How the numbers are derived: the defaults, written out so that this file records them.');
  out.push(`cosmology: ${s.cosmology}`.padEnd(46) + ` # or ${others(COSMOLOGY_IDS, s.cosmology)}`);
  out.push('calibrations:');
  for (const line of LINES) {
    const alt = others(CALIBRATION_IDS_BY_LINE[line], s.calibrations[line]);
    out.push(alt ? `  ${line}: ${s.calibrations[line]}`.padEnd(46) + ` # or ${alt}` : `  ${line}: ${s.calibrations[line]}`);
  }
  out.push(`hbeta_without_continuum: ${s.hbetaWithoutContinuum}`.padEnd(46) + ` # or ${others(HBETA_WITHOUT_CONTINUUM_IDS, s.hbetaWithoutContinuum)}`);
  out.push(`line_priority: [${s.linePriority.join(', ')}]`.padEnd(46) + ' # the first line measured gives the mass');
  out.push(`bolometric: ${s.bolometric}`.padEnd(46) + ` # or ${others(BOLOMETRIC_IDS, s.bolometric)}`);
  out.push(`bc5100: ${s.bc5100}`.padEnd(46) + ' # λL5100 bolometric correction (recent Hα papers use 10.33)');
  out.push(`eddington_per_msun: ${s.eddingtonPerMsun.toExponential()}`.padEnd(46) + ' # erg/s per solar mass');
  out.push(`efficiency: ${s.efficiency}`.padEnd(46) + ' # radiative efficiency ε');
  out.push(`z_seed: ${s.zSeed}`.padEnd(46) + ' # redshift at which seeds start growing');
  out.push(`lambda_seed: ${s.lambdaSeed}`.padEnd(46) + ' # Eddington ratio of the growth');
  out.push(`duty_cycle: ${s.dutyCycle}`);
  out.push(`seeds: { light: ${s.lightSeedMsun}, heavy: ${s.heavySeedMsun} }`.padEnd(46) + ' # solar masses');
  out.push(`local_relation: ${s.localRelation}`.padEnd(46) + ` # or ${others(LOCAL_RELATION_IDS, s.localRelation)}`);
  out.push(`dust_curve: ${s.dustCurve}`.padEnd(46) + ` # or ${others(DUST_CURVE_IDS, s.dustCurve)}`);
  out.push(`intrinsic_balmer: ${s.intrinsicBalmer}`.padEnd(46) + ' # case-B Hα/Hβ');
  out.push(`draws: ${s.draws}`.padEnd(46) + ' # Monte Carlo draws per object');
  out.push(`seed: ${s.seed}`.padEnd(46) + ' # the same seed gives the same numbers');
  out.push(`# readings: { use: [${BUILT_IN_READINGS.map((r) => r.id).join(', ')}], primary: standard }   # the default: every built-in reading`);
  out.push('');
  out.push(`output: ${yamlString(input.outputPath)}`.padEnd(46) + ' # relative to this file; add formats: [ecsv, votable, fits] for copies');
  out.push('site: { base: / }'.padEnd(46) + ' # the path the site is served under, e.g. /my-survey/');
  return `${out.join('\n')}\n`;
}

/** The `columns:` block: guesses as mappings, choices and missing required columns as comments. */
function columnsBlock(cat: StarterInput['catalog']): string[] {
  const out: string[] = [];
  out.push('# Columns: canonical name -> your column, { source: <your column> }, and its unit where the file gives');
  out.push('# none or a wrong one, { unit: "1e-20 erg s-1 cm-2" }. A column under its canonical name (any case) needs no line.');
  if (!cat) {
    out.push('columns:');
    out.push('  # id: { source: name }');
    out.push('  # z: { source: z_spec }');
    out.push('  # fwhm_halpha: { source: FWHM_Ha }');
    out.push('  # flux_halpha: { source: F_Ha, unit: "1e-18 erg s-1 cm-2" }');
    return out;
  }
  const g = cat.guesses;
  const unitOf = new Map(cat.columns.map((c) => [c.name, c.unit]));
  if (g.byName.length > 0) out.push(`# Found under their own names: ${g.byName.map((b) => b.canonical).join(', ')}.`);
  out.push('columns:');
  // Widths, fluxes and luminosities are where a unit goes wrong (fluxes in 1e-18 units, widths in m/s).
  const noUnit = (canonical: string, source: string): string => {
    const col = CANONICAL_BY_NAME.get(canonical);
    if (!col || !UNIT_NOTE_KINDS.has(col.kind) || unitOf.get(source)) return '';
    return `; no unit in the file: read as ${col.unitText}`;
  };
  for (const guess of g.guesses) {
    const why = guess.by === 'ucd' ? 'guessed from its UCD: check' : 'guessed from its name: check';
    out.push(mappingLine('  ', `${guess.canonical}: { source: ${yamlString(guess.source)} }`, why + noUnit(guess.canonical, guess.source)));
  }
  for (const a of g.ambiguous) {
    out.push(mappingLine('  # ', `${a.canonical}: { source: ${yamlString(a.candidates[0]!)} }`, `choose one of ${a.candidates.map(inComment).join(', ')}`));
  }
  const found = new Set([...g.byName.map((b) => b.canonical), ...g.guesses.map((x) => x.canonical), ...g.ambiguous.map((a) => a.canonical)]);
  for (const req of ['id', 'z']) {
    if (!found.has(req)) out.push(mappingLine('  # ', `${req}: { source: … }`, `required, not found: name the column that holds it`));
  }
  for (const b of g.byName) {
    const note = noUnit(b.canonical, b.source);
    const col = CANONICAL_BY_NAME.get(b.canonical)!;
    if (note) out.push(mappingLine('  # ', `${b.canonical}: { unit: ${JSON.stringify(col.unitText)} }`, `no unit in the file: read as ${col.unitText}; set yours if not`));
  }
  if (g.passthrough.length > 0) {
    const shown = g.passthrough.slice(0, PASSTHROUGH_LISTED).map(inComment).join(', ');
    const more = g.passthrough.length - PASSTHROUGH_LISTED;
    out.push(`# Passed through unchanged: ${shown}${more > 0 ? `, and ${more} more` : ''}.`);
  }
  return out;
}
