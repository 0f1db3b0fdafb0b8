import { describe, expect, it } from 'vitest';
import { terminalText } from '../../../src/shared/text/terminalText.ts';

describe('terminalText', () => {
  it('shows every control character as an escape, so a value cannot recolour the terminal or split a line', () => {
    expect(terminalText('id \u001b]0;owned\u0007 \u001b[2J')).toBe('id \\x1B]0;owned\\x07 \\x1B[2J');
    expect(terminalText('two\nlines\r\tx')).toBe('two\\x0Alines\\x0D\\x09x');
    expect(terminalText('\u009b31m')).toBe('\\x9B31m');
    expect(terminalText('abc\u202Efed\u2066')).toBe('abc\\u202Efed\\u2066');
  });

  it('leaves ordinary text, accents and symbols alone', () => {
    expect(terminalText('row 3 (id Ω-7 "é"): fwhm_halpha = −5 km/s')).toBe('row 3 (id Ω-7 "é"): fwhm_halpha = −5 km/s');
  });
});
