/**
 * The SQL workspace's page script: the editor, its examples, running a query (with a Cancel
 * button, a timeout and a cap on the rows kept), the result table, the CSV export (streamed in
 * full when the result was capped), the query in the URL, and the charts redrawn from the
 * result. A query that arrives in the link (?sql=…) is shown but runs only when the reader asks.
 * The last result is published through lastResult.ts for anything else that uses it.
 */
import { CensusDbError, connection, ROW_CAP, runVisitorQuery, streamVisitorQuery, TABLE } from '../db/duckdb.ts';
import { errorPosition } from '../db/errorPosition.ts';
import type { ResultSet } from '../db/resultSet.ts';
import { sqlIdent } from '../db/sqlIdent.ts';
import { bindDbStatus } from '../db/statusView.ts';
import { catalogColumns } from '../population/catalogColumns.ts';
import { CHART_COLUMNS, chartRows, drawPopulation } from '../population/populationCharts.ts';
import { DEFAULT_QUERY } from './exampleQueries.ts';
import { attachResultDownloads, resultCsvWithHeader, type ResultContext } from './resultDownloads.ts';
import { lastResult, markStale, onResult, publishResult } from './lastResult.ts';
import { resultCsv, resultCsvHeader, resultCsvLines } from './resultCsv.ts';
import { ResultTable } from './resultTable.ts';
import { createSqlEditor, type ColumnInfo } from './sqlEditor.ts';
import { hrefWithSql, sqlFromSearch } from './urlState.ts';

const $ = <T extends HTMLElement>(sel: string): T => document.querySelector<T>(sel)!;

const duration = (ms: number) => (ms < 1000 ? `${Math.round(ms)} ms` : `${(ms / 1000).toFixed(1)} s`);

export function startWorkspace(): void {
  const base = document.body.dataset.base ?? '/';
  const root = $<HTMLElement>('[data-workspace]');
  const units = JSON.parse(root.dataset.units ?? '{}') as Record<string, string>;
  const columns = JSON.parse(root.dataset.columnInfo ?? '[]') as ColumnInfo[];
  const runButton = $<HTMLButtonElement>('[data-run]');
  const cancelButton = $<HTMLButtonElement>('[data-cancel]');
  const linkButton = $<HTMLButtonElement>('[data-copy-link]');
  const csvButton = $<HTMLButtonElement>('[data-export-csv]');
  const errorBox = $<HTMLElement>('#sql-error');
  const sharedNote = $<HTMLElement>('[data-shared-note]');
  const summary = $<HTMLElement>('[data-result-summary]');
  const capNote = $<HTMLElement>('[data-cap-note]');
  const staleNote = $<HTMLElement>('[data-stale-note]');
  const resultBox = $<HTMLElement>('[data-result]');
  const charts = $<HTMLElement>('[data-population="manual"]');
  const chartNote = $<HTMLElement>('[data-chart-note]');
  const table = new ResultTable($<HTMLElement>('[data-result-table]'), { units, base });
  const context = JSON.parse(root.dataset.resultContext ?? 'null') as ResultContext | null;
  // Each run has a number; a run overtaken by a newer one drops its result.
  let generation = 0;
  let running: AbortController | null = null;

  bindDbStatus($<HTMLElement>('[data-db-status]'));

  const textarea = $<HTMLTextAreaElement>('#sql');
  const shared = sqlFromSearch(location.search);
  textarea.value = shared ?? DEFAULT_QUERY;
  const editor = createSqlEditor(textarea, { columns, table: TABLE, run: () => void run() });

  const showError = (message: string | null, sql = '', raw?: string) => {
    errorBox.hidden = message === null;
    editor.view.contentDOM.setAttribute('aria-invalid', message === null ? 'false' : 'true');
    if (message === null) {
      errorBox.textContent = '';
      delete errorBox.dataset.position;
      editor.markError(null);
      return;
    }
    const at = raw ? errorPosition(raw, sql) : null;
    errorBox.textContent = at ? `${message} (line ${at.line}, column ${at.column})` : message;
    if (at) errorBox.dataset.position = String(at.from);
    else delete errorBox.dataset.position;
    editor.markError(at ? at.from : null, message);
  };

  onResult((r) => {
    staleNote.hidden = !r?.stale;
    resultBox.classList.toggle('stale', Boolean(r?.stale));
    resultBox.toggleAttribute('data-stale', Boolean(r?.stale));
    charts.classList.toggle('stale', Boolean(r?.stale));
    csvButton.disabled = !r || r.stale;
  });

  const setRunning = (on: boolean) => {
    runButton.textContent = on ? 'Running…' : 'Run query';
    runButton.disabled = on;
    cancelButton.hidden = !on;
    cancelButton.disabled = !on;
    if (on) root.setAttribute('aria-busy', 'true');
    else root.removeAttribute('aria-busy');
  };

  async function run(byReader = true): Promise<void> {
    const my = ++generation;
    const sql = editor.value().trim();
    if (!sql) {
      showError('The editor is empty: write a query, e.g. SELECT * FROM census LIMIT 10.');
      return;
    }
    running?.abort();
    const controller = new AbortController();
    running = controller;
    setRunning(true);
    sharedNote.hidden = true;
    showError(null);
    const t0 = performance.now();
    try {
      const { result: rs, truncated } = await runVisitorQuery(sql, { signal: controller.signal });
      if (my !== generation) return;
      const ms = performance.now() - t0;
      table.setResult(rs);
      publishResult({ sql, result: rs, truncated, stale: false });
      summary.textContent = `${rs.numRows.toLocaleString('en')}${truncated ? ' (first)' : ''} ${rs.numRows === 1 ? 'row' : 'rows'}, ${rs.names.length} ${rs.names.length === 1 ? 'column' : 'columns'} · ${duration(ms)}`;
      summary.dataset.rows = String(rs.numRows);
      summary.dataset.ms = ms.toFixed(1);
      capNote.hidden = !truncated;
      capNote.textContent = truncated
        ? `The query returned more than ${ROW_CAP.toLocaleString('en')} rows: the first ${ROW_CAP.toLocaleString('en')} are shown. “Download result as CSV” runs the query again and saves every row.`
        : '';
      if (byReader) history.replaceState(null, '', hrefWithSql(location.href, editor.value()));
      document.dispatchEvent(new CustomEvent('census-result', { detail: { rs, sql } })); // the result chart (src/site/resultChart)
      await redrawCharts(sql, rs, my, controller.signal);
    } catch (err) {
      if (my !== generation) return;
      markStale();
      if (err instanceof CensusDbError) showError(err.message, sql, err.raw);
      else showError(`The query failed: ${String(err)}`);
    } finally {
      if (my === generation) {
        running = null;
        setRunning(false);
      }
    }
  }

  async function redrawCharts(sql: string, rs: ResultSet, my: number, signal: AbortSignal): Promise<void> {
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
      // The result lacks some plotted columns: fetch them for the ids it returned (as many as the table holds).
      const inner = sql.replace(/;\s*$/, '');
      try {
        const { result: full } = await runVisitorQuery(
          `SELECT ${wanted.map(sqlIdent).join(', ')} FROM ${TABLE} WHERE id IN (SELECT id FROM (\n${inner}\n) AS result LIMIT ${ROW_CAP})`,
          { signal },
        );
        if (my !== generation) return;
        rows = chartRows(full);
      } catch {
        // Not a plain SELECT (e.g. DESCRIBE), or stopped: draw what the result itself has.
      }
    }
    await drawPopulation(charts, rows, { base, settings: charts.dataset.settings ? JSON.parse(charts.dataset.settings) : undefined });
  }

  runButton.addEventListener('click', () => void run());
  cancelButton.addEventListener('click', () => running?.abort());
  for (const b of document.querySelectorAll<HTMLButtonElement>('[data-example]')) {
    b.addEventListener('click', () => {
      editor.setValue(b.dataset.example ?? '');
      editor.focus();
      void run();
    });
  }
  linkButton.addEventListener('click', async () => {
    const href = hrefWithSql(location.href, editor.value());
    try {
      await navigator.clipboard.writeText(href);
      linkButton.textContent = 'Link copied';
    } catch {
      history.replaceState(null, '', href);
      linkButton.textContent = 'Link is in the address bar';
    }
    setTimeout(() => (linkButton.textContent = 'Copy link to this query'), 2500);
  });
  csvButton.addEventListener('click', () => void downloadCsv());

  async function downloadCsv(): Promise<void> {
    const r = lastResult();
    if (!r || r.stale) return;
    let blob: Blob;
    if (!r.truncated) {
      // With the catalog's context the CSV opens with # lines: the query, the catalog's hash, units and meanings.
      const text = context ? resultCsvWithHeader(r.result, r.sql, context, table.rowOrder()) : resultCsv(r.result, table.rowOrder());
      blob = new Blob([text], { type: 'text/csv;charset=utf-8' });
    } else {
      // Every row: run the query again and write its batches as they come (rows in the query's order).
      const head = context ? resultCsvWithHeader({ ...r.result, numRows: 0 }, r.sql, context) : resultCsvHeader(r.result.names);
      const parts: string[] = [head];
      let rows = 0;
      csvButton.disabled = true;
      csvButton.textContent = 'Preparing the CSV…';
      try {
        await streamVisitorQuery(r.sql, (b) => {
          parts.push(resultCsvLines(b));
          rows += b.numRows;
          csvButton.textContent = `Preparing the CSV… ${rows.toLocaleString('en')} rows`;
        }, { timeoutMs: 10 * 60_000 });
      } catch (err) {
        showError(err instanceof CensusDbError ? err.message : String(err));
        return;
      } finally {
        csvButton.disabled = false;
        csvButton.textContent = 'Download result as CSV';
      }
      blob = new Blob(parts, { type: 'text/csv;charset=utf-8' });
    }
    const a = document.createElement('a');
    a.href = URL.createObjectURL(blob);
    a.download = 'census-query.csv';
    document.body.append(a);
    a.click();
    a.remove();
    setTimeout(() => URL.revokeObjectURL(a.href), 10_000);
  }

  if (context) {
    attachResultDownloads(csvButton, context, () => {
      const r = lastResult();
      return r && !r.stale ? { rs: r.result, sql: r.sql, order: table.rowOrder() } : null;
    });
  }

  if (shared) {
    sharedNote.hidden = false;
    void connection().catch(() => undefined); // start DuckDB while the reader reads the query
  } else {
    void run(false); // our own default query: show the catalog at once, without touching the URL
  }
}
