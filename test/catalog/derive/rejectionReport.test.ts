import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { csvField } from '../../../src/catalog/derive/csvField.ts';
import { RejectionReport } from '../../../src/catalog/derive/rejectionReport.ts';

describe('csvField', () => {
  it('quotes fields with commas, quotes, line breaks or edge blanks and doubles their quotes (RFC 4180)', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
    expect(csvField(' padded')).toBe('" padded"');
    expect(csvField(null)).toBe('');
    expect(csvField(-1.5)).toBe('-1.5');
  });
});

describe('RejectionReport', () => {
  it('writes the header even with no entries, then one line per entry', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'dc-rej-'));
    try {
      const empty = new RejectionReport(path.join(dir, 'empty.csv'));
      await empty.close();
      expect(await readFile(path.join(dir, 'empty.csv'), 'utf8')).toBe('row,id,column,value,reason,message\n');

      const r = new RejectionReport(path.join(dir, 'r.csv'));
      r.add({ row: 3, id: 'X,1', column: 'fwhm_halpha', value: '-5', reason: 'must be positive', message: 'row 3 (id X,1): fwhm_halpha = -5 km/s: must be positive' });
      await r.close();
      expect(r.count).toBe(1);
      expect(await readFile(path.join(dir, 'r.csv'), 'utf8')).toBe(
        'row,id,column,value,reason,message\n3,"X,1",fwhm_halpha,-5,must be positive,"row 3 (id X,1): fwhm_halpha = -5 km/s: must be positive"\n',
      );
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });
});
