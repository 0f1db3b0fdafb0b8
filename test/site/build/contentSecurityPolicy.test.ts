import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { applyPolicy, contentSecurityPolicy, inlineScriptHashes, SCRIPT_HASHES_PLACEHOLDER } from '../../../src/site/build/contentSecurityPolicy.ts';

const page = (body: string) => `<html><head><meta http-equiv="Content-Security-Policy" content="${contentSecurityPolicy(SCRIPT_HASHES_PLACEHOLDER)}"></head><body>${body}</body></html>`;

describe('the Content-Security-Policy of the pages', () => {
  it('allows scripts and connections only from the site itself, plus WebAssembly compilation', () => {
    const p = contentSecurityPolicy([]);
    expect(p).toContain("default-src 'self'");
    expect(p).toContain("script-src 'self' 'wasm-unsafe-eval';");
    expect(p).toContain("connect-src 'self'");
    expect(p).not.toMatch(/unsafe-eval'[^;]*unsafe-inline|script-src[^;]*unsafe-inline/);
  });

  it('hashes each inline script with SHA-256 and skips external scripts and data blocks', () => {
    const code = 'console.log(1)';
    // SHA-256 of the script text, base64: the CSP3 hash-source form (computed with node:crypto).
    const expected = `'sha256-${createHash('sha256').update(code).digest('base64')}'`;
    const html = `<script type="module">${code}</script><script type="module" src="/a.js"></script><script type="application/json">{"a":1}</script>`;
    expect(inlineScriptHashes(html)).toEqual([expected]);
  });

  it('puts the page’s hashes into the policy', () => {
    const out = applyPolicy(page('<script>alert(1)</script>'), 'index.html');
    expect(out).not.toContain(SCRIPT_HASHES_PLACEHOLDER);
    expect(out).toMatch(/script-src 'self' 'wasm-unsafe-eval' 'sha256-[A-Za-z0-9+/=]+'/);
    expect(applyPolicy(page(''), 'index.html')).toContain("script-src 'self' 'wasm-unsafe-eval';");
  });

  it('fails the build for a page without the policy', () => {
    expect(() => applyPolicy('<html><body></body></html>', 'stray/index.html')).toThrow(/stray\/index.html: the page has no Content-Security-Policy/);
  });
});
