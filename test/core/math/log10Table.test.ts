import { execFileSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { LOG10_TABLE_CENTRE, LOG10_TABLE_HI, LOG10_TABLE_LO, LOG10_TABLE_SPLIT } from '../../../src/core/math/log10Table.ts';

const ROOT = new URL('../../../', import.meta.url);
const PYTHON = '/usr/bin/python3';

describe('log10Table', () => {
  it('holds the centres log10InPlace reduces to: 1 + (2i + 1)/256, halved from the interval that holds √2, and 1 at both ends', () => {
    expect(LOG10_TABLE_CENTRE.length).toBe(128);
    // Interval i of the significand is [1 + i/128, 1 + (i + 1)/128); √2 lies in interval 53.
    expect(1 + LOG10_TABLE_SPLIT / 128).toBeLessThanOrEqual(Math.SQRT2);
    expect(1 + (LOG10_TABLE_SPLIT + 1) / 128).toBeGreaterThan(Math.SQRT2);
    for (let i = 1; i < 127; i++) {
      const c = 1 + (2 * i + 1) / 256;
      expect(LOG10_TABLE_CENTRE[i], `centre ${i}`).toBe(i >= LOG10_TABLE_SPLIT ? c / 2 : c);
    }
    expect([LOG10_TABLE_CENTRE[0], LOG10_TABLE_HI[0], LOG10_TABLE_LO[0]]).toEqual([1, 0, 0]);
    expect([LOG10_TABLE_CENTRE[127], LOG10_TABLE_HI[127], LOG10_TABLE_LO[127]]).toEqual([1, 0, 0]);
  });

  it('holds log10 of each centre as hi + lo, hi within half an ulp of it and lo below half an ulp of hi', () => {
    // Math.log10 (V8's fdlibm port, within 1.5 ulp) as an outside check of hi; lo is what a double cannot hold of it.
    for (let i = 1; i < 127; i++) {
      const hi = LOG10_TABLE_HI[i] as number;
      const lo = LOG10_TABLE_LO[i] as number;
      const ulp = 2 ** (Math.floor(Math.log2(Math.abs(hi))) - 52);
      expect(Math.abs(hi - Math.log10(LOG10_TABLE_CENTRE[i] as number)), `hi ${i}`).toBeLessThanOrEqual(2 * ulp);
      expect(Math.abs(lo), `lo ${i}`).toBeLessThanOrEqual(ulp / 2);
      expect(lo, `lo ${i}`).not.toBe(0);
    }
  });

  it.runIf(existsSync(PYTHON))('is what scripts/reference/log10Table.py writes (Python decimal, 80 digits)', () => {
    const written = execFileSync(PYTHON, [new URL('scripts/reference/log10Table.py', ROOT).pathname], { encoding: 'utf8' });
    // StrykerJS's sandbox copies each source with a `// @ts-nocheck` line first.
    const file = readFileSync(new URL('src/core/math/log10Table.ts', ROOT), 'utf8').replace(/^\/\/ @ts-nocheck\n/, '');
    expect(file).toBe(written);
  });
});
