import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseConfig } from '../../../src/catalog/config/index.ts';

const here = path.resolve('census.config.yaml');
const parse = (text: string) => parseConfig(text, here);
const message = (text: string): string => {
  try {
    parse(text);
  } catch (e) {
    return (e as Error).message;
  }
  return 'no error';
};
const base = `survey:
  wavelength_range_angstrom: [27000, 53000]
  fields:
    - { name: A, area_arcmin2: 100, limits: { halpha: 3.0e-18 } }
`;

describe('the survey block', () => {
  it('reads fields, limits in the given flux unit, cuts and defaults', () => {
    const cfg = parse(`survey:
  wavelength_range_angstrom: [27000, 53000]
  min_fwhm_kms: 1000
  min_snr: 5
  flux_unit: "1e-18 erg s-1 cm-2"
  field_column: field
  fields:
    - { name: A, area_arcmin2: 100, limits: { halpha: 2 } }
    - { name: L, area_arcmin2: 20, source_plane_area_arcmin2: 4, limits: { hbeta: { wavelength_angstrom: [30000, 50000], flux: [1, 3] } } }
`);
    const s = cfg.survey!;
    expect(s.spec.fields[0]!.limits.halpha).toEqual({ kind: 'constant', fluxCgs: 2e-18 });
    expect(s.spec.fields[1]!.limits.hbeta).toEqual({ kind: 'table', lamObsAngstrom: [30000, 50000], fluxCgs: [1 * 1e-18, 3 * 1e-18] });
    expect(s.spec.fields[1]!.sourcePlaneAreaArcmin2).toBe(4);
    expect(s.spec.minFwhmKms).toBe(1000);
    expect(s.fieldColumn).toBe('field');
    expect(s.fit.walkers).toBe(16);
  });

  it('stops at a field with no area, naming the field', () => {
    expect(message(`survey:
  wavelength_range_angstrom: [27000, 53000]
  fields:
    - { name: A, limits: { halpha: 3.0e-18 } }
`)).toBe('census.config.yaml: survey.fields[0] (A) has no area_arcmin2: a field\'s area is needed for its volume');
  });

  it('stops at a flux unit of the wrong dimension', () => {
    expect(message(`${base}  flux_unit: "erg s-1"\n`)).toMatch(/^census\.config\.yaml: survey\.flux_unit: .*erg s-1/);
  });

  it('stops at an unknown key with a suggestion, and at several fields without a field column', () => {
    expect(message(`${base}  min_fwhm: 1000\n`)).toBe('census.config.yaml: unknown key "survey.min_fwhm" (did you mean "survey.min_fwhm_kms"?)');
    expect(message(`${base}    - { name: B, area_arcmin2: 50, limits: { halpha: 3.0e-18 } }\n`)).toBe(
      'census.config.yaml: survey.field_column is needed with more than one field: name the column that says which field each object is in',
    );
  });

  it('stops at a source-plane area larger than the field', () => {
    expect(message(`survey:
  wavelength_range_angstrom: [27000, 53000]
  fields:
    - { name: A, area_arcmin2: 10, source_plane_area_arcmin2: 20, limits: { halpha: 3.0e-18 } }
`)).toMatch(/source_plane_area_arcmin2 \(20\) is larger than the field's area \(10\)/);
  });
});
