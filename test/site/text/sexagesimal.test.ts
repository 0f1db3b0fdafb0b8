import { describe, expect, it } from 'vitest';
import { formatDecDms, formatRaHms } from '../../../src/site/text/sexagesimal.ts';

// Expected strings computed with astropy 5.2.1 (Debian /usr/bin/python3):
// Angle(ra * u.deg).to_string(unit=u.hourangle, sep=':', precision=2, pad=True) and
// Angle(dec * u.deg).to_string(unit=u.deg, sep=':', precision=1, pad=True, alwayssign=True).
// The site prints the minus sign U+2212 where astropy prints '-'.
const RA_ASTROPY: [number, string][] = [
  [0, '00:00:00.00'],
  [47.342485, '03:09:22.20'],
  [150.1191667, '10:00:28.60'],
  [83.6330833, '05:34:31.94'],
  [266.4168333, '17:45:40.04'],
  [10.68470833, '00:42:44.33'],
  [201.365063, '13:25:27.62'],
];
const DEC_ASTROPY: [number, string][] = [
  [-21.696102, '-21:41:46.0'],
  [2.2054444, '+02:12:19.6'],
  [-29.0078111, '-29:00:28.1'],
  [41.26875, '+41:16:07.5'],
  [-0.5, '-00:30:00.0'],
  [89.9999999, '+90:00:00.0'],
  [-90, '-90:00:00.0'],
  [-43.0191125, '-43:01:08.8'],
];

describe('formatRaHms', () => {
  it.each(RA_ASTROPY)('writes RA %s° as %s, as astropy 5.2.1 does', (deg, text) => {
    expect(formatRaHms(deg)).toBe(text);
  });

  it('carries rounded seconds into the minute and hour, and writes a full circle as 00:00:00.00', () => {
    // 59.996 s of time rounds to 60.00 s: 00:00:59.996 → 00:01:00.00 (arithmetic, no source needed).
    expect(formatRaHms((59.996 / 3600) * 15)).toBe('00:01:00.00');
    // Our convention: astropy 5.2.1 writes 359.9999999° as 24:00:00.00; we wrap to 00:00:00.00.
    expect(formatRaHms(359.9999999)).toBe('00:00:00.00');
    expect(formatRaHms(360)).toBe('00:00:00.00');
  });

  it('gives nothing for a value outside 0–360 or not finite', () => {
    for (const x of [-0.001, 360.001, Number.NaN, Number.POSITIVE_INFINITY]) expect(formatRaHms(x)).toBeNull();
  });
});

describe('formatDecDms', () => {
  it.each(DEC_ASTROPY)('writes Dec %s° as %s, as astropy 5.2.1 does (with the minus sign U+2212)', (deg, text) => {
    expect(formatDecDms(deg)).toBe(text.replace('-', '\u2212'));
  });

  it('writes a value that rounds to zero as +00:00:00.0', () => {
    // Our convention: astropy 5.2.1 writes −1e−5° as -00:00:00.0.
    expect(formatDecDms(-0.00001)).toBe('+00:00:00.0');
  });

  it('gives nothing for a value outside −90–90 or not finite', () => {
    for (const x of [-90.0001, 90.0001, Number.NaN]) expect(formatDecDms(x)).toBeNull();
  });
});
