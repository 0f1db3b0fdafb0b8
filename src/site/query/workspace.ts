/**
 * The SQL workspace's page script: the editor, its examples, running a query, the result
 * table, the CSV export, the query in the URL, and the charts redrawn from the result.
 * A query that arrives in the link (?sql=…) is shown but runs only when the reader asks.
 */
import { CensusDbError, connection, queryCensus, TABLE } from '../db/duckdb.ts';
import type { ResultSet } from '../db/resultSet.ts';
import { sqlIdent } from '../db/sqlIdent.ts';
import { bindDbStatus } from '../db/statusView.ts';
import { catalogColumns } from '../population/catalogColumns.ts';
import { CHART_COLUMNS, chartRows, drawPopulation } from '../population/populationCharts.ts';
import { attachEditorKeys } from './editorKeys.ts';
import { DEFAULT_QUERY } from './exampleQueries.ts';
import { resultCsv } from './resultCsv.ts';
import { ResultTable } from './resultTable.ts';
import { hrefWithSql, sqlFromSearch } from './urlState.ts';

const $ = <T extends HTMLElement>(sel: string): T => document.querySelector<T>(sel)!;

export function startWorkspace(): void {
  const base = document.body.dataset.base ?? '/';
  const root = $<HTMLElement>('[data-workspace]');
  const units = JSON.parse(root.dataset.units ?? '{}') as Record<string, string>;
  const editor = $<HTMLTextAreaElement>('#sql');
  const runButton = $<HTMLButtonElement>('[data-run]');
  const linkButton = $<HTMLButtonElement>('[data-copy-link]');
  const csvButton = $<HTMLButtonElement>('[data-export-csv]');
  const errorBox = $<HTMLElement>('#sql-error');
  const sharedNote = $<HTMLElement>('[data-shared-note]');
  const summary = $<HTMLElement>('[data-result-summary]');
  const charts = $<HTMLElement>('[data-population="manual"]');
  const chartNote = $<HTMLElement>('[data-chart-note]');
  const table = new ResultTable($<HTMLElement>('[data-result-table]'), { units, base });
  let last: ResultSet | null = null;
  // Each run has a number; a run overtaken by a newer one drops its result.
  let generation = 0;

  bindDbStatus($<HTMLElement>('[data-db-status]'));

  const shared = sqlFromSearch(location.search);
  editor.value = shared ?? DEFAULT_QUERY;

  const showError = (message: string | null) => {
    errorBox.hidden = message === null;
    errorBox.textContent = message ?? '';
    editor.setAttribute('aria-invalid', message === null ? 'false' : 'true');
  };

  async function run(byReader = true): Promise<void> {
    const my = ++generation;
    const sql = editor.value.trim();
    if (!sql) {
      showError('The editor is empty: write a query, e.g. SELECT * FROM census LIMIT 10.');
      return;
    }
    runButton.textContent = 'Running…';
    root.setAttribute('aria-busy', 'true');
    sharedNote.hidden = true;
    showError(null);
    const t0 = performance.now();
    try {
      const rs = await queryCensus(sql);
      if (my !== generation) return;
      const ms = performance.now() - t0;
      last = rs;
      table.setResult(rs);
      csvButton.disabled = false;
      summary.textContent = `${rs.numRows.toLocaleString('en')} ${rs.numRows === 1 ? 'row' : 'rows'}, ${rs.names.length} ${rs.names.length === 1 ? 'column' : 'columns'} · ${ms < 1000 ? `${Math.round(ms)} ms` : `${(ms / 1000).toFixed(1)} s`}`;
      summary.dataset.rows = String(rs.numRows);
      summary.dataset.ms = ms.toFixed(1);
      if (byReader) history.replaceState(null, '', hrefWithSql(location.href, editor.value));
      document.dispatchEvent(new CustomEvent('census-result', { detail: { rs, sql } })); // the result chart (src/site/resultChart)
      await redrawCharts(sql, rs, my);
    } catch (err) {
      if (my === generation) showError(err instanceof CensusDbError ? err.message : `The query failed: ${String(err)}`);
    } finally {
      if (my === generation) {
        runButton.textContent = 'Run query';
        root.removeAttribute('aria-busy');
      }
    }
  }

  async function redrawCharts(sql: string, rs: ResultSet, my: number): Promise<void> {
    const idCol = rs.names.indexOf('id');
    if (idCol < 0) {
      chartNote.hidden = false;
      chartNote.textContent = 'The charts draw objects: include the id column in the SELECT to see this result on them.';
      charts.hidden = true;
      return;
    }
    chartNote.hidden = true;
    charts.hidden = false;
    const have = charts.dataset.columns ? (JSON.parse(charts.dataset.columns) as string[]) : await catalogColumns();
    const wanted = CHART_COLUMNS.filter((c) => have.includes(c));
    let rows = chartRows(rs);
    if (!wanted.every((c) => rs.names.includes(c))) {
      // The result lacks some plotted columns: fetch them for the ids it returned.
      const inner = sql.replace(/;\s*$/, '');
      try {
        const full = await queryCensus(
          `SELECT ${wanted.map(sqlIdent).join(', ')} FROM ${TABLE} WHERE id IN (SELECT id FROM (\n${inner}\n) AS result)`,
        );
        if (my !== generation) return;
        rows = chartRows(full);
      } catch {
        // Not a plain SELECT (e.g. DESCRIBE): draw what the result itself has.
      }
    }
    await drawPopulation(charts, rows, { base, settings: charts.dataset.settings ? JSON.parse(charts.dataset.settings) : undefined });
  }

  attachEditorKeys(editor, () => void run());
  runButton.addEventListener('click', () => void run());
  for (const b of document.querySelectorAll<HTMLButtonElement>('[data-example]')) {
    b.addEventListener('click', () => {
      editor.value = b.dataset.example ?? '';
      editor.focus();
      void run();
    });
  }
  linkButton.addEventListener('click', async () => {
    const href = hrefWithSql(location.href, editor.value);
    try {
      await navigator.clipboard.writeText(href);
      linkButton.textContent = 'Link copied';
    } catch {
      history.replaceState(null, '', href);
      linkButton.textContent = 'Link is in the address bar';
    }
    setTimeout(() => (linkButton.textContent = 'Copy link to this query'), 2500);
  });
  csvButton.addEventListener('click', () => {
    if (!last) return;
    const blob = new Blob([resultCsv(last, table.rowOrder())], { type: 'text/csv;charset=utf-8' });
    const a = document.createElement('a');
    a.href = URL.createObjectURL(blob);
    a.download = 'census-query.csv';
    document.body.append(a);
    a.click();
    a.remove();
    setTimeout(() => URL.revokeObjectURL(a.href), 10_000);
  });

  if (shared) {
    sharedNote.hidden = false;
    void connection().catch(() => undefined); // start DuckDB while the reader reads the query
  } else {
    void run(false); // our own default query: show the catalog at once, without touching the URL
  }
}
