/**
 * A small static file server for the built site: serves dist/ under the site's base path,
 * with the MIME types DuckDB-WASM needs (application/wasm) and HTTP Range requests, which
 * DuckDB-WASM uses to read Parquet over HTTP (RFC 9110 §14). Used by `npm start`, the
 * end-to-end tests and the site benchmark; a real deployment uses any static host.
 */
import { createServer, type Server } from 'node:http';
import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { extname, join, normalize, sep } from 'node:path';

const MIME: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.wasm': 'application/wasm',
  '.parquet': 'application/vnd.apache.parquet',
  '.csv': 'text/csv; charset=utf-8',
  '.txt': 'text/plain; charset=utf-8',
  '.woff2': 'font/woff2',
  '.map': 'application/json',
};

export interface StaticServer {
  server: Server;
  /** Root URL of the site, ending in the base path, e.g. http://127.0.0.1:4321/census/ */
  url: string;
  /** Requests served, for benchmarks: path and bytes sent. */
  log: { path: string; bytes: number }[];
  close(): Promise<void>;
}

/** Serves `root` under `base` (which starts and ends with '/') on 127.0.0.1:`port` (0 = any free port). */
/** The preview's port cannot be had (in use, or refused): the CLI prints it in one line (exit 64). */
export class PortUnavailable extends Error {
  override name = 'PortUnavailable';
}

export async function serveStatic(root: string, base = '/', port = 0): Promise<StaticServer> {
  const log: { path: string; bytes: number }[] = [];
  const server = createServer(async (req, res) => {
    try {
      const url = new URL(req.url ?? '/', 'http://localhost');
      let path = decodeURIComponent(url.pathname);
      if (!path.startsWith(base)) {
        if (path === base.slice(0, -1)) {
          res.writeHead(301, { location: base }).end();
          return;
        }
        res.writeHead(404, { 'content-type': 'text/plain' }).end('not found');
        return;
      }
      path = path.slice(base.length);
      const file = normalize(join(root, path));
      if (!file.startsWith(normalize(root + sep)) && file !== normalize(root)) {
        res.writeHead(403).end();
        return;
      }
      let target = file;
      let info = await stat(target).catch(() => null);
      if (info?.isDirectory()) {
        target = join(target, 'index.html');
        info = await stat(target).catch(() => null);
      }
      if (!info) {
        const html = await stat(file + '.html').catch(() => null);
        if (html) {
          target = file + '.html';
          info = html;
        }
      }
      if (!info) {
        // The site's own 404 page, as static hosts serve it.
        const page = join(root, '404.html');
        const custom = await stat(page).catch(() => null);
        if (custom?.isFile()) {
          res.writeHead(404, { 'content-type': MIME['.html']!, 'content-length': custom.size });
          log.push({ path: url.pathname, bytes: req.method === 'HEAD' ? 0 : custom.size });
          if (req.method === 'HEAD') return void res.end();
          createReadStream(page).pipe(res);
          return;
        }
        res.writeHead(404, { 'content-type': 'text/plain' }).end('not found');
        return;
      }
      const type = MIME[extname(target).toLowerCase()] ?? 'application/octet-stream';
      const headers: Record<string, string | number> = {
        'content-type': type,
        'accept-ranges': 'bytes',
        'cache-control': 'no-cache',
      };
      const range = req.headers.range && /^bytes=(\d*)-(\d*)$/.exec(req.headers.range);
      if (range) {
        const size = info.size;
        let start = range[1] ? Number(range[1]) : size - Number(range[2]);
        let end = range[1] && range[2] ? Number(range[2]) : size - 1;
        if (!range[1]) start = Math.max(0, start);
        end = Math.min(end, size - 1);
        if (start > end || start >= size) {
          res.writeHead(416, { 'content-range': `bytes */${size}` }).end();
          return;
        }
        headers['content-range'] = `bytes ${start}-${end}/${size}`;
        headers['content-length'] = end - start + 1;
        res.writeHead(206, headers);
        log.push({ path: url.pathname, bytes: req.method === 'HEAD' ? 0 : end - start + 1 });
        if (req.method === 'HEAD') return void res.end();
        createReadStream(target, { start, end }).pipe(res);
        return;
      }
      headers['content-length'] = info.size;
      res.writeHead(200, headers);
      log.push({ path: url.pathname, bytes: req.method === 'HEAD' ? 0 : info.size });
      if (req.method === 'HEAD') return void res.end();
      createReadStream(target).pipe(res);
    } catch (err) {
      res.writeHead(500, { 'content-type': 'text/plain' }).end(String(err));
    }
  });
  // A port in use (or not ours to take) is a one-line error, not an unhandled 'error' event.
  await new Promise<void>((resolve, reject) => {
    const failed = (err: NodeJS.ErrnoException): void => {
      reject(new PortUnavailable(err.code === 'EADDRINUSE' ? `port ${port} is in use: choose another with --port (0 takes a free one)` : `cannot listen on port ${port} (${err.code ?? err.message}): choose another with --port`));
    };
    server.once('error', failed);
    server.listen(port, '127.0.0.1', () => {
      server.off('error', failed);
      resolve();
    });
  });
  const addr = server.address();
  const actualPort = typeof addr === 'object' && addr ? addr.port : port;
  return {
    server,
    url: `http://127.0.0.1:${actualPort}${base}`,
    log,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
