import { describe, expect, it } from 'vitest';
import { OUTSIDE_MESSAGE, READ_ONLY_MESSAGE, statementProblem, statementWords } from '../../../src/site/db/statementGate.ts';

describe('the statement gate for visitor SQL', () => {
  it('lets reading statements through', () => {
    for (const sql of [
      'SELECT * FROM census',
      '  select id from census;',
      'WITH t AS (SELECT id, z FROM census) SELECT * FROM t',
      'FROM census SELECT id',
      '(SELECT 1) UNION ALL (SELECT 2)',
      'DESCRIBE census',
      'SUMMARIZE census',
      'EXPLAIN SELECT * FROM census',
      "SELECT * REPLACE (round(z, 1) AS z) FROM census",
      'SELECT 1; SELECT 2',
    ]) {
      expect(statementProblem(sql), sql).toBeNull();
    }
  });

  it('answers DROP, CREATE and other changes with the read-only message', () => {
    for (const sql of ['DROP TABLE census', 'create table t as select 1', 'SELECT 1; DELETE FROM census', 'INSERT INTO census VALUES (1)', 'ALTER TABLE census ADD COLUMN x INT', 'WITH t AS (SELECT 1) INSERT INTO census SELECT * FROM t', 'EXPLAIN ANALYZE DROP TABLE census']) {
      expect(statementProblem(sql), sql).toBe(READ_ONLY_MESSAGE);
    }
  });

  it('answers ATTACH, COPY, INSTALL and LOAD with the message that nothing outside is reached', () => {
    for (const sql of ["ATTACH 'https://example.org/x.duckdb' AS x", "COPY census TO 'out.csv'", 'INSTALL httpfs', 'LOAD httpfs', "EXPORT DATABASE 'x'"]) {
      expect(statementProblem(sql), sql).toBe(OUTSIDE_MESSAGE);
    }
  });

  it('refuses settings changes in plain words', () => {
    expect(statementProblem('SET enable_external_access = true')).toMatch(/“SET” is not available/);
    expect(statementProblem("PRAGMA enable_profiling")).toMatch(/“PRAGMA” is not available/);
  });

  it('is not fooled by words inside strings, quoted names and comments', () => {
    expect(statementProblem("SELECT 'DROP TABLE census' AS s")).toBeNull();
    expect(statementProblem('SELECT "delete" FROM census')).toBeNull();
    expect(statementProblem('-- DROP TABLE census\nSELECT 1')).toBeNull();
    expect(statementProblem('/* ; DROP TABLE census; */ SELECT 1')).toBeNull();
    expect(statementProblem("SELECT 'it''s'; DROP TABLE census")).toBe(READ_ONLY_MESSAGE);
    expect(statementProblem('SELECT $$ ; drop $$')).toBeNull();
  });

  it('splits statements at semicolons outside strings and keeps only depth-0 words', () => {
    expect(statementWords("SELECT a FROM (SELECT b FROM c); SELECT ';'").map((s) => s.words)).toEqual([
      ['SELECT', 'A', 'FROM', '('],
      ['SELECT', '<string>'],
    ]);
  });
});
