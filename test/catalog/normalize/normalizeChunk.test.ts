import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { CensusConfig } from '../../../src/catalog/config/CensusConfig.ts';
import { defaultConfig } from '../../../src/catalog/config/defaultConfig.ts';
import { normalizeChunk, type NormalizedRow } from '../../../src/catalog/normalize/normalizeChunk.ts';
import { planColumns } from '../../../src/catalog/normalize/planColumns.ts';
import type { Cell, ColumnInfo } from '../../../src/catalog/readers/types.ts';
import { allRows, memorySource } from './memorySource.ts';

type Cols = [ColumnInfo | string, Cell[]][];
const cfgWith = (columns: CensusConfig['columns']): CensusConfig => ({
  ...defaultConfig(),
  columns,
  configPath: join(process.cwd(), 'census.config.yaml'),
});

async function normalize(cols: Cols, cfg: CensusConfig = defaultConfig(), chunkRows?: number): Promise<NormalizedRow[]> {
  const src = memorySource(cols);
  const plan = planColumns(src, cfg);
  return (await allRows(src, chunkRows)).flatMap((ch) => normalizeChunk(ch, plan));
}

/** The problem messages of a one-column catalog (plus id and z) with the given cell. */
async function messagesFor(column: string, cell: Cell, cfg?: CensusConfig, id: Cell = 'DF-0231'): Promise<string[]> {
  const rows = await normalize([['id', [id]], ['z', [column === 'z' ? cell : 6.5]], ...(column === 'z' ? [] : ([[column, [cell]]] as Cols))], cfg);
  return rows[0]!.problems.map((p) => p.message);
}

describe('normalizeChunk checks each value and reports it in one line', () => {
  it.each<[string, Cell, string]>([
    ['fwhm_halpha', -1200, 'row 1 (id DF-0231): fwhm_halpha = -1200 km/s: must be positive'],
    ['fwhm_halpha', 0, 'row 1 (id DF-0231): fwhm_halpha = 0 km/s: must be positive'],
    ['fwhm_hbeta', 45000, 'row 1 (id DF-0231): fwhm_hbeta = 45000 km/s: must be at most 30000 km/s'],
    ['fwhm_mgii', '-1.2e3', 'row 1 (id DF-0231): fwhm_mgii = -1.2e3 km/s: must be positive'],
    ['flux_halpha', Infinity, 'row 1 (id DF-0231): flux_halpha = Infinity: must be a finite number'],
    ['flux_halpha', '-inf', 'row 1 (id DF-0231): flux_halpha = -inf: must be a finite number'],
    ['flux_halpha', -3e-18, 'row 1 (id DF-0231): flux_halpha = -3e-18 erg s-1 cm-2: must be positive'],
    ['flux_hbeta', 'bright', 'row 1 (id DF-0231): flux_hbeta = bright: not a number'],
    ['flux_hbeta', '0x1F', 'row 1 (id DF-0231): flux_hbeta = 0x1F: not a number'],
    ['lum_mgii', 0, 'row 1 (id DF-0231): lum_mgii = 0 erg/s: must be positive'],
    ['lam_l_5100', -1e44, 'row 1 (id DF-0231): lam_l_5100 = -1e+44 erg/s: must be positive'],
    ['fwhm_halpha_err', -50, 'row 1 (id DF-0231): fwhm_halpha_err = -50 km/s: must not be negative'],
    ['flux_halpha_err_lo', -1e-19, 'row 1 (id DF-0231): flux_halpha_err_lo = -1e-19 erg s-1 cm-2: must not be negative'],
    ['lum_civ_err_hi', 'Infinity', 'row 1 (id DF-0231): lum_civ_err_hi = Infinity: must be a finite number'],
    ['z', 0, 'row 1 (id DF-0231): z = 0: must be between 0 and 30'],
    ['z', -0.5, 'row 1 (id DF-0231): z = -0.5: must be between 0 and 30'],
    ['z', 31, 'row 1 (id DF-0231): z = 31: must be between 0 and 30'],
    ['z', 'seven', 'row 1 (id DF-0231): z = seven: not a number'],
    ['z', null, 'row 1 (id DF-0231): z is empty'],
    ['z', '  ', 'row 1 (id DF-0231): z is empty'],
    ['z', NaN, 'row 1 (id DF-0231): z is empty'],
    ['z', 'nan', 'row 1 (id DF-0231): z is empty'],
    ['mu', 0, 'row 1 (id DF-0231): mu = 0: must be positive'],
    ['mu', -2, 'row 1 (id DF-0231): mu = -2: must be positive'],
    ['log_mstar', 4.5, 'row 1 (id DF-0231): log_mstar = 4.5 log10 Msun: must be between 5 and 13'],
    ['log_mstar', 13.2, 'row 1 (id DF-0231): log_mstar = 13.2 log10 Msun: must be between 5 and 13'],
    ['sigma_star', -80, 'row 1 (id DF-0231): sigma_star = -80 km/s: must be positive'],
    ['av', -0.1, 'row 1 (id DF-0231): av = -0.1 mag: must be between 0 and 10'],
    ['av', 12, 'row 1 (id DF-0231): av = 12 mag: must be between 0 and 10'],
    ['balmer_decrement', 0, 'row 1 (id DF-0231): balmer_decrement = 0: must be positive'],
    ['flux_halpha_is_limit', 'maybe', 'row 1 (id DF-0231): flux_halpha_is_limit = maybe: must be true or false'],
    ['flux_halpha_is_limit', 2, 'row 1 (id DF-0231): flux_halpha_is_limit = 2: must be true or false'],
  ])('%s = %j', async (column, cell, message) => {
    expect(await messagesFor(column, cell)).toEqual([message]);
  });

  it.each<Cell>([30, 1e-3, '6.1', 11])('accepts z = %j', async (z) => {
    expect(await messagesFor('z', z)).toEqual([]);
  });

  it.each<Cell>([0, 10, 1.2])('accepts av = %j', async (av) => {
    expect(await messagesFor('av', av)).toEqual([]);
  });

  it.each<Cell>([0.5, 1, 25])('accepts a magnification mu = %j (below 1 means demagnified)', async (mu) => {
    expect(await messagesFor('mu', mu)).toEqual([]);
  });

  it.each<Cell>([5, 13, 9.3])('accepts log_mstar = %j', async (m) => {
    expect(await messagesFor('log_mstar', m)).toEqual([]);
  });

  it('accepts a width of exactly 30000 km/s and a zero error', async () => {
    expect(await messagesFor('fwhm_halpha', 30000)).toEqual([]);
    expect(await messagesFor('fwhm_halpha_err', 0)).toEqual([]);
  });

  it('says "no id" for an empty id, and still checks the rest of the row', async () => {
    const rows = await normalize([
      ['id', ['  ', null]],
      ['z', [-1, 5]],
    ]);
    expect(rows.map((r) => r.problems.map((p) => p.message))).toEqual([
      ['row 1 (no id): id is empty', 'row 1 (no id): z = -1: must be between 0 and 30'],
      ['row 2 (no id): id is empty'],
    ]);
    expect(rows.every((r) => r.inputs === null)).toBe(true);
  });

  it('prints the value and unit as in the file, not converted', async () => {
    const cfg = cfgWith({ fwhm_halpha: { unit: 'm/s' }, flux_halpha: { source: 'F_HA', unit: '1e-18 erg s-1 cm-2' } });
    const rows = await normalize([['id', ['A']], ['z', [5]], ['fwhm_halpha', [-2e6]], ['F_HA', [' -12.5 ']]], cfg);
    expect(rows[0]!.problems.map((p) => p.message)).toEqual([
      'row 1 (id A): fwhm_halpha = -2000000 m/s: must be positive',
      'row 1 (id A): flux_halpha (column F_HA) = -12.5 1e-18 erg s-1 cm-2: must be positive',
    ]);
  });

  it('checks the FWHM limit in km/s whatever the unit of the file', async () => {
    const cfg = cfgWith({ fwhm_halpha: { unit: 'm/s' } });
    expect((await normalize([['id', ['A']], ['z', [5]], ['fwhm_halpha', [3.1e7]]], cfg))[0]!.problems.map((p) => p.message)).toEqual([
      'row 1 (id A): fwhm_halpha = 31000000 m/s: must be at most 30000 km/s',
    ]);
  });

  it('fills the problem fields: row, id, canonical column, value as given, reason', async () => {
    const rows = await normalize([['id', ['A', 'B']], ['z', [5, 6]], ['FWHM_HALPHA', [1000, '-7']]]);
    expect(rows[1]!.problems).toEqual([
      { row: 2, id: 'B', column: 'fwhm_halpha', value: '-7', reason: 'must be positive', message: 'row 2 (id B): fwhm_halpha = -7 km/s: must be positive' },
    ]);
    // A column whose name differs from the canonical one by more than case is named in the message.
    const mapped = await normalize([['id', ['A']], ['z', [5]], ['W_HA', [-7]]], cfgWith({ fwhm_halpha: { source: 'W_HA' } }));
    expect(mapped[0]!.problems[0]?.message).toBe('row 1 (id A): fwhm_halpha (column W_HA) = -7 km/s: must be positive');
  });

  it('cuts a very long value or id in the message', async () => {
    const long = 'x'.repeat(100_000);
    const rows = await normalize([['id', [long]], ['z', [long]]]);
    const [p] = rows[0]!.problems;
    expect(p?.message).toBe(`row 1 (id ${'x'.repeat(37)}...): z = ${'x'.repeat(37)}...: not a number`);
    expect(rows[0]!.id).toBe(long);
  });

  it('flags a repeated id, also across chunks, naming the first row', async () => {
    const rows = await normalize([['id', ['A', 'B', 'A', 'C', 'B']], ['z', [5, 5, 5, 5, 5]]], defaultConfig(), 2);
    expect(rows.map((r) => r.problems.map((p) => p.message))).toEqual([
      [],
      [],
      ['row 3 (id A): id = A: duplicate of row 1'],
      [],
      ['row 5 (id B): id = B: duplicate of row 2'],
    ]);
    expect(rows.map((r) => r.inputs === null)).toEqual([false, false, true, false, true]);
  });

  it('numbers rows from 1 across chunks', async () => {
    const rows = await normalize([['id', ['a', 'b', 'c', 'd', 'e']], ['z', [1, 2, 3, 4, 'x']]], defaultConfig(), 2);
    expect(rows.map((r) => r.row)).toEqual([1, 2, 3, 4, 5]);
    expect(rows[4]!.problems[0]?.message).toBe('row 5 (id e): z = x: not a number');
  });

  it('reports every problem of a row, in column order', async () => {
    const msgs = await normalize([['id', ['Q']], ['z', [40]], ['fwhm_halpha', [-1]], ['fwhm_halpha_err', [-1]], ['av', [20]]]);
    expect(msgs[0]!.problems.map((p) => p.column)).toEqual(['z', 'fwhm_halpha', 'fwhm_halpha_err', 'av']);
  });
});

describe('normalizeChunk builds the inputs of a valid row', () => {
  it('converts a 1e-18 erg s-1 cm-2 flux and its error to erg s-1 cm-2', async () => {
    const cfg = cfgWith({ flux_halpha: { source: 'F_HA', unit: '1e-18 erg s-1 cm-2' }, flux_halpha_err: { source: 'F_HA_ERR' } });
    const rows = await normalize([['id', ['A']], ['z', [5.2]], ['F_HA', [250]], ['F_HA_ERR', [20]]], cfg);
    const flux = rows[0]!.inputs!.lines.halpha!.fluxCgs!;
    // 250 × 1e-18 and 20 × 1e-18, by definition of the unit.
    expect(flux.value).toBeCloseTo(2.5e-16, 28);
    expect(flux.errLo).toBeCloseTo(2e-17, 28);
    expect(flux.errHi).toBeCloseTo(2e-17, 28);
    expect(rows[0]!.canonical.flux_halpha).toBeCloseTo(2.5e-16, 28);
  });

  it('builds every field of ObjectInputs from canonical columns, with symmetric and one-sided errors', async () => {
    const rows = await normalize([
      ['id', [42]],
      ['z', ['7.1']],
      ['fwhm_halpha', [2100]],
      ['fwhm_halpha_err', [150]],
      ['fwhm_halpha_err_hi', [300]],
      ['lum_halpha', [4.6e42]],
      ['flux_halpha_is_limit', ['no']],
      ['fwhm_hbeta', [2500]],
      ['flux_hbeta', [1e-17]],
      ['flux_hbeta_err_lo', [2e-18]],
      ['flux_hbeta_is_limit', ['T']],
      ['fwhm_mgii', [3000]],
      ['lam_l_5100', [1e44]],
      ['lam_l_3000', [2e44]],
      ['lam_l_1350', [3e44]],
      ['lam_l_1350_err', [1e43]],
      ['mu', [2.5]],
      ['log_mstar', [9.1]],
      ['log_mstar_err', [0.3]],
      ['sigma_star', [120]],
      ['av', [0.4]],
      ['balmer_decrement', [4.1]],
      ['balmer_decrement_err', [0.5]],
    ]);
    expect(rows[0]!.problems).toEqual([]);
    expect(rows[0]!.inputs).toEqual({
      id: '42',
      z: 7.1,
      lines: {
        halpha: { fwhmKms: { value: 2100, errLo: 150, errHi: 300 }, lumErgS: { value: 4.6e42 }, fluxIsLimit: false },
        hbeta: { fwhmKms: { value: 2500 }, fluxCgs: { value: 1e-17, errLo: 2e-18 }, fluxIsLimit: true },
        mgii: { fwhmKms: { value: 3000 } },
      },
      lamL5100: { value: 1e44 },
      lamL3000: { value: 2e44 },
      lamL1350: { value: 3e44, errLo: 1e43, errHi: 1e43 },
      mu: { value: 2.5 },
      logMstar: { value: 9.1, errLo: 0.3, errHi: 0.3 },
      sigmaStarKms: { value: 120 },
      av: { value: 0.4 },
      balmerDecrement: { value: 4.1, errLo: 0.5, errHi: 0.5 },
    });
  });

  it('leaves out empty optional values and lines with no data, without a problem', async () => {
    const rows = await normalize([
      ['id', ['A', 'B']],
      ['z', [5, 6]],
      ['fwhm_halpha', [null, 1800]],
      ['flux_halpha', ['', null]],
      ['fwhm_civ', [null, null]],
      ['mu', [null, '']],
    ]);
    expect(rows.map((r) => r.problems)).toEqual([[], []]);
    expect(rows[0]!.inputs).toEqual({ id: 'A', z: 5, lines: {} });
    // A width without a flux or luminosity is no error: that line just gives no mass.
    expect(rows[1]!.inputs).toEqual({ id: 'B', z: 6, lines: { halpha: { fwhmKms: { value: 1800 } } } });
    expect(rows[0]!.canonical).toEqual({ id: 'A', z: 5, fwhm_halpha: null, flux_halpha: null, fwhm_civ: null, mu: null });
  });

  it.each<[Cell, boolean | null]>([
    [true, true], [false, false], [1, true], [0, false], ['1', true], ['0', false], ['yes', true], ['No', false],
    ['t', true], ['F', false], ['TRUE', true], [' false ', false], ['', null], [null, null],
  ])('reads the limit flag %j as %j', async (cell, want) => {
    const rows = await normalize([['id', ['A']], ['z', [5]], ['flux_mgii', [1e-17]], ['flux_mgii_is_limit', [cell]]]);
    expect(rows[0]!.problems).toEqual([]);
    expect(rows[0]!.canonical.flux_mgii_is_limit).toBe(want);
    expect(rows[0]!.inputs!.lines.mgii?.fluxIsLimit).toBe(want ?? undefined);
  });

  it('keeps a row with a problem, with null inputs, null for the bad value and its other values', async () => {
    const rows = await normalize([['id', ['A']], ['z', [5]], ['fwhm_halpha', [-3]], ['lum_halpha', [1e42]], ['note', ['hello']]]);
    expect(rows[0]!.inputs).toBeNull();
    expect(rows[0]!.canonical).toEqual({ id: 'A', z: 5, fwhm_halpha: null, lum_halpha: 1e42 });
    expect(rows[0]!.passthrough).toEqual(['hello']);
  });

  it('copies passthrough cells unchanged, in plan order', async () => {
    const rows = await normalize([['field', ['N', 'S']], ['id', ['A', 'B']], ['m_f444w', [150.1, 53.2]], ['z', [5, 6]], ['ok', [true, null]]]);
    expect(rows.map((r) => r.passthrough)).toEqual([
      ['N', 150.1, true],
      ['S', 53.2, null],
    ]);
  });

  it('reads integer ids as text and trims text ids', async () => {
    const rows = await normalize([['id', [1001, ' B-7 ']], ['z', [5, 6]]]);
    expect(rows.map((r) => [r.id, r.inputs?.id])).toEqual([
      ['1001', '1001'],
      ['B-7', 'B-7'],
    ]);
  });

  it('converts file units on the way in: m/s widths and W luminosities', async () => {
    const rows = await normalize([
      ['id', ['A']],
      ['z', [5]],
      [{ name: 'fwhm_halpha', kind: 'float', unit: 'm/s' }, [2.1e6]],
      [{ name: 'lum_halpha', kind: 'float', unit: 'W' }, [4.6e35]],
    ]);
    const ha = rows[0]!.inputs!.lines.halpha!;
    expect(ha.fwhmKms!.value).toBeCloseTo(2100, 9); // 1 km/s = 1000 m/s (SI)
    expect(ha.lumErgS!.value / 4.6e42).toBeCloseTo(1, 12); // 1 W = 1e7 erg/s (SI)
  });
});
