import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { ResultSet } from '../../../src/site/db/resultSet.ts';
import { resultCsvWithHeader, resultEcsv, resultVotable, type ResultContext } from '../../../src/site/query/resultDownloads.ts';

const ctx: ResultContext = {
  title: 'Invented catalog',
  tool: 'dawn-census 0.1.0',
  catalogSha256: 'ab'.repeat(32),
  inputSha256: 'cd'.repeat(32),
  columns: { id: { ucd: 'meta.id;meta.main', description: 'Object identifier' }, log_mbh: { unit: 'dex(solMass)', ucd: 'phys.mass', description: 'log10 of the mass' } },
};
const rs: ResultSet = { names: ['id', 'log_mbh', 'n'], types: ['Utf8', 'Float64', 'Int64'], columns: [['A,1', 'B'], [7.5, null], [1, 2]], numRows: 2 };
const SQL = 'SELECT id, log_mbh, 1 AS n\nFROM census';

function astropy(text: string, ext: string, fmt: string): any {
  const dir = mkdtempSync(path.join(tmpdir(), 'dc-rd-'));
  try {
    const f = path.join(dir, `r.${ext}`);
    writeFileSync(f, text);
    const py = `import json,sys,warnings\nwarnings.simplefilter('ignore')\nfrom astropy.table import Table\nt=Table.read(sys.argv[1], format=sys.argv[2])\nprint(json.dumps({'meta':{k:str(v) for k,v in t.meta.items()},'cols':{n:{'unit':None if t[n].unit is None else str(t[n].unit),'ucd':(t[n].meta or {}).get('ucd'),'values':[None if (v is None or str(v) in ('--','nan')) else (v.item() if hasattr(v,'item') else v) for v in t[n]]} for n in t.colnames}}))`;
    return JSON.parse(execFileSync('/usr/bin/python3', ['-c', py, f, fmt], { encoding: 'utf8' }));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

describe('query result downloads', () => {
  it('records the query, the catalog hash and each unit in the CSV comment header', () => {
    const csv = resultCsvWithHeader(rs, SQL, ctx);
    expect(csv.split('\r\n').slice(0, 7)).toEqual([
      '# Invented catalog: query result',
      '# query: SELECT id, log_mbh, 1 AS n FROM census',
      `# catalog SHA-256: ${'ab'.repeat(32)}`,
      '# written by: dawn-census 0.1.0',
      '# id: Object identifier',
      '# log_mbh [dex(solMass)]: log10 of the mass',
      '# n: Computed by the query (no unit recorded)',
    ]);
    expect(csv.split('\r\n').slice(7)).toEqual(['id,log_mbh,n', '"A,1",7.5,1', 'B,,2', '']);
  });

  it('writes ECSV that astropy (5.2.1) reads with units, UCDs, values and the query', () => {
    const t = astropy(resultEcsv(rs, SQL, ctx), 'ecsv', 'ascii.ecsv');
    expect(t.cols.log_mbh).toEqual({ unit: 'dex(solMass)', ucd: 'phys.mass', values: [7.5, null] });
    expect(t.cols.id.values).toEqual(['A,1', 'B']);
    expect(t.cols.n.values).toEqual([1, 2]);
    expect(t.meta.query).toBe(SQL);
    expect(t.meta.catalog_sha256).toBe(ctx.catalogSha256);
  });

  it('writes a VOTable that astropy (5.2.1) reads with UCDs and values', () => {
    const t = astropy(resultVotable(rs, SQL, ctx), 'vot', 'votable');
    expect(t.cols.log_mbh.values).toEqual([7.5, null]);
    expect(t.cols.id.values).toEqual(['A,1', 'B']);
  });
});
