import { readFile } from 'node:fs/promises';
import { dirname, isAbsolute, relative, resolve } from 'node:path';
import { parseDocument } from 'yaml';
import type { CensusConfig } from './CensusConfig.ts';
import { ConfigError } from './ConfigError.ts';
import { validateConfig } from './validateConfig.ts';

/** How a file is named in messages: relative to the working directory when inside it, else absolute. */
export function displayPath(absPath: string): string {
  const rel = relative(process.cwd(), absPath);
  return rel !== '' && !rel.startsWith('..') && !isAbsolute(rel) ? rel : absPath;
}

/**
 * Parses and validates the text of a census config. `path` (absolute) names the file in
 * messages and is the base of relative paths. Throws ConfigError on a YAML syntax error
 * (with its line and column) or an invalid key or value.
 */
export function parseConfig(text: string, path: string): CensusConfig {
  const label = displayPath(path);
  const doc = parseDocument(text, { prettyErrors: true, uniqueKeys: true });
  const err = doc.errors[0];
  if (err) {
    const first = (err.message.split('\n')[0] ?? '').replace(/ at line \d+, column \d+:?\s*$/, '').trim();
    const pos = err.linePos?.[0];
    const where = pos ? ` at line ${pos.line}, column ${pos.col}` : '';
    throw new ConfigError(`${label}: YAML syntax error${where}: ${first}`);
  }
  const cfg = validateConfig(doc.toJS({ maxAliasCount: 100 }), label, dirname(path));
  cfg.configPath = path;
  cfg.configText = text;
  return cfg;
}

/**
 * Reads and validates a census config file (YAML). Keys left out take their defaults
 * ({@link defaultConfig}); relative `input.path` and `output` are resolved against the config
 * file's folder. Throws ConfigError (one line naming the file and the key) when the file cannot
 * be read, is not valid YAML, or has an unknown key, a value of the wrong type or an unknown id.
 */
export async function loadConfig(path: string): Promise<CensusConfig> {
  const abs = resolve(path);
  let text: string;
  try {
    text = await readFile(abs, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder' : (e as Error).message;
    throw new ConfigError(`${displayPath(abs)}: cannot read the config file: ${why}`);
  }
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  return parseConfig(text, abs);
}
