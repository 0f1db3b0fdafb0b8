import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { openTable } from '../../../src/catalog/readers/openTable.ts';
import { makeTmpDir, readAll } from './readerTestKit.ts';

const { dir, cleanup } = makeTmpDir('ecsv');
afterAll(cleanup);

let n = 0;
async function read(content: string, ext = 'ecsv') {
  const path = join(dir, `t${n++}.${ext}`);
  writeFileSync(path, content);
  const src = await openTable(path);
  return { src, ...(await readAll(src, 2)) };
}

const header = (cols: string[], extra: string[] = []) =>
  ['# %ECSV 1.0', '# ---', '# datatype:', ...cols.map((c) => `# - ${c}`), ...extra].join('\n') + '\n';

describe('the ECSV reader', () => {
  it('maps every ECSV integer, float, bool and string datatype to a kind', async () => {
    const types = ['int8', 'int16', 'int32', 'int64', 'uint8', 'uint16', 'uint32', 'uint64', 'float16', 'float32', 'float64', 'bool', 'string'];
    const { src, columns } = await read(header(types.map((t) => `{name: c_${t}, datatype: ${t}}`)) +
      `${types.map((t) => `c_${t}`).join(' ')}\n-1 -2 -3 -4 1 2 3 4 0.5 1e3 -2.5e-3 false "a b"\n`);
    expect(src.columns.map((c) => c.kind)).toEqual(['int', 'int', 'int', 'int', 'int', 'int', 'int', 'int', 'float', 'float', 'float', 'bool', 'string']);
    expect(columns.map((c) => c[0])).toEqual([-1, -2, -3, -4, 1, 2, 3, 4, 0.5, 1000, -2.5e-3, false, 'a b']);
  });

  it('reads runs of spaces as one delimiter and "" as null, keeping NaN in float columns', async () => {
    const { columns } = await read(header(['{name: a, datatype: float64}', '{name: b, datatype: string}']) + 'a   b\n  1.5    "x  y"  \nnan ""\n"" z\n');
    expect(columns).toEqual([[1.5, NaN, null], ['x  y', null, 'z']]);
  });

  it('reads a uint64 column beyond 2^53 as exact decimal text', async () => {
    const { src, columns } = await read(header(['{name: id, datatype: uint64}']) + 'id\n18446744073709551615\n7\n');
    expect(src.columns[0]!.kind).toBe('string');
    expect(columns).toEqual([['18446744073709551615', '7']]);
  });

  it('accepts a .csv file that starts with the ECSV signature as ECSV', async () => {
    const { src } = await read(header(['{name: a, unit: Angstrom, datatype: float32}'], ['# delimiter: \',\'']) + 'a\n1\n', 'csv');
    expect(src.format).toBe('ecsv');
    expect(src.columns).toEqual([{ name: 'a', kind: 'float', unit: 'Angstrom', fileType: 'float32' }]);
  });
});
