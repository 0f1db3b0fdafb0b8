// Puts `const` back into an esbuild bundle: esbuild writes every top-level `const` and `let` of
// the modules it bundles as `var`, and it has no option to keep them. In V8 (Node 20) that is not
// free. A function that reads a module-level `const` (a coefficient, a lookup table) gets the value
// built into its optimized code; a `var` is read from the module's context at every use, and a
// typed array read that way is checked again at every element in a hot loop. In the derive worker
// that cost about an eighth of its CPU time (the ziggurat's tables, log10's coefficients).
//
// A top-level `var` becomes `const` when every name it declares has an initializer and is never
// assigned anywhere in the file (any assignment to a same-named identifier counts, in any scope, so
// a shadowing local keeps the `var`: the check errs towards leaving code as it was). A `const`
// read before its initializer runs throws where the `var` gave `undefined`; only top-level code
// runs while the bundle loads, so loading the bundle once shows whether that happens.
import { createRequire } from 'node:module';

/**
 * The bundle's text with each top-level `var` statement whose names are never reassigned
 * declared `const` instead; everything else byte for byte as it was.
 * @param {string} code - an ES module (an esbuild bundle).
 * @returns {{ code: string, changed: number, kept: string[] }} the new text, how many
 *   statements changed, and the names whose `var` stays (assigned somewhere, or no initializer).
 */
export function topLevelConst(code) {
  const ts = createRequire(import.meta.url)('typescript');
  const sf = ts.createSourceFile('bundle.js', code, ts.ScriptTarget.Latest, true, ts.ScriptKind.JS);

  // Every identifier that is the target of an assignment, an increment or a for-in/of head.
  const assigned = new Set();
  const addTargets = (n) => {
    if (ts.isIdentifier(n)) assigned.add(n.text);
    else if (ts.isParenthesizedExpression(n) || ts.isSpreadElement(n) || ts.isSpreadAssignment(n)) addTargets(n.expression);
    else if (ts.isArrayLiteralExpression(n)) n.elements.forEach(addTargets);
    else if (ts.isObjectLiteralExpression(n)) {
      for (const p of n.properties) {
        if (ts.isShorthandPropertyAssignment(p)) assigned.add(p.name.text);
        else if (ts.isPropertyAssignment(p)) addTargets(p.initializer);
        else if (ts.isSpreadAssignment(p)) addTargets(p.expression);
      }
    } else if (ts.isBinaryExpression(n) && n.operatorToken.kind === ts.SyntaxKind.EqualsToken) addTargets(n.left);
  };
  const visit = (n) => {
    if (ts.isBinaryExpression(n) && n.operatorToken.kind >= ts.SyntaxKind.FirstAssignment && n.operatorToken.kind <= ts.SyntaxKind.LastAssignment) addTargets(n.left);
    else if ((ts.isPrefixUnaryExpression(n) || ts.isPostfixUnaryExpression(n)) && (n.operator === ts.SyntaxKind.PlusPlusToken || n.operator === ts.SyntaxKind.MinusMinusToken)) addTargets(n.operand);
    else if ((ts.isForInStatement(n) || ts.isForOfStatement(n)) && !ts.isVariableDeclarationList(n.initializer)) addTargets(n.initializer);
    ts.forEachChild(n, visit);
  };
  visit(sf);

  const edits = [];
  const kept = [];
  for (const stmt of sf.statements) {
    if (!ts.isVariableStatement(stmt)) continue;
    const list = stmt.declarationList;
    if ((list.flags & ts.NodeFlags.BlockScoped) !== 0) continue;
    const names = list.declarations.map((d) => (ts.isIdentifier(d.name) ? d.name.text : null));
    const ok = list.declarations.every((d, i) => names[i] !== null && d.initializer !== undefined && !assigned.has(names[i]));
    if (!ok) {
      kept.push(...names.filter((x) => x !== null));
      continue;
    }
    const start = list.getStart(sf);
    if (code.slice(start, start + 3) !== 'var') throw new Error(`topLevelConst: expected "var" at offset ${start}`);
    edits.push(start);
  }
  let out = '';
  let at = 0;
  for (const start of edits) {
    out += code.slice(at, start) + 'const';
    at = start + 3;
  }
  out += code.slice(at);
  return { code: out, changed: edits.length, kept };
}
