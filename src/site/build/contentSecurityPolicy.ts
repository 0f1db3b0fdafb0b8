/**
 * The Content-Security-Policy every page carries as a `<meta http-equiv>` tag (a meta tag
 * works on any static host). Scripts come only from the site itself, plus the permission
 * WebAssembly needs to compile DuckDB ('wasm-unsafe-eval'), plus the SHA-256 hash of each
 * inline script Astro wrote into that page: the layout writes a placeholder, and after the
 * build `applyPolicy` replaces it with the page's hashes (astro.config.mjs). Requests go only
 * to the site itself. Styles may be inline: Observable Plot writes a `<style>` element and
 * style attributes into every chart, and styles cannot run code.
 */
import { createHash } from 'node:crypto';

/** Stands in the layout's policy where the build puts the inline scripts' hashes. */
export const SCRIPT_HASHES_PLACEHOLDER = "'census-inline-script-hashes'";

/** The policy with `scriptHashes` (already quoted 'sha256-…' sources) in script-src. */
export function contentSecurityPolicy(scriptHashes: readonly string[] | string): string {
  const hashes = typeof scriptHashes === 'string' ? scriptHashes : scriptHashes.join(' ');
  return [
    "default-src 'self'",
    `script-src 'self' 'wasm-unsafe-eval'${hashes ? ' ' + hashes : ''}`,
    "worker-src 'self'",
    "connect-src 'self'",
    "img-src 'self' data: blob:",
    "style-src 'self' 'unsafe-inline'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
  ].join('; ');
}

const INLINE_SCRIPT = /<script\b([^>]*)>([\s\S]*?)<\/script>/gi;

/** The 'sha256-…' sources of the inline scripts of `html` (data blocks such as application/json excluded). */
export function inlineScriptHashes(html: string): string[] {
  const out = new Set<string>();
  for (const m of html.matchAll(INLINE_SCRIPT)) {
    const attrs = m[1]!;
    if (/\bsrc\s*=/i.test(attrs)) continue;
    const type = /\btype\s*=\s*["']?([^"'\s>]+)/i.exec(attrs)?.[1]?.toLowerCase();
    if (type && type !== 'module' && type !== 'text/javascript' && type !== 'application/javascript') continue;
    out.add(`'sha256-${createHash('sha256').update(m[2]!, 'utf8').digest('base64')}'`);
  }
  return [...out];
}

/**
 * The page with the placeholder replaced by its inline scripts' hashes. Throws when the page
 * has no policy, so a page that bypasses the layout fails the build instead of going out unprotected.
 */
export function applyPolicy(html: string, file: string): string {
  if (!html.includes(SCRIPT_HASHES_PLACEHOLDER)) {
    throw new Error(`${file}: the page has no Content-Security-Policy meta tag (is it built from src/layouts/Base.astro?)`);
  }
  const hashes = inlineScriptHashes(html);
  return html.replace(SCRIPT_HASHES_PLACEHOLDER, hashes.join(' ')).replace(/'wasm-unsafe-eval' ;/, "'wasm-unsafe-eval';");
}
