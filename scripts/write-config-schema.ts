/**
 * `npm run schema`: writes the JSON Schema of census.config.yaml (schema/census.config.schema.json)
 * and the README's table of allowed values, both from the code (src/catalog/config/configSchema.ts,
 * allowedValuesTable.ts). test/catalog/config/configSchema.test.ts fails when either is stale.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { CONFIG_SCHEMA_PATH, configSchemaText } from '../src/catalog/config/configSchema.ts';
import { withAllowedValues } from '../src/catalog/config/allowedValuesTable.ts';

const root = fileURLToPath(new URL('..', import.meta.url));
writeFileSync(`${root}${CONFIG_SCHEMA_PATH}`, configSchemaText());
const readmePath = `${root}README.md`;
writeFileSync(readmePath, withAllowedValues(readFileSync(readmePath, 'utf8')));
console.log(`wrote ${CONFIG_SCHEMA_PATH} and the allowed values in README.md`);
