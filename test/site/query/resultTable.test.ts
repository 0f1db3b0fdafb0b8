import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseHTML } from 'linkedom';
import { ResultTable } from '../../../src/site/query/resultTable.ts';

describe('ResultTable', () => {
  const saved = globalThis.document;
  let document: Document;
  beforeAll(() => {
    ({ document } = parseHTML('<!doctype html><html><body data-base="/census/" data-object-pages="static"><div id="t"></div></body></html>') as unknown as { document: Document });
    globalThis.document = document;
  });
  afterAll(() => {
    globalThis.document = saved;
  });

  const result = (n: number) => ({
    names: ['id', 'z', 'notes'],
    types: ['Utf8', 'Float64', 'Utf8'],
    numRows: n,
    columns: [
      Array.from({ length: n }, (_, i) => (i === 0 ? '<img src=x onerror=alert(1)>' : `DC-${i}`)),
      Array.from({ length: n }, (_, i) => (i === 5 ? null : 4 + i / 100)),
      Array.from({ length: n }, () => '<b>bold</b>'),
    ],
  });

  it('puts one page of rows in the DOM however many rows there are', () => {
    const root = document.getElementById('t')!;
    const t = new ResultTable(root, { units: { z: '' }, base: '/census/', pageSize: 50 });
    t.setResult(result(1234));
    expect(root.querySelectorAll('tbody tr')).toHaveLength(50);
    expect(root.querySelector('.pager-info')!.textContent).toBe('Rows 1–50 of 1,234');
  });

  it('writes a bound with "<" or ">" when the result holds its _is_limit column or the flags, and a measurement as a plain number', () => {
    const root = document.getElementById('t')!;
    const t = new ResultTable(root, { units: {}, base: '/census/' });
    t.setResult({
      names: ['id', 'log_mbh', 'log_mbh_is_limit', 'log_edd_ratio', 'flags', 'log_mseed'],
      types: ['Utf8', 'Float64', 'Bool', 'Float64', 'Utf8', 'Float64'],
      numRows: 2,
      columns: [['A', 'B'], [7.3, 8.1], [true, false], [-0.2, -1.1], ['mbh_upper_limit,edd_ratio_lower_limit', ''], [3.1, 4.2]],
    });
    const rows = [...root.querySelectorAll('tbody tr')].map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent));
    expect(rows[0]![1]).toMatch(/^< 7\.3/);
    expect(rows[0]![3]).toMatch(/^> −0\.2/);
    // log_mseed_is_limit is not in the result: the flags say the mass, and so the seed mass, is a bound
    expect(rows[0]![5]).toMatch(/^< 3\.1/);
    expect(rows[1]!.slice(1).every((c) => !c!.startsWith('<') && !c!.startsWith('>'))).toBe(true);
  });

  it('writes catalog text as text and links ids to their object pages', () => {
    const root = document.getElementById('t')!;
    const t = new ResultTable(root, { units: {}, base: '/census/' });
    t.setResult(result(3));
    expect(root.querySelectorAll('img')).toHaveLength(0);
    expect(root.querySelectorAll('b')).toHaveLength(0);
    const a = root.querySelector('tbody tr a')!;
    expect(a.textContent).toBe('<img src=x onerror=alert(1)>');
    expect(a.getAttribute('href')).toMatch(/^\/census\/object\/img_src_x_onerror_alert_1-[0-9a-f]{8}\/$/);
  });

  it('sorts by a header click, descending on the second click, missing values last', () => {
    const root = document.getElementById('t')!;
    const t = new ResultTable(root, { units: {}, base: '/' });
    t.setResult(result(10));
    const zButton = root.querySelectorAll('thead button')[1] as HTMLButtonElement;
    zButton.click();
    zButton.click();
    expect(root.querySelectorAll('thead th')[1]!.getAttribute('aria-sort')).toBe('descending');
    const zs = Array.from(root.querySelectorAll('tbody tr')).map((tr) => tr.querySelectorAll('td')[1]!.textContent);
    expect(zs[0]).toBe('4.090');
    expect(zs.at(-1)).toBe('—');
    expect(Array.from(t.rowOrder()!).at(-1)).toBe(5);
  });
});
