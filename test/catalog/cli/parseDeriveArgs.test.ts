import { describe, expect, it } from 'vitest';
import { parseDeriveArgs } from '../../../src/catalog/cli/parseDeriveArgs.ts';

describe('parseDeriveArgs', () => {
  it('reads the catalog and every option, with the value as the next argument or after =', () => {
    expect(parseDeriveArgs(['cat.csv', '-c', 'c.yaml', '-o', 'out.parquet', '--draws', '500', '--seed=3', '--threads', '2', '--quiet'])).toEqual({
      catalog: 'cat.csv',
      config: 'c.yaml',
      output: 'out.parquet',
      draws: 500,
      seed: 3,
      threads: 2,
      quiet: true,
      force: false,
      help: false,
    });
  });

  it('accepts the long names of -c, -o and -q, options before the catalog, and -- before a catalog that starts with a dash', () => {
    expect(parseDeriveArgs(['--config', 'c.yaml', '--output=o.parquet', '-q', '--', '-odd.csv'])).toMatchObject({
      catalog: '-odd.csv',
      config: 'c.yaml',
      output: 'o.parquet',
      quiet: true,
    });
  });

  it('leaves the catalog out when only a config is given', () => {
    expect(parseDeriveArgs(['-c', 'c.yaml'])).toEqual({ config: 'c.yaml', quiet: false, help: false, force: false });
  });

  it('sees --help anywhere', () => {
    expect(parseDeriveArgs(['x.csv', '--help']).help).toBe(true);
    expect(parseDeriveArgs(['-h']).help).toBe(true);
  });

  it.each([
    [['--bogus'], 'unknown option --bogus for derive (see dawn-census derive --help)'],
    [['a.csv', 'b.csv'], 'more than one catalog given ("a.csv" and "b.csv"); derive reads one catalog'],
    [['--draws'], '--draws needs a value'],
    [['-c', '--quiet'], '-c needs a value'],
    [['--draws='], '--draws needs a value'],
    [['--draws', 'many'], '--draws needs a whole number, got "many"'],
    [['--seed', '-5'], '--seed needs a whole number, got "-5"'],
    [['--draws', '2.5'], '--draws needs a whole number, got "2.5"'],
    [['--threads', '0'], '--threads must be between 1 and 256, got 0'],
    [['--threads', '1000'], '--threads must be between 1 and 256, got 1000'],
    [['--seed', '1', '--seed', '2'], '--seed given more than once'],
    [['--quiet=yes'], '--quiet takes no value'],
  ])('refuses %j with a one-line message', (argv, message) => {
    expect(() => parseDeriveArgs(argv)).toThrow(message);
  });
});
