import { DuckDBInstance, DuckDBDataChunk, DOUBLE, VARCHAR } from '@duckdb/node-api';
import fs from 'node:fs';
const ncol = 48, rows = 20000;
for (const where of ['/tmp/wbx/rows.duckdb', ':memory:', '/tmp/wbx/rows.duckdb', ':memory:']) {
  fs.rmSync('/tmp/wbx', { recursive: true, force: true }); fs.mkdirSync('/tmp/wbx');
  const t0 = performance.now();
  const inst = await DuckDBInstance.create(where, { threads: '1', preserve_insertion_order: 'true', memory_limit: '128MB' });
  const con = await inst.connect();
  await con.run('PRAGMA disable_checkpoint_on_shutdown');
  await con.run(`CREATE TABLE rows (id VARCHAR, ${Array.from({ length: ncol - 1 }, (_, i) => `c${i} DOUBLE`).join(', ')})`);
  await con.run('BEGIN TRANSACTION');
  const app = await con.createAppender('rows');
  const types = [VARCHAR, ...Array.from({ length: ncol - 1 }, () => DOUBLE)];
  const chunk = DuckDBDataChunk.create(types, 2048);
  let tf = 0, ta = 0;
  for (let base = 0; base < rows; base += 2048) {
    const n = Math.min(2048, rows - base);
    const ta0 = performance.now();
    const vecs = types.map((_, i) => chunk.getColumnVector(i));
    for (let r = 0; r < n; r++) { vecs[0].setItem(r, 'SYN-' + (base + r)); for (let i = 1; i < ncol; i++) vecs[i].setItem(r, Math.random() + r); }
    for (const v of vecs) v.flush();
    chunk.rowCount = n;
    app.appendDataChunk(chunk);
    const t1 = performance.now(); ta += t1 - ta0;
    app.flushSync(); tf += performance.now() - t1;
    chunk.reset(); chunk.rowCount = 2048;
  }
  app.closeSync(); await con.run('COMMIT');
  const t2 = performance.now();
  await con.run(`COPY rows TO '/tmp/wbx/out.parquet' (FORMAT parquet, COMPRESSION zstd)`);
  const t3 = performance.now();
  con.closeSync(); inst.closeSync();
  console.log(where, 'fill', ta.toFixed(0), 'flush', tf.toFixed(0), 'copy', (t3 - t2).toFixed(0), 'close', (performance.now() - t3).toFixed(0), 'total', (performance.now() - t0).toFixed(0));
}
