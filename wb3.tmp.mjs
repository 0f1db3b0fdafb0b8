import { DuckDBInstance } from '@duckdb/node-api';
const inst = await DuckDBInstance.create(':memory:', { threads: '1' });
const con = await inst.connect();
await con.run(`CREATE TABLE rows AS SELECT 'SYN-' || i AS id, ${Array.from({ length: 44 }, (_, k) => `random()*10 + i AS c${k}`).join(', ')}, CASE WHEN i % 7 = 0 THEN 'x' ELSE '' END AS flags, i % 2 = 0 AS b, i::BIGINT AS r FROM range(20000) t(i)`);
for (const opt of ['', ', DICTIONARY_SIZE_LIMIT 1', ', COMPRESSION_LEVEL 1', ', ROW_GROUP_SIZE 10000', '', ', DICTIONARY_SIZE_LIMIT 1']) {
  const t = performance.now();
  try { await con.run(`COPY rows TO '/tmp/wb3.parquet' (FORMAT parquet, COMPRESSION zstd${opt})`); } catch (e) { console.log(opt, e.message); continue; }
  const sz = (await con.runAndReadAll(`select sum(total_compressed_size) from parquet_metadata('/tmp/wb3.parquet')`)).getRows()[0][0];
  console.log(JSON.stringify(opt), (performance.now() - t).toFixed(0), 'ms', sz);
}
