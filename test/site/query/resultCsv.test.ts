import { describe, expect, it } from 'vitest';
import { resultCsv } from '../../../src/site/query/resultCsv.ts';

describe('resultCsv', () => {
  it('quotes fields with commas, quotes and line breaks, leaves missing values empty, keeps full precision', () => {
    const rs = { names: ['id', 'z', 'notes'], types: ['Utf8', 'Float64', 'Utf8'], numRows: 2, columns: [['a,b', 'c"d'], [6.123456789, null], ['line\nbreak', '<b>']] };
    expect(resultCsv(rs)).toBe('id,z,notes\r\n"a,b",6.123456789,"line\nbreak"\r\n"c""d",,<b>\r\n');
  });
  it('writes rows in the order given', () => {
    const rs = { names: ['x'], types: ['Float64'], numRows: 3, columns: [[1, 2, 3]] };
    expect(resultCsv(rs, [2, 0, 1])).toBe('x\r\n3\r\n1\r\n2\r\n');
  });
});

describe('resultCsv in a spreadsheet', () => {
  it('neutralises text cells that start like a formula and escapes control characters, but leaves numbers and numeric text as they are', () => {
    const rs = {
      names: ['id', 'z', 'note'],
      types: ['Utf8', 'Float64', 'Utf8'],
      numRows: 2,
      columns: [['=HYPERLINK("http://x")', '-0042'], [-1.5, 6], ['@SUM(A1)', 'red\u001b[31m']],
    };
    expect(resultCsv(rs)).toBe('id,z,note\r\n"\'=HYPERLINK(""http://x"")",-1.5,\'@SUM(A1)\r\n-0042,6,red\\x1B[31m\r\n');
  });
});
