import { describe, expect, it } from 'vitest';
import { readingShiftChart, type ShiftRow } from '../../../src/site/readings/shiftChart.ts';
import { testDocument } from '../charts/fakeRows.ts';

const rows: ShiftRow[] = Array.from({ length: 30 }, (_, i) => ({ id: `o${i}`, mbhA: 7 + i / 30, eddA: -1 + i / 60, mbhB: 6.5 + i / 30, eddB: -0.5 + i / 60 }));

describe('the shift chart between two readings', () => {
  it('draws one arrow per object and says how many it drew', () => {
    const el = readingShiftChart(rows, { labelA: 'A', labelB: 'B', document: testDocument() });
    expect(el.querySelector('figcaption')!.textContent).toMatch(/^30 objects: circles under “A”/);
  });

  it('says when the objects drawn are a sample of a large catalog, and of how many', () => {
    const el = readingShiftChart(rows, { labelA: 'A', labelB: 'B', document: testDocument(), sampleOf: 1_000_000 });
    expect(el.querySelector('figcaption')!.textContent).toMatch(/^A sample of 30 of 1[\s,\u202f\u2009]?000[\s,\u202f\u2009]?000 objects \(the same for every pair\); 30 drawn: circles/);
  });
});
