import { describe, expect, it } from 'vitest';
import { parseReadingSpec, ReadingSpecError } from '../../../src/core/readings/index.ts';

const base = { id: 'mine', premise: 'Widths halved.', references: ['Someone et al. 2026'] };
const parse = (extra: Record<string, unknown>) => parseReadingSpec({ ...base, ...extra }, 'readings.custom[0]');
const message = (extra: Record<string, unknown>): string => {
  try {
    parse(extra);
  } catch (e) {
    expect(e).toBeInstanceOf(ReadingSpecError);
    return (e as Error).message;
  }
  throw new Error('expected a ReadingSpecError');
};

describe('parseReadingSpec', () => {
  it('reads a reading with a deflation, L_bol/L5100, dust off and an efficiency', () => {
    const r = parse({ deflation: 2, l5100_ratio: 6, dust: 'none', efficiency: 0.2, duty_cycle: 0.5 });
    expect(r.width).toMatchObject({ mode: 'deflated', deflation: 2 });
    expect(r.bolometric).toMatchObject({ mode: 'l5100_ratio', ratio: 6 });
    expect(r.dust).toBe('none');
    expect(r.growth).toEqual({ efficiency: 0.2, dutyCycle: 0.5 });
    expect(r.label).toBe('mine');
  });

  it('stops at an unknown key with one line naming it', () => {
    const m = message({ deflaton: 2 });
    expect(m).toMatch(/^readings\.custom\[0\]: unknown key "deflaton"/);
    expect(m).not.toContain('\n');
  });

  it('stops at an out-of-range factor with one line naming the key and the range', () => {
    expect(message({ deflation: 40 })).toMatch(/^readings\.custom\[0\]\.deflation must be a number between 1 and 10 .*got 40$/);
    expect(message({ l5100_ratio: 0 })).toMatch(/^readings\.custom\[0\]\.l5100_ratio must be a number between 1 and 20/);
    expect(message({ efficiency: 0.9 })).toMatch(/^readings\.custom\[0\]\.efficiency must be/);
  });

  it('requires a premise and a reference, and a plain id', () => {
    expect(() => parseReadingSpec({ id: 'x', references: ['a'] }, 'r')).toThrow(/^r\.premise is required/);
    expect(() => parseReadingSpec({ id: 'x', premise: 'p' }, 'r')).toThrow(/^r\.references is required/);
    expect(message({ id: 'Bad Id' })).toMatch(/\.id must be lower-case/);
  });

  it('rejects a calibration of another line and an unknown bolometric choice', () => {
    expect(message({ calibrations: { halpha: 'vp06_hbeta' } })).toMatch(/calibrations\.halpha: unknown calibration "vp06_hbeta"/);
    expect(message({ bolometric: 'tiny' })).toMatch(/\.bolometric: unknown bolometric choice "tiny"/);
  });
});
