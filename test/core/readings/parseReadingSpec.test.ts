import { describe, expect, it } from 'vitest';
import { parseReadingSpec, ReadingSpecError, SCATTERING_DEFLATION } from '../../../src/core/readings/index.ts';
import { GREENE25_L5100_RATIO, YANAGISAWA26_LINE_FACTORS } from '../../../src/core/bolometric/smallCorrections.ts';

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

describe('parseReadingSpec, every choice and every refusal', () => {
  it('takes a core width with the scattering deflation (10) when no deflation is given, and with the given one when it is', () => {
    const plain = parse({ width: 'core' });
    expect(plain.width).toEqual({ mode: 'core', fallbackDeflation: 10, deflationSource: SCATTERING_DEFLATION.source });
    const own = parse({ width: 'core', deflation: 3 });
    expect(own.width).toEqual({ mode: 'core', fallbackDeflation: 3, deflationSource: 'mine (custom reading)' });
    // Brazzini et al. 2025 (abstract): masses "up to two orders of magnitude smaller", so d = 10 for FWHM exponent 2.
    expect(SCATTERING_DEFLATION.factor).toBe(10);
  });

  it('names the reading and the scattering papers as the source of a deflated width', () => {
    const r = parse({ width: 'deflated', deflation: 2 });
    expect(r.width).toEqual({ mode: 'deflated', deflation: 2, deflationSource: `mine (custom reading); range from ${SCATTERING_DEFLATION.source}` });
  });

  it('reads the named bolometric choices as their cited records: L_bol/L5100 = 5 and the line factors 40 and 10', () => {
    // Greene et al. 2025 (abstract): L_bol/L5100 ≈ 5; Yanagisawa et al. 2026 (abstract): ~40 for Hα, ~10 for Hβ.
    expect(parse({ bolometric: 'greene25_l5100' }).bolometric).toEqual({ mode: 'l5100_ratio', ratio: 5, source: GREENE25_L5100_RATIO.reference });
    expect(parse({ bolometric: 'yanagisawa26_lines' }).bolometric).toEqual({ mode: 'line_factors', halpha: 40, hbeta: 10, source: YANAGISAWA26_LINE_FACTORS.reference });
    expect(parse({ bolometric: 'standard' }).bolometric).toEqual({ mode: 'standard' });
    expect(parse({}).bolometric).toEqual({ mode: 'standard' });
    expect(parse({ l5100_ratio: 6 }).bolometric).toEqual({ mode: 'l5100_ratio', ratio: 6, source: 'mine (custom reading)' });
  });

  it('keeps a plain reading plain: measured widths, standard dust, no growth settings, trimmed texts and a list of one reference', () => {
    const r = parseReadingSpec({ id: 'plain', premise: '  As is.  ', references: ' One et al. 2020 ', label: ' Plain ' }, 'r');
    expect(r).toEqual({
      id: 'plain',
      label: 'Plain',
      premise: 'As is.',
      references: ['One et al. 2020'],
      calibrations: {},
      width: { mode: 'measured' },
      bolometric: { mode: 'standard' },
      dust: 'standard',
      growth: {},
    });
    expect(parse({ calibrations: { halpha: 'gh05_halpha', hbeta: 'vp06_hbeta_line' } }).calibrations).toEqual({ halpha: 'gh05_halpha', hbeta: 'vp06_hbeta_line' });
    expect(parse({ label: null, dust: null }).label).toBe('mine');
  });

  it('accepts the ends of each range and refuses just outside them (READING_LIMITS)', () => {
    expect(parse({ deflation: 1 }).width).toMatchObject({ deflation: 1 });
    expect(parse({ deflation: 10 }).width).toMatchObject({ deflation: 10 });
    expect(message({ deflation: 0.999 })).toMatch(/deflation must be a number between 1 and 10/);
    expect(message({ deflation: 10.001 })).toMatch(/deflation must be a number between 1 and 10/);
    expect(message({ deflation: '2' })).toMatch(/deflation must be a number between 1 and 10 \(.*\), got "2"$/);
    expect(message({ duty_cycle: Number.NaN })).toMatch(/duty_cycle must be a number between 0\.01 and 1 .*got NaN$/);
  });

  it('refuses each malformed part with one line naming where it is and what it got', () => {
    const cases: [unknown, RegExp][] = [
      [null, /^r must be a mapping, got null$/],
      [['a'], /^r must be a mapping, got a list$/],
      ['text', /^r must be a mapping, got "text"$/],
      [{ ...base, id: '' }, /^r\.id must be a non-empty string, got ""$/],
      [{ ...base, id: 7 }, /^r\.id must be a non-empty string, got 7$/],
      [{ ...base, id: 'a'.repeat(41) }, /^r\.id must be lower-case letters, digits and '_' \(at most 40, starting with a letter\)/],
      [{ ...base, id: '1abc' }, /^r\.id must be lower-case/],
      [{ ...base, id: 'ab-c' }, /^r\.id must be lower-case/],
      [{ ...base, premise: '   ' }, /^r\.premise must be a non-empty string, got "   "$/],
      [{ ...base, references: ['ok', ''] }, /^r\.references\[1\] must be a non-empty string, got ""$/],
      [{ ...base, references: [{}] }, /^r\.references\[0\] must be a non-empty string, got a mapping$/],
      [{ ...base, calibrations: 'gh05_halpha' }, /^r\.calibrations must be a mapping of line to calibration, got "gh05_halpha"$/],
      [{ ...base, calibrations: ['gh05_halpha'] }, /^r\.calibrations must be a mapping of line to calibration, got a list$/],
      [{ ...base, calibrations: { oiii: 'x' } }, /^r\.calibrations: unknown line "oiii"; known: halpha, hbeta, mgii, civ$/],
      [{ ...base, calibrations: { halpha: 3 } }, /^r\.calibrations\.halpha: unknown calibration 3; known: gh05_halpha, rv15_halpha$/],
      [{ ...base, width: 'measured', deflation: 2 }, /^r\.deflation is set but width is "measured"; use width "deflated" or "core"$/],
      [{ ...base, width: 'deflated' }, /^r\.deflation is required when width is "deflated"$/],
      [{ ...base, width: 'half' }, /^r\.width: unknown width "half"; known: measured, core, deflated$/],
      [{ ...base, bolometric: 'standard', l5100_ratio: 5 }, /^r\.l5100_ratio and \.bolometric both set; give one$/],
      [{ ...base, bolometric: 'tiny' }, /^r\.bolometric: unknown bolometric choice "tiny"; known: standard, greene25_l5100, yanagisawa26_lines$/],
      [{ ...base, dust: 'some' }, /^r\.dust: unknown dust choice "some"; known: standard, none$/],
    ];
    for (const [spec, re] of cases) {
      let msg = '';
      try {
        parseReadingSpec(spec, 'r');
      } catch (e) {
        expect(e).toBeInstanceOf(ReadingSpecError);
        expect((e as Error).name).toBe('ReadingSpecError');
        msg = (e as Error).message;
      }
      expect(msg, JSON.stringify(spec)).toMatch(re);
    }
  });
});
