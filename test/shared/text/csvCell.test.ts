import { describe, expect, it } from 'vitest';
import { csvCell } from '../../../src/shared/text/csvCell.ts';

describe('csvCell', () => {
  it('quotes cells with commas, quotes, line breaks or edge blanks and doubles their quotes (RFC 4180)', () => {
    expect(csvCell('plain')).toBe('plain');
    expect(csvCell('a,b')).toBe('"a,b"');
    expect(csvCell('say "hi"')).toBe('"say ""hi"""');
    expect(csvCell('two\nlines')).toBe('"two\nlines"');
    expect(csvCell(' padded')).toBe('" padded"');
    expect(csvCell(null)).toBe('');
    expect(csvCell(undefined)).toBe('');
  });

  it('writes numbers, bigints and booleans unchanged, negative ones included', () => {
    expect(csvCell(-1.5)).toBe('-1.5');
    expect(csvCell(-12n)).toBe('-12');
    expect(csvCell(Number.NaN)).toBe('NaN');
    expect(csvCell(true)).toBe('true');
  });

  // The trigger characters: OWASP "CSV Injection" (common practice, no paper); U+2212 and the
  // full-width forms because the issue lists "−" and some spreadsheets read them (from memory).
  it('puts a quote mark before text that a spreadsheet would run as a formula', () => {
    expect(csvCell('=1+1')).toBe("'=1+1");
    expect(csvCell('+cmd')).toBe("'+cmd");
    expect(csvCell('-2+3')).toBe("'-2+3");
    expect(csvCell('@SUM(A1:A9)')).toBe("'@SUM(A1:A9)");
    expect(csvCell('\u2212cmd')).toBe("'\u2212cmd");
    expect(csvCell('\uff1dcmd')).toBe("'\uff1dcmd");
    expect(csvCell('\tx')).toBe("'\tx");
    expect(csvCell('\r=x')).toBe('"\'\r=x"');
    expect(csvCell('=A1,"x"')).toBe('"\'=A1,""x"""');
  });

  it('leaves text that is a plain number as written, since a spreadsheet reads it as a number', () => {
    expect(csvCell('-3')).toBe('-3');
    expect(csvCell('+1.5e42')).toBe('+1.5e42');
    expect(csvCell('-0042')).toBe('-0042');
    expect(csvCell('-.5')).toBe('-.5');
    expect(csvCell('1e3')).toBe('1e3');
  });

  it('shows control characters other than tab and line breaks as escapes', () => {
    expect(csvCell('red\u001b[31mX')).toBe('red\\x1B[31mX');
    expect(csvCell('a\u0000b\u007fc\u009bd')).toBe('a\\x00b\\x7Fc\\x9Bd');
    expect(csvCell('abc\u202Efed')).toBe('abc\\u202Efed');
    expect(csvCell('a\tb')).toBe('a\tb');
  });
});
