import { describe, expect, it } from 'vitest';
import { L_EDD_PER_MSUN_CONVENTIONAL } from '../../../src/core/constants/eddington.ts';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';
import type { ResultSet } from '../../../src/site/db/resultSet.ts';
import { intervalColumns } from '../../../src/site/resultChart/intervalColumns.ts';
import { limitOf, limitRule, limitSourceColumns } from '../../../src/site/resultChart/limitRule.ts';
import { resultChart } from '../../../src/site/resultChart/resultChart.ts';
import { chartSettingsFromSearch, fitSettings, hrefWithChartSettings, type ResultChartSettings } from '../../../src/site/resultChart/resultChartSettings.ts';
import { overlayFor } from '../../../src/site/resultChart/resultOverlays.ts';
import { withColumnsById } from '../../../src/site/resultChart/mountResultChart.ts';
import { markElements, testDocument } from '../charts/fakeRows.ts';

// Invented rows (internal test data).
function result(): ResultSet {
  const n = 12;
  const ids = Array.from({ length: n }, (_, i) => `X-${i}`);
  const mstar = ids.map((_, i) => 9 + i * 0.2);
  const mbh = ids.map((_, i) => (i === 11 ? null : 6 + i * 0.15));
  const flags = ids.map((_, i) => (i % 4 === 0 ? 'mbh_upper_limit,no_dust_correction' : i === 5 ? 'edd_ratio_lower_limit' : ''));
  return {
    names: ['id', 'log_mstar', 'log_mbh', 'log_mbh_p16', 'log_mbh_p84', 'method', 'flags'],
    types: ['Utf8', 'Float64', 'Float64', 'Float64', 'Float64', 'Utf8', 'Utf8'],
    columns: [ids, mstar, mbh, mbh.map((v) => (v === null ? null : v - 0.3)), mbh.map((v) => (v === null ? null : v + 0.3)), ids.map((_, i) => (i % 2 ? 'Hα' : 'Hβ')), flags],
    numRows: n,
  };
}
const base: ResultChartSettings = { x: 'log_mstar', y: 'log_mbh', colour: '', size: '', xLog: false, yLog: false, overlays: true };
const draw = (s: Partial<ResultChartSettings>, rs = result()) =>
  resultChart({ rs, settings: { ...base, ...s }, catalog: { ...DEFAULT_SETTINGS, eddingtonPerMsun: L_EDD_PER_MSUN_CONVENTIONAL }, label: (c) => c, document: testDocument() });

describe('the chart of a query result', () => {
  it('places every row with both values and counts the rest as skipped', () => {
    const c = draw({});
    expect(c.placed).toBe(11);
    expect(c.skipped).toBe(1);
  });

  it('draws the rows flagged mbh_upper_limit as limit arrows and the others as points', () => {
    const c = draw({});
    // rows 0, 4, 8 carry mbh_upper_limit; row 11 has no mass
    expect(markElements(c.element, 'result limit')).toHaveLength(3);
    expect(markElements(c.element, 'result point')).toHaveLength(8);
  });

  it('draws y error bars from the matching _p16/_p84 columns for the measurements only', () => {
    expect(markElements(draw({}).element, 'error bar y')).toHaveLength(8);
    expect(markElements(draw({ y: 'log_mstar', x: 'log_mbh' }).element, 'error bar x')).toHaveLength(8);
  });

  it('overlays the local relations on stellar mass against black-hole mass, and not on log axes', () => {
    expect(markElements(draw({}).element, 'local relation').length).toBeGreaterThan(0);
    expect(markElements(draw({ xLog: true }).element, 'local relation')).toHaveLength(0);
    expect(markElements(draw({ overlays: false }).element, 'local relation')).toHaveLength(0);
  });

  it('drops rows that are not positive on a log axis and says so in the caption', () => {
    const rs = result();
    (rs.columns[1] as number[])[3] = -1;
    const c = draw({ xLog: true }, rs);
    expect(c.skipped).toBe(2);
    expect(c.element.textContent).toContain('not positive on a log axis');
  });

  it('colours by a text column with one legend entry per value', () => {
    const c = draw({ colour: 'method' });
    const labels = markElements(c.element, 'legend label').map((t) => t.textContent);
    expect(labels).toContain('Hα');
    expect(labels).toContain('Hβ');
  });

  it('colours by a numeric column in classes whose legend spans its range', () => {
    const c = draw({ colour: 'log_mstar' });
    const labels = markElements(c.element, 'legend label').map((t) => t.textContent ?? '');
    expect(labels.some((l) => l.startsWith('9.00 –'))).toBe(true);
    expect(labels.some((l) => l.endsWith('– 11.00'))).toBe(true);
  });
});

describe('what the result chart reads from column names', () => {
  it('finds percentiles for a column and for its median', () => {
    const names = ['log_lbol', 'log_lbol_p16', 'log_lbol_p50', 'log_lbol_p84', 'z'];
    expect(intervalColumns('log_lbol', names)).toEqual({ lo: 'log_lbol_p16', hi: 'log_lbol_p84' });
    expect(intervalColumns('log_lbol_p50', names)).toEqual({ lo: 'log_lbol_p16', hi: 'log_lbol_p84' });
    expect(intervalColumns('z', names)).toBeNull();
  });

  it('reads upper and lower limits of the Eddington ratio from the flags and of a flux from its _is_limit column', () => {
    expect(limitOf(limitRule('log_edd_ratio'), { flags: 'edd_ratio_lower_limit' })).toBe('lower');
    expect(limitOf(limitRule('log_edd_ratio_p50'), { flags: 'lensed, edd_ratio_upper_limit' })).toBe('upper');
    expect(limitOf(limitRule('flux_halpha'), { flux_halpha_is_limit: true })).toBe('upper');
    expect(limitOf(limitRule('z'), { flags: 'mbh_upper_limit' })).toBeNull();
    expect(limitSourceColumns(['log_mbh', 'log_lum_hbeta', 'z']).sort()).toEqual(['flags', 'flux_hbeta_is_limit', 'log_mbh_is_limit']);
  });

  it('reads the bounds of the seed mass, the required ratios and the offset from the local relation, not only of the mass', () => {
    for (const c of ['log_mseed', 'lambda_req_light', 'lambda_req_heavy', 'delta_log_mbh_local', 'local_offset_sigma']) {
      expect(limitOf(limitRule(c), { flags: 'mbh_upper_limit' }), c).toBe('upper');
      expect(limitOf(limitRule(c), { flags: '' }), c).toBeNull();
    }
    expect(limitOf(limitRule('log_mseed'), { log_mseed_is_limit: true, flags: '' })).toBe('upper');
    expect(limitOf(limitRule('lambda_req_heavy'), { lambda_req_is_limit: true })).toBe('upper');
    expect(limitOf(limitRule('local_offset_sigma'), { delta_log_mbh_local_is_limit: true })).toBe('upper');
    // the _is_limit column decides where the row has it
    expect(limitOf(limitRule('log_mbh'), { log_mbh_is_limit: false, flags: 'mbh_upper_limit' })).toBeNull();
    expect(limitOf(limitRule('log_edd_ratio'), { log_edd_ratio_is_limit: true, flags: 'edd_ratio_lower_limit' })).toBe('lower');
    expect(limitOf(limitRule('log_edd_ratio'), { log_edd_ratio_is_limit: true, flags: '' })).toBe('upper');
    expect(limitSourceColumns(['log_mseed', 'lambda_req_light']).sort()).toEqual(['flags', 'lambda_req_is_limit', 'log_mseed_is_limit']);
  });

  it('allows Eddington lines only for bolometric luminosity against black-hole mass on linear axes', () => {
    expect(overlayFor('log_mbh', 'log_lbol', false, false)).toBe('eddington-lines');
    expect(overlayFor('log_lbol', 'log_mbh', false, false)).toBeNull();
    expect(overlayFor('log_mbh', 'log_lbol', false, true)).toBeNull();
  });
});

describe('the result chart settings', () => {
  it('round-trip through the URL beside the query, which they leave alone', () => {
    const s: ResultChartSettings = { x: 'z', y: 'log_mbh', colour: 'flags', size: 'log_lbol', xLog: true, yLog: false, overlays: false };
    const href = hrefWithChartSettings('http://localhost/query/?sql=SELECT%201', s);
    expect(new URL(href).searchParams.get('sql')).toBe('SELECT 1');
    expect(chartSettingsFromSearch(new URL(href).search)).toEqual(s);
    expect(chartSettingsFromSearch('?sql=x')).toBeNull();
  });

  it('fall back to the first two numeric columns that are not percentiles or limit markers', () => {
    const s = fitSettings({ x: 'gone' }, ['log_mbh_p16', 'z', 'log_mbh'], ['id', 'log_mbh_p16', 'z', 'log_mbh']);
    expect([s.x, s.y]).toEqual(['z', 'log_mbh']);
  });

  it('join columns read by id onto the result in its own row order', () => {
    const rs: ResultSet = { names: ['id', 'z'], types: ['Utf8', 'Float64'], columns: [['b', 'a', 'c'], [1, 2, 3]], numRows: 3 };
    const extra: ResultSet = { names: ['id', 'flags'], types: ['Utf8', 'Utf8'], columns: [['a', 'b'], ['fa', 'fb']], numRows: 2 };
    expect(withColumnsById(rs, extra).columns[2]).toEqual(['fb', 'fa', null]);
  });
});
