import { describe, expect, it } from 'vitest';
import { readingShiftChart, SHIFT_CIRCLES_MAX, type ShiftRow } from '../../../src/site/readings/shiftChart.ts';
import { testDocument } from '../charts/fakeRows.ts';

function rows(n: number): ShiftRow[] {
  return Array.from({ length: n }, (_, i) => ({ id: `o${i}`, mbhA: 6 + (i % 50) / 20, eddA: -1 + (i % 30) / 20, mbhB: 5.5 + (i % 50) / 20, eddB: -0.5 + (i % 30) / 20 }));
}

describe('the shift between two readings', () => {
  it('draws an arrow per object and circles each start while the population is small', () => {
    const svg = readingShiftChart(rows(30), { labelA: 'A', labelB: 'B', document: testDocument() });
    expect(svg.querySelectorAll('circle')).toHaveLength(30);
    expect(svg.querySelectorAll('[aria-label="arrow"] path')).toHaveLength(30);
    expect(svg.textContent).toContain('30 objects: circles under “A”');
  });

  it('leaves out the circles and their titles above SHIFT_CIRCLES_MAX objects, keeping every arrow', () => {
    const n = SHIFT_CIRCLES_MAX + 1;
    const svg = readingShiftChart(rows(n), { labelA: 'A', labelB: 'B', document: testDocument() });
    expect(svg.querySelectorAll('circle')).toHaveLength(0);
    expect(svg.querySelectorAll('title')).toHaveLength(0);
    expect(svg.querySelectorAll('[aria-label="arrow"] path')).toHaveLength(n);
    expect(svg.textContent).toContain(`${n} objects: arrow tails under “A”`);
  });

  it('says when the objects drawn are a sample of a large catalog, and of how many', () => {
    const el = readingShiftChart(rows(30), { labelA: 'A', labelB: 'B', document: testDocument(), sampleOf: 1_000_000 });
    expect(el.querySelector('figcaption')!.textContent).toMatch(/^A sample of 30 of 1[\s,\u202f\u2009]?000[\s,\u202f\u2009]?000 objects \(the same for every pair\); 30 drawn: circles/);
  });
});
