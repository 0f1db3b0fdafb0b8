/*
 * The DuckDB-WASM worker's gate to the network (a classic worker script). It is started
 * instead of DuckDB's own worker with `?worker=<DuckDB's worker URL>&allow=<URL>&allow=…`,
 * wraps every way a worker script can reach the network so that only the allowed URLs (the
 * database's wasm file and the catalog's Parquet file) can be requested, then loads DuckDB's
 * worker. A query that names any other file or address (read_csv('https://…'), ATTACH
 * 'https://…', INSTALL …) fails at once with an error containing "census-blocked", before
 * any request leaves the page, instead of fetching another host or hanging the worker.
 */
(() => {
  const params = new URL(self.location.href).searchParams;
  const allowed = new Set(params.getAll('allow'));
  const workerUrl = params.get('worker');
  const absolute = (url) => {
    try {
      return new URL(String(url), self.location.href).href;
    } catch {
      return String(url);
    }
  };
  const refuse = (url) => new Error(`census-blocked: ${absolute(url)}`);
  const isAllowed = (url) => allowed.has(absolute(url));

  const open = XMLHttpRequest.prototype.open;
  XMLHttpRequest.prototype.open = function (method, url, ...rest) {
    if (!isAllowed(url)) throw refuse(url);
    return open.call(this, method, url, ...rest);
  };
  const realFetch = self.fetch.bind(self);
  self.fetch = (input, init) => {
    const url = typeof input === 'string' || input instanceof URL ? input : input.url;
    if (!isAllowed(url)) return Promise.reject(refuse(url));
    return realFetch(input, init);
  };
  for (const name of ['WebSocket', 'EventSource']) {
    if (name in self) {
      self[name] = function () {
        throw refuse(arguments[0]);
      };
    }
  }
  const realImport = self.importScripts.bind(self);
  realImport(workerUrl);
  self.importScripts = (...urls) => {
    throw refuse(urls[0]);
  };
})();
