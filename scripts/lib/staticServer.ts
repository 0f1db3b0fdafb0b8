// The static server lives with the CLI (dawn-census site preview); scripts and tests import it from here too.
export * from '../../src/catalog/serve/staticServer.ts';
