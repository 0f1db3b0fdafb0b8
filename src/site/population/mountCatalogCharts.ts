/**
 * Draws the population charts of a page from the whole catalog (landing and object pages):
 * asks DuckDB-WASM for the chart columns the catalog has, then hands the rows to the charts.
 */
import { connection, queryCensus, TABLE, CensusDbError } from '../db/duckdb.ts';
import { sqlIdent } from '../db/sqlIdent.ts';
import { catalogColumns } from './catalogColumns.ts';
import { CHART_COLUMNS, chartRows, DENSE_COLUMNS_BY_CHART, NARROW_ABOVE, drawChart, drawPopulation, nextPaint } from './populationCharts.ts';

export async function mountCatalogCharts(root: HTMLElement): Promise<void> {
  const base = document.body.dataset.base ?? '/';
  const highlight = root.dataset.highlight;
  const settings = root.dataset.settings ? (JSON.parse(root.dataset.settings) as Record<string, unknown>) : undefined;
  try {
    performance.mark('census:charts-start');
    // The build wrote the catalog's columns on the mount; ask DuckDB only when it did not.
    const have = root.dataset.columns ? (JSON.parse(root.dataset.columns) as string[]) : await catalogColumns();
    await connection();
    performance.mark('census:db-ready');
    const objects = Number(root.dataset.objects ?? '0');
    const options = { base, settings, highlightIds: highlight ? [highlight] : undefined };
    if (objects > NARROW_ABOVE) {
      // A large catalog: each chart asks only for its own columns, so the first is drawn sooner.
      for (const mount of root.querySelectorAll<HTMLElement>('[data-chart]')) {
        const cols = (DENSE_COLUMNS_BY_CHART[mount.dataset.chart ?? ''] ?? CHART_COLUMNS).filter((c) => have.includes(c));
        const rs = await queryCensus(`SELECT ${cols.map(sqlIdent).join(', ')} FROM ${TABLE}`);
        await nextPaint();
        drawChart(mount, chartRows(rs), options);
      }
    } else {
      const cols = CHART_COLUMNS.filter((c) => have.includes(c));
      const rs = await queryCensus(`SELECT ${cols.map(sqlIdent).join(', ')} FROM ${TABLE}`);
      performance.mark('census:rows');
      await drawPopulation(root, chartRows(rs), options);
    }
    performance.mark('census:drawn');
  } catch (err) {
    // The status line above the charts says what went wrong with the database; say it here too.
    const message = err instanceof CensusDbError ? err.message : `The charts could not be drawn: ${String(err)}`;
    for (const mount of root.querySelectorAll<HTMLElement>('[data-chart]')) {
      const p = document.createElement('p');
      p.className = 'chart-note';
      p.textContent = message;
      mount.replaceChildren(p);
    }
  }
}
