import { describe, expect, it } from 'vitest';
import { csvRecords, parsePastedCsv } from '../../../src/site/place/csvRow.ts';

describe('parsePastedCsv', () => {
  it('skips comment and blank lines and reads quoted fields with commas and doubled quotes', () => {
    const text = '# a comment\n\nid,z,notes\r\nA-1,5.1,"a, b ""c"""\n';
    expect(parsePastedCsv(text)).toEqual({ header: ['id', 'z', 'notes'], rows: [['A-1', '5.1', 'a, b "c"']] });
  });

  it('says when only a header was pasted', () => {
    expect(parsePastedCsv('id,z')).toEqual({ error: 'only one line: paste the header line (column names) and then the data row' });
  });

  it('says which data row has the wrong number of fields', () => {
    expect(parsePastedCsv('id,z\nA,1,2')).toEqual({ error: 'data row 1 has 3 fields but the header has 2' });
  });

  it('reports an unclosed quote', () => {
    expect(csvRecords('a,"b\n')).toEqual({ error: 'a quoted field is not closed (a " is missing)' });
  });
});
