import { describe, expect, it } from 'vitest';
// The hook is plain JavaScript (Node runs it in its module-loader thread); its logic is tested here
// with a stand-in for Node's next resolver.
import { initialize, isBareSpecifier, resolve } from '../../../src/catalog/cli/siteResolveHook.mjs';

type Next = (specifier: string, context: { parentURL?: string }) => Promise<{ url: string }>;

const PACKAGE = 'file:///opt/tool/node_modules/dawn-census/';
const notFound = (specifier: string): Error => Object.assign(new Error(`Cannot find package '${specifier}'`), { code: 'ERR_MODULE_NOT_FOUND' });

/** A resolver that finds `piccolore` only from inside the package, and `./x.mjs` anywhere. */
const calls: { specifier: string; parentURL?: string }[] = [];
const next: Next = async (specifier, context) => {
  calls.push({ specifier, parentURL: context.parentURL });
  if (specifier === 'piccolore' && context.parentURL?.startsWith(PACKAGE)) return { url: `${PACKAGE}node_modules/piccolore/index.js` };
  if (specifier.startsWith('./')) return { url: new URL(specifier, context.parentURL).href };
  throw notFound(specifier);
};

describe('siteResolveHook', () => {
  initialize({ packageRootUrl: PACKAGE.slice(0, -1) });

  it('tells package names from paths and URLs', () => {
    expect(isBareSpecifier('piccolore')).toBe(true);
    expect(isBareSpecifier('@duckdb/node-api')).toBe(true);
    for (const s of ['./a.mjs', '../b.mjs', '/abs/c.mjs', 'node:fs', 'file:///x.mjs', 'data:text/javascript,1', '#internal']) expect(isBareSpecifier(s)).toBe(false);
  });

  it("looks a package name up again from the package's folder when a built page outside it cannot find it", async () => {
    calls.length = 0;
    const r = await resolve('piccolore', { parentURL: 'file:///home/group/data/dist/pages/404.astro.mjs' }, next);
    expect(r.url).toBe(`${PACKAGE}node_modules/piccolore/index.js`);
    expect(calls.map((c) => c.parentURL)).toEqual(['file:///home/group/data/dist/pages/404.astro.mjs', `${PACKAGE}package.json`]);
  });

  it('leaves a name found the first time as it is (one look-up)', async () => {
    calls.length = 0;
    const r = await resolve('./chunk.mjs', { parentURL: 'file:///home/group/data/dist/pages/index.astro.mjs' }, next);
    expect(r.url).toBe('file:///home/group/data/dist/pages/chunk.mjs');
    expect(calls).toHaveLength(1);
  });

  it('reports the first error when the package cannot find the name either', async () => {
    await expect(resolve('no-such-package', { parentURL: 'file:///home/group/data/dist/pages/a.mjs' }, next)).rejects.toThrow(/no-such-package/);
  });

  it('does not retry inside the package, for relative paths, or for other errors', async () => {
    calls.length = 0;
    await expect(resolve('missing', { parentURL: `${PACKAGE}lib/x.js` }, next)).rejects.toThrow(/missing/);
    await expect(resolve('./gone.mjs', { parentURL: 'file:///data/dist/a.mjs' }, async () => Promise.reject(notFound('./gone.mjs')))).rejects.toThrow(/gone/);
    const other = Object.assign(new Error('bad'), { code: 'ERR_INVALID_URL' });
    await expect(resolve('piccolore', { parentURL: 'file:///data/dist/a.mjs' }, async () => Promise.reject(other))).rejects.toBe(other);
    expect(calls).toHaveLength(1);
  });
});
