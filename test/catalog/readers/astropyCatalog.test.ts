import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { defaultConfig } from '../../../src/catalog/config/defaultConfig.ts';
import { normalizeChunk, type NormalizedRow } from '../../../src/catalog/normalize/normalizeChunk.ts';
import { planColumns } from '../../../src/catalog/normalize/planColumns.ts';
import { openTable } from '../../../src/catalog/readers/openTable.ts';

// One invented catalog written by astropy 5.2.1 (Debian python3-astropy; see
// test/fixtures/readers/astropy-version.txt) in every format it writes that we read, by
// test/fixtures/readers/make_astropy_fixtures.py (the Parquet file with pyarrow 25.0.1, which
// stores masked cells as a fill value plus a '<name>.mask' column). Values below are the ones that script writes
// ("computed with astropy 5.2.1" only in the sense that astropy serialised them).
const fixture = (name: string) => fileURLToPath(new URL(`../../fixtures/readers/${name}`, import.meta.url));

const FILES = [
  'astropy-catalog.csv', 'astropy-catalog.csv.gz', 'astropy-catalog.ecsv', 'astropy-catalog.fits', 'astropy-catalog.fits.gz',
  'astropy-catalog-tabledata.vot', 'astropy-catalog-tabledata.vot.gz', 'astropy-catalog-binary.vot', 'astropy-catalog-binary2.vot',
  'astropy-catalog.parquet',
];

const N = 12;
const IDS = ['007', '0042', '1e3', '3.0', 'CW-0001', '5', 'CW 7', '#9', '0', 'CW-0010', '-1', 'x'];
/** Values as written, with null where the script wrote NaN or a masked cell (both mean missing). */
const series = (f: (i: number) => number, missing: number[]) => Array.from({ length: N }, (_, i) => (missing.includes(i) ? null : f(i)));
const EXPECTED = {
  id: IDS,
  z: series((i) => 4.5 + 0.5 * i, []),
  fwhm_halpha: series((i) => 2000 + 100 * i, [3, 5]),
  flux_halpha: series((i) => (150 + 10 * i) * 1e-20, [7, 9]),
  flux_halpha_err: series((i) => (15 + i) * 1e-20, [2, 7, 9]),
  lam_l_5100: series((i) => (3 + 0.25 * i) * 1e42, [1, 4]),
  log_mstar: series((i) => 9 + 0.125 * i, [6, 8]),
  av: series((i) => 0.5 + 0.0625 * i, [10]),
};

/** Plain CSV carries no units: a group states them in the config, as the demo does. */
const CSV_UNITS = {
  flux_halpha: { unit: '1e-20 erg s-1 cm-2' },
  flux_halpha_err: { unit: '1e-20 erg s-1 cm-2' },
  lam_l_5100: { unit: '1e42 erg s-1' },
};

async function normalized(name: string): Promise<{ rows: NormalizedRow[]; units: Record<string, string | undefined> }> {
  const src = await openTable(fixture(name));
  const config = defaultConfig();
  if (src.format === 'csv') config.columns = CSV_UNITS;
  const plan = planColumns(src, config);
  const rows: NormalizedRow[] = [];
  for await (const chunk of src.chunks(5)) rows.push(...normalizeChunk(chunk, plan));
  await src.close();
  return { rows, units: Object.fromEntries(plan.canonical.map((c) => [c.name, c.unitIn])) };
}

describe('one catalog written by astropy in every format', () => {
  it.each(FILES)('%s: every row reads with ids as written, NaN and masked cells missing, and units converted', async (name) => {
    const { rows } = await normalized(name);
    expect(rows.map((r) => r.problems.map((p) => p.message))).toEqual(Array.from({ length: N }, () => []));
    for (const [col, want] of Object.entries(EXPECTED)) {
      const got = rows.map((r) => r.canonical[col]);
      // Scaled units multiply by 1e-20 or 1e42 once: allow 1 ulp-level relative difference.
      got.forEach((g, i) => {
        const w = want[i];
        if (typeof w === 'number' && typeof g === 'number') expect(Math.abs(g - w)).toBeLessThanOrEqual(Math.abs(w) * 4e-16);
        else expect([col, i, g]).toEqual([col, i, w]);
      });
    }
  });

  it('gives identical inputs to the derivation from every format', async () => {
    const reference = (await normalized(FILES[0]!)).rows.map((r) => r.inputs);
    for (const name of FILES.slice(1)) expect([name, (await normalized(name)).rows.map((r) => r.inputs)]).toEqual([name, reference]);
  });

  it.each([
    ['astropy-catalog-binary2.vot', { flux_halpha: '10-20erg.s-1.cm-2', lam_l_5100: '10+42erg.s-1', log_mstar: '[solMass]', fwhm_halpha: 'km.s-1' }],
    ['astropy-catalog.fits', { flux_halpha: '10**-20 cm-2 erg s-1', lam_l_5100: '10**42 erg s-1', log_mstar: 'dex(solMass)', fwhm_halpha: 'km s-1' }],
    ['astropy-catalog.ecsv', { flux_halpha: '1e-20 erg / (cm2 s)', lam_l_5100: '1e+42 erg / s', log_mstar: 'dex(solMass)', fwhm_halpha: 'km / s' }],
  ])('%s: keeps the unit spelling astropy wrote for that format', async (name, want) => {
    const { units } = await normalized(name);
    for (const [col, unit] of Object.entries(want)) expect([col, units[col]]).toEqual([col, unit]);
  });

  it.each(FILES)('%s: passes the field and nspec columns through with their text and 64-bit digits', async (name) => {
    const { rows } = await normalized(name);
    const field = rows.map((r) => r.passthrough[0]);
    const nspec = rows.map((r) => r.passthrough[1]);
    expect(field[3]).toBe('0042');
    expect(field[11]).toBeNull();
    // astropy itself strips blanks when it writes CSV/ECSV, and FITS drops trailing blanks.
    const padded = name.endsWith('.vot') || name.endsWith('.vot.gz') || name.endsWith('.parquet') ? ' padded ' : name.includes('.fits') ? ' padded' : 'padded';
    expect(field[2]).toBe(padded);
    expect(nspec).toEqual(['1', '2', '3', '4', '5', '6', '7', '8', '9', '10', null, '9007199254740993']);
  });
});

describe("astropy's Parquet encoding of masked columns", () => {
  it('reads each masked column as one column: the .mask columns are not columns of the table', async () => {
    const src = await openTable(fixture('astropy-catalog.parquet'));
    await src.close();
    expect(src.columns.map((c) => c.name)).toEqual(['id', 'z', 'fwhm_halpha', 'flux_halpha', 'flux_halpha_err', 'lam_l_5100', 'log_mstar', 'av', 'field', 'nspec']);
    expect(src.meta).not.toHaveProperty('__serialized_columns__');
    expect(src.meta.survey).toBe('Cinderwake (invented)');
    expect(src.columns.find((c) => c.name === 'fwhm_halpha')?.unit).toBe('km / s');
  });
});
