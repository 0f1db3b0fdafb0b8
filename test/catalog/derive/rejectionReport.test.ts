import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { RejectionReport } from '../../../src/catalog/derive/rejectionReport.ts';

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

  it('neutralises a formula-like id and escapes control characters in its cells (CSV injection)', async () => {
    const dir = await mkdtemp(path.join(tmpdir(), 'dc-rej-'));
    try {
      const r = new RejectionReport(path.join(dir, 'r.csv'));
      r.add({ row: 1, id: '=HYPERLINK("http://x")', column: 'z', value: '@1\u001b[2J', reason: 'not a number', message: 'row 1: z = @1\u001b[2J: not a number' });
      await r.close();
      expect(await readFile(path.join(dir, 'r.csv'), 'utf8')).toBe(
        'row,id,column,value,reason,message\n1,"\'=HYPERLINK(""http://x"")",z,\'@1\\x1B[2J,not a number,row 1: z = @1\\x1B[2J: not a number\n',
      );
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  });
});
