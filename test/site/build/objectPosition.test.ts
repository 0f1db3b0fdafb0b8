import { describe, expect, it } from 'vitest';
import { objectPosition } from '../../../src/site/build/objectPosition.ts';
import { objectView } from '../../../src/site/build/objectView.ts';

describe('objectPosition', () => {
  it('gives the stored degrees with every digit and the sexagesimal form', () => {
    // Sexagesimal computed with astropy 5.2.1: Angle(...).to_string(sep=':', pad=True), RA in hourangle with precision 2, Dec with precision 1 and alwayssign.
    expect(objectPosition({ id: 'A', ra: 47.342485123456, dec: -21.696102 })).toEqual({
      raDeg: '47.342485123456',
      decDeg: '\u221221.696102',
      raHms: '03:09:22.20',
      decDms: '\u221221:41:46.0',
    });
  });

  it('gives nothing without both coordinates, for text, or for values out of range', () => {
    expect(objectPosition({ id: 'A', ra: 47.3 })).toBeNull();
    expect(objectPosition({ id: 'A', ra: '03:09:22', dec: -21.7 })).toBeNull();
    expect(objectPosition({ id: 'A', ra: 361, dec: 0 })).toBeNull();
  });
});

describe('objectView with a position', () => {
  const row = { id: 'P-1', z: 6, ra: 150.1191667, dec: 2.2054444, field: 'QUILLMERE' };
  const view = objectView(row, Object.keys(row), { columns: { ra: { group: 'input' }, dec: { group: 'input' } } as never });

  it('shows ra and dec as the position and in neither table', () => {
    // Computed with astropy 5.2.1 (as above).
    expect(view.position).toMatchObject({ raHms: '10:00:28.60', decDms: '+02:12:19.6' });
    expect([...view.inputs, ...view.other].map((l) => l.column)).toEqual(['z', 'field']);
  });
});
