import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { topLevelConst } from '../../../scripts/lib/topLevelConst.mjs';

type Result = { code: string; changed: number; kept: string[] };
const run = (code: string): Result => topLevelConst(code) as Result;

describe('topLevelConst', () => {
  it('declares a top-level var const when its names are never assigned, and leaves every other byte as it was', () => {
    const code = 'var A = new Float64Array(4);\nvar B = 2, C = B * 3;\nfunction f() { A[0] = B; return C; }\nexport { f };\n';
    const r = run(code);
    expect(r.code).toBe('const A = new Float64Array(4);\nconst B = 2, C = B * 3;\nfunction f() { A[0] = B; return C; }\nexport { f };\n');
    expect(r.changed).toBe(2);
    expect(r.kept).toEqual([]);
  });

  it.each([
    ['a plain assignment', 'x = 2;'],
    ['a compound assignment', 'x += 2;'],
    ['a logical assignment', 'x ??= 2;'],
    ['an increment', 'x++;'],
    ['a prefix decrement', '--x;'],
    ['an array destructuring', '[x] = [2];'],
    ['an object destructuring (shorthand)', '({ x } = { x: 2 });'],
    ['an object destructuring (renamed)', '({ y: x } = { y: 2 });'],
    ['a destructuring default', '[x = 3] = [];'],
    ['a rest element', '[...x] = [];'],
    ['a for-of head', 'for (x of [1]) ;'],
    ['a for-in head', 'for (x in {}) ;'],
    ['an assignment inside a function', 'function g() { x = 2; }'],
    ['an assignment to a shadowing local of the same name (kept: the check errs towards var)', 'function g() { let x = 1; x = 2; return x; }'],
  ])('keeps var for a name the file assigns by %s', (_what, statement) => {
    const code = `var x = 1;\nvar keep = 5;\n${statement}\n`;
    const r = run(code);
    expect(r.code).toBe(`var x = 1;\nconst keep = 5;\n${statement}\n`);
    expect(r.kept).toEqual(['x']);
  });

  it('keeps a declaration without an initializer, and a whole statement when one of its names is assigned', () => {
    const r = run('var a;\nvar b = 1, c = 2;\nc = 3;\nvar d = 4;\n');
    expect(r.code).toBe('var a;\nvar b = 1, c = 2;\nc = 3;\nconst d = 4;\n');
    expect(r.kept).toEqual(['a', 'b', 'c']);
  });

  it('leaves vars inside functions and blocks, let and const, and property writes alone', () => {
    const code = 'let L = 1;\nconst K = 2;\n{ var inBlock = 3; }\nfunction f() { var local = 4; return local; }\nvar o = {};\no.x = 1;\n';
    const r = run(code);
    expect(r.code).toBe(code.replace('var o', 'const o'));
    expect(r.changed).toBe(1);
  });

  it('leaves the word var in strings, comments and property names alone', () => {
    const code = '// var in a comment\nvar s = "var t = 1";\nvar o = { var: 1 };\n';
    expect(run(code).code).toBe('// var in a comment\nconst s = "var t = 1";\nconst o = { var: 1 };\n');
  });

  it('makes a bundle that throws where a const is read before its initializer runs (loading the bundle shows it)', () => {
    const r = run('function f() { return T; }\nvar early = f();\nvar T = 1;\nexport { early };\n');
    expect(r.changed).toBe(2);
    expect(() => new Function(r.code.replace('export { early };', ''))()).toThrow(ReferenceError);
  });
});

describe('the bundles built by scripts/build-cli.mjs', () => {
  it.each(['lib/catalog/derive/deriveWorker.bundle.js', 'lib/catalog/cli/deriveCommand.bundle.js'])(
    '%s keeps var only for names it assigns: the tables and coefficients of the hot loops are const',
    (file) => {
      const text = readFileSync(new URL(`../../../${file}`, import.meta.url), 'utf8');
      // Building again changes nothing: every var left is one the file assigns.
      const again = run(text);
      expect(again.changed).toBe(0);
      const vars = [...text.matchAll(/^var ([\w$]+)/gm)].map((m) => m[1]);
      expect(vars.length).toBeLessThan(10);
      const consts = [...text.matchAll(/^const ([\w$]+)/gm)].map((m) => m[1]);
      expect(consts.length).toBeGreaterThan(100);
      if (file.includes('deriveWorker')) for (const name of ['X', 'RATIO', 'LG1', 'POW2']) expect(consts).toContain(name);
    },
  );
});
