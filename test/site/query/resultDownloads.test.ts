import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { ResultSet } from '../../../src/site/db/resultSet.ts';
import { resultCsvWithHeader, resultEcsv, resultVotable, type ResultContext } from '../../../src/site/query/resultDownloads.ts';
import { BOUNDS_NOTE } from '../../../src/site/text/boundsNote.ts';

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
    expect(csv.split('\r\n').slice(0, 9)).toEqual([
      '# Invented catalog: query result',
      '# query: SELECT id, log_mbh, 1 AS n FROM census',
      `# catalog SHA-256: ${'ab'.repeat(32)}`,
      '# written by: dawn-census 0.1.0',
      `# ${BOUNDS_NOTE}`,
      '# WARNING: log_mbh can hold bounds, but this result lacks log_mbh_is_limit: add it to the SELECT to tell bounds from measurements.',
      '# id: Object identifier',
      '# log_mbh [dex(solMass)]: log10 of the mass',
      '# n: Computed by the query (no unit recorded)',
    ]);
    expect(csv.split('\r\n').slice(9)).toEqual(['id,log_mbh,n', '"A,1",7.5,1', 'B,,2', '']);
  });

  it('keeps a bound visible in the CSV: the number in its column, the _is_limit column beside it, and the note on bounds in the header', () => {
    const withMarker: ResultSet = { names: ['id', 'log_mbh', 'log_mbh_is_limit', 'log_edd_ratio', 'log_edd_ratio_is_limit'], types: ['Utf8', 'Float64', 'Bool', 'Float64', 'Bool'], columns: [['A', 'B'], [7.3, 8.1], [true, false], [-0.2, -1.1], [true, false]], numRows: 2 };
    const lines = resultCsvWithHeader(withMarker, 'SELECT id, log_mbh, log_mbh_is_limit, log_edd_ratio, log_edd_ratio_is_limit FROM census', ctx).split('\r\n');
    expect(lines).toContain(`# ${BOUNDS_NOTE}`);
    // the direction of a λ_Edd bound lives in the flags, which this result lacks
    expect(lines.filter((l) => l.startsWith('# WARNING'))).toEqual(['# WARNING: log_edd_ratio can hold bounds, but this result lacks flags: add it to the SELECT to tell bounds from measurements.']);
    expect(lines.slice(-3)).toEqual(['A,7.3,true,-0.2,true', 'B,8.1,false,-1.1,false', '']);
    expect(resultEcsv(withMarker, 'SELECT 1', ctx)).toContain('bounds: ');
  });

  it('warns, in the CSV header, for each column that can hold bounds when the query left out its _is_limit column', () => {
    const bare: ResultSet = { names: ['id', 'log_edd_ratio', 'log_lum_halpha', 'log_mseed_p16'], types: ['Utf8', 'Float64', 'Float64', 'Float64'], columns: [['A'], [-0.2], [42.1], [5.5]], numRows: 1 };
    const warnings = resultCsvWithHeader(bare, 'SELECT 1', ctx).split('\r\n').filter((l) => l.startsWith('# WARNING'));
    expect(warnings).toEqual([
      '# WARNING: log_edd_ratio can hold bounds, but this result lacks log_edd_ratio_is_limit and flags: add them to the SELECT to tell bounds from measurements.',
      '# WARNING: log_lum_halpha can hold bounds, but this result lacks flux_halpha_is_limit: add it to the SELECT to tell bounds from measurements.',
      '# WARNING: log_mseed_p16 can hold bounds, but this result lacks log_mseed_is_limit: add it to the SELECT to tell bounds from measurements.',
    ]);
    const plain: ResultSet = { names: ['id', 'z'], types: ['Utf8', 'Float64'], columns: [['A'], [5]], numRows: 1 };
    expect(resultCsvWithHeader(plain, 'SELECT id, z FROM census', ctx)).not.toContain('Bounds:');
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
