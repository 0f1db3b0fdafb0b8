import { existsSync } from 'node:fs';
import { readFile, rm } from 'node:fs/promises';
import { register } from 'node:module';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { loadConfig } from '../config/loadConfig.ts';
import { ConfigError } from '../config/ConfigError.ts';
import { PUBLICATION_FIELDS, publicationNotes, type PublicationText } from '../config/publicationGaps.ts';
import { terminalText } from '../../shared/text/terminalText.ts';
import { defaultOutputPath, outputPaths } from '../derive/outputPaths.ts';
import { checkSiteOut, commitSite, SITE_MARKER, siteStaging } from '../outputs/siteOutput.ts';
import { PortUnavailable, serveStatic } from '../serve/staticServer.ts';
import type { TextOut } from './cliIo.ts';
import { UsageError } from './UsageError.ts';

/** `dawn-census site build|preview` arguments. */
export interface SiteArgs {
  action: 'build' | 'preview';
  config: string;
  out: string;
  port: number;
  help: boolean;
}

/** Parses `site <build|preview> -c <config> [--out <dir>] [--port <n>]`; throws UsageError. */
export function parseSiteArgs(argv: readonly string[]): SiteArgs {
  const [action, ...rest] = argv;
  if (action === '--help' || action === '-h') return { action: 'build', config: '', out: 'dist', port: 4321, help: true };
  if (action !== 'build' && action !== 'preview') throw new UsageError(`site needs "build" or "preview" (got ${action === undefined ? 'nothing' : `"${action}"`}; see dawn-census site --help)`);
  const args: SiteArgs = { action, config: '', out: 'dist', port: 4321, help: false };
  for (let i = 0; i < rest.length; i++) {
    const a = rest[i]!;
    const value = (): string => {
      const v = rest[++i];
      if (v === undefined || v.startsWith('-')) throw new UsageError(`${a} needs a value`);
      return v;
    };
    if (a === '-c' || a === '--config') args.config = value();
    else if (a === '--out') args.out = value();
    else if (a === '--port') {
      const v = value();
      args.port = Number(v);
      if (!Number.isInteger(args.port) || args.port < 0 || args.port > 65535) throw new UsageError(`--port must be a port number (got "${v}")`);
    } else if (a === '-h' || a === '--help') args.help = true;
    else throw new UsageError(`unknown option "${a}" for site ${action} (see dawn-census site --help)`);
  }
  if (!args.help && action === 'build' && args.config === '') throw new UsageError('site build needs -c <census.config.yaml>');
  return args;
}

/** The package's own folder (where astro.config.mjs and the site sources are): three levels up from src/catalog/cli or lib/catalog/cli. */
const PACKAGE_ROOT = fileURLToPath(new URL('../../../', import.meta.url));

let resolveHookRegistered = false;

/**
 * Lets the prerendering step of the build find the site's dependencies when the output folder has
 * no node_modules above it (see siteResolveHook.mjs). Registered once per process.
 */
function registerSiteResolveHook(): void {
  if (resolveHookRegistered) return;
  // module.register exists from Node 20.6; without it a data folder needs its own node_modules.
  if (typeof register !== 'function') return;
  register(new URL('./siteResolveHook.mjs', import.meta.url), { data: { packageRootUrl: pathToFileURL(PACKAGE_ROOT).href } });
  resolveHookRegistered = true;
}

/** `site.base` normalised to start and end with '/'. */
function normalBase(base: string): string {
  let b = base.trim() || '/';
  if (!b.startsWith('/')) b = '/' + b;
  if (!b.endsWith('/')) b += '/';
  return b;
}

/**
 * Builds the static site for the catalog a config derives (its `output`, else the default beside
 * its input), honouring `site.base`, into `out` (relative to the working directory). Runs Astro
 * from the installed package; writes Astro's progress to `log`.
 */
export async function siteBuild(args: SiteArgs, log: TextOut): Promise<{ out: string; base: string }> {
  const config = await loadConfig(args.config);
  const label = path.basename(args.config);
  const catalog = config.output ?? (config.input ? defaultOutputPath(config.input.path) : undefined);
  if (!catalog) throw new ConfigError(`${label}: neither output nor input.path says which catalog to publish`);
  if (!existsSync(catalog)) throw new ConfigError(`${label}: the catalog ${catalog} does not exist yet: run dawn-census derive -c ${args.config} first`);
  const out = path.resolve(args.out);
  // The build replaces its whole folder: only a new, empty or earlier site folder may be it.
  await checkSiteOut(out, [args.config, catalog, ...(config.input ? [config.input.path] : [])], args.out);
  const staging = siteStaging(out);
  const base = normalBase(config.site.base);
  const metaPath = outputPaths(catalog).meta;
  const recorded = await readRecordedPublication(metaPath);
  for (const note of publicationNotes(recorded, config, { config: label, meta: path.basename(metaPath) })) log.write(`${terminalText(note)}\n`);
  // Astro's build reads the catalog, base and output folder from these (see astro.config.mjs).
  const saved = { CENSUS_CATALOG: process.env.CENSUS_CATALOG, CENSUS_BASE: process.env.CENSUS_BASE, CENSUS_OUT_DIR: process.env.CENSUS_OUT_DIR };
  Object.assign(process.env, { CENSUS_CATALOG: catalog, CENSUS_BASE: base, CENSUS_OUT_DIR: staging });
  try {
    registerSiteResolveHook();
    const { build } = await import('astro');
    await build({ root: PACKAGE_ROOT, logLevel: 'warn' });
    await commitSite(staging, out, { catalog: path.basename(catalog), base });
  } catch (e) {
    await rm(staging, { recursive: true, force: true });
    throw new Error(`the site build failed: ${(e as Error).message.split('\n')[0]}`);
  } finally {
    for (const [k, v] of Object.entries(saved)) {
      if (v === undefined) delete process.env[k];
      else process.env[k] = v;
    }
  }
  log.write('');
  return { out, base };
}

/** The publication fields recorded in a catalog's `.meta.json` (none when it cannot be read: the site build then says more). */
async function readRecordedPublication(metaPath: string): Promise<PublicationText> {
  try {
    const meta = JSON.parse(await readFile(metaPath, 'utf8')) as Record<string, unknown>;
    const out: PublicationText = {};
    for (const k of PUBLICATION_FIELDS) if (typeof meta[k] === 'string') out[k] = meta[k] as string;
    return out;
  } catch {
    return {};
  }
}

/** Serves a built site folder at its base (Range requests included) until the process is stopped. */
export async function sitePreview(args: SiteArgs, log: TextOut): Promise<{ url: string; close: () => Promise<void> }> {
  const out = path.resolve(args.out);
  if (!existsSync(path.join(out, 'index.html'))) throw new UsageError(`${args.out} holds no built site: run dawn-census site build -c <config> --out ${args.out} first`);
  // The base the site was built for (its marker records it); else the config's; else the root.
  const built = await readFile(path.join(out, SITE_MARKER), 'utf8').then(
    (t) => (JSON.parse(t) as { base?: unknown }).base,
    () => undefined,
  );
  const base = typeof built === 'string' ? normalBase(built) : args.config ? normalBase((await loadConfig(args.config)).site.base) : '/';
  let server;
  try {
    server = await serveStatic(out, base, args.port);
  } catch (e) {
    if (e instanceof PortUnavailable) throw new UsageError(e.message);
    throw e;
  }
  log.write(`Serving ${out} at ${server.url} (Ctrl-C stops it)\n`);
  return { url: server.url, close: () => server.close() };
}
