/**
 * Generates the INVENTED demo data of Dawn Census: data-demo/catalog.csv (about 400 broad-line
 * AGN candidates of the made-up CINDERWAKE survey) and data-demo/new-objects.csv (three objects
 * for the compare form). The population model and the relations it inverts are documented at
 * the top of scripts/lib/demoPopulation.ts.
 *
 *   npx tsx scripts/generate-demo.ts                       # rewrite data-demo/ (n = 400, seed = 4011)
 *   npx tsx scripts/generate-demo.ts --n 100000 --seed 7 --out .bench/catalog-100k.csv
 *   npx tsx scripts/generate-demo.ts --n 1000 --noise-free --out /tmp/truth.csv
 *
 * With --out only the catalog is written, streamed row by row (fine for millions of rows).
 * Benchmarks can also import `generateDemoCatalog` / `iterateDemoObjects` and `toCsv` from here.
 */
import { createWriteStream, mkdirSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { DEMO_MODEL, DEMO_SURVEY, generateDemoCatalog, iterateDemoObjects } from './lib/demoPopulation.ts';
import { csvLines, toCsv } from './lib/demoCsv.ts';
import { newObjectRows } from './lib/demoNewObjects.ts';
import { SONG16_SMF, VIRIAL_SCATTER_DEX } from './lib/demoRelations.ts';

export { DEMO_MODEL, DEMO_COLUMNS, generateDemoCatalog, iterateDemoObjects, type Row, type DemoRow } from './lib/demoPopulation.ts';
export { csvLines, toCsv } from './lib/demoCsv.ts';
export { newObjectRows } from './lib/demoNewObjects.ts';

/** Size and seed of the committed demo catalog. */
export const DEMO_DEFAULTS = { n: 400, seed: 4011 } as const;

/** The `#` lines on top of a generated catalog. */
export function headerComments(n: number, seed: number, noiseFree: boolean): string[] {
  return [
    'INVENTED DEMO DATA. No real object, survey, field, team or telescope: every value is drawn from a model.',
    `"${DEMO_SURVEY.name}" (${DEMO_SURVEY.short}) is a made-up name.`,
    `Made by scripts/generate-demo.ts (model: scripts/lib/demoPopulation.ts) with n = ${n}, seed = ${seed}${noiseFree ? ', noise-free' : ''}.`,
    'Units: fwhm km/s; flux 1e-18 erg/s/cm2; lam_l_5100 erg/s (observed, before magnification correction); log_mstar log10 Msun.',
    'Regenerate: npx tsx scripts/generate-demo.ts',
  ];
}

/**
 * The demo population's intrinsic relation and the assumptions behind it, as written to data-demo/truth.json: what
 * `dawn-census population` should recover from the demo catalog (test/scripts/demoPopulationTruth.test.ts).
 */
export function demoTruthJson(): string {
  const t = DEMO_MODEL.truth;
  return JSON.stringify({
    note: 'INVENTED DEMO DATA: the intrinsic black-hole–host relation the demo catalog was drawn from (scripts/lib/demoHosts.ts).',
    relation: { form: 'log M_BH = alpha + beta (log M* - pivot) + N(0, sigma)', alpha: t.alpha, beta: t.beta, sigma: t.sigma, pivotLogMstar: t.pivotLogMstar },
    eddingtonRatio: { meanLog: DEMO_MODEL.logEddRatio.meanLog, sigmaLog: DEMO_MODEL.logEddRatio.sigmaLog, cut: '±5 sigma' },
    hosts: { logMstarRange: [DEMO_MODEL.host.logMstarMin, DEMO_MODEL.host.logMstarMax], stellarMassFunction: SONG16_SMF.reference },
    virialScatterDex: { halpha: VIRIAL_SCATTER_DEX.halpha, hbeta: VIRIAL_SCATTER_DEX.hbeta, mgii: VIRIAL_SCATTER_DEX.mgii },
    selection: { surveyLimitCgs: Number((DEMO_MODEL.detection.surveyLimit * DEMO_MODEL.fluxUnitCgs).toPrecision(6)), minFwhmKms: DEMO_MODEL.detection.fwhmMinKms },
  }, null, 2) + '\n';
}

interface CliOptions {
  n: number;
  seed: number;
  out: string | null;
  noiseFree: boolean;
}

function parseArgs(argv: string[]): CliOptions {
  const opts: CliOptions = { ...DEMO_DEFAULTS, out: null, noiseFree: false };
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    const next = (): string => {
      const v = argv[++i];
      if (v === undefined) throw new Error(`generate-demo: ${arg} needs a value`);
      return v;
    };
    if (arg === '--n') opts.n = Number(next());
    else if (arg === '--seed') opts.seed = Number(next());
    else if (arg === '--out') opts.out = next();
    else if (arg === '--noise-free') opts.noiseFree = true;
    else throw new Error(`generate-demo: unknown argument ${arg} (use --n, --seed, --out, --noise-free)`);
  }
  return opts;
}

async function streamCatalog(path: string, opts: CliOptions): Promise<void> {
  mkdirSync(dirname(path), { recursive: true });
  const out = createWriteStream(path);
  const rows = (function* () {
    for (const o of iterateDemoObjects(opts)) yield o.row;
  })();
  for (const line of csvLines(rows, { comments: headerComments(opts.n, opts.seed, opts.noiseFree) })) {
    if (!out.write(line)) await new Promise<void>((r) => out.once('drain', () => r()));
  }
  await new Promise<void>((res, rej) => out.end((err?: Error | null) => (err ? rej(err) : res())));
}

async function main(argv: string[]): Promise<void> {
  const opts = parseArgs(argv);
  if (opts.out !== null) {
    await streamCatalog(resolve(opts.out), opts);
    console.log(`wrote ${opts.n} invented rows to ${opts.out}`);
    return;
  }
  const dir = resolve(dirname(fileURLToPath(import.meta.url)), '..', 'data-demo');
  const rows = generateDemoCatalog(opts);
  writeFileSync(resolve(dir, 'catalog.csv'), toCsv(rows, { comments: headerComments(opts.n, opts.seed, opts.noiseFree) }));
  const newRows = newObjectRows();
  const newComments = [
    'INVENTED DEMO DATA: three made-up objects for the "compare a new object" form (ordinary; extreme; z ~ 9 with Hbeta only).',
    'Made by scripts/generate-demo.ts (scripts/lib/demoNewObjects.ts), noise-free values with recorded errors.',
    `Units as in catalog.csv: flux ${DEMO_MODEL.fluxUnitCgs} erg/s/cm2.`,
  ];
  writeFileSync(resolve(dir, 'new-objects.csv'), toCsv(newRows, { comments: newComments }));
  writeFileSync(resolve(dir, 'truth.json'), demoTruthJson());
  console.log(`wrote ${rows.length} invented rows to data-demo/catalog.csv, ${newRows.length} to data-demo/new-objects.csv, and data-demo/truth.json`);
}

if (process.argv[1] !== undefined && import.meta.url === pathToFileURL(resolve(process.argv[1])).href) {
  main(process.argv.slice(2)).catch((err: unknown) => {
    console.error(err instanceof Error ? err.message : String(err));
    process.exitCode = 1;
  });
}
