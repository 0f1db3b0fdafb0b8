import { CatalogError } from '../readers/CatalogError.ts';

/**
 * A problem with a census config file (or with a command-line override of it): a one-line
 * message naming the file and the key path. A catalog-level error, so the CLI exits with
 * status 2.
 */
export class ConfigError extends CatalogError {
  constructor(message: string) {
    super(message);
    this.name = 'ConfigError';
  }
}
