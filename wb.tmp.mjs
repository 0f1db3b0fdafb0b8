import { openParquetWriter } from './lib/catalog/parquet/parquetWriter.js';
import { DuckDBAppender } from '@duckdb/node-api';
const cols = [{ name: 'id', kind: 'string' }, ...Array.from({ length: 44 }, (_, i) => ({ name: 'c' + i, kind: 'float' })), { name: 'flags', kind: 'string' }, { name: 'b', kind: 'bool' }, { name: 'r', kind: 'int' }];
let tf = 0; const orig = DuckDBAppender.prototype.flushSync;
DuckDBAppender.prototype.flushSync = function () { const t = performance.now(); orig.call(this); tf += performance.now() - t; };
for (const mem of [false, true]) {
  tf = 0;
  const t0 = performance.now();
  const w = await openParquetWriter('/tmp/wb.parquet', cols, { scratchDir: '/tmp/wbscratch' + mem });
  const vals = new Array(cols.length);
  for (let r = 0; r < 20000; r++) {
    vals[0] = 'SYN-' + r; for (let i = 1; i < 45; i++) vals[i] = Math.random() * 10 + r; vals[45] = r % 7 ? '' : 'x'; vals[46] = r % 2 === 0; vals[47] = r;
    w.appendRow(vals);
  }
  const t1 = performance.now();
  await w.finish({ a: 'b' });
  const t2 = performance.now();
  console.log('append', (t1 - t0).toFixed(0), 'ms (flushSync', tf.toFixed(0), ') finish', (t2 - t1).toFixed(0));
}
