import type { JsonSchema } from './configSchema.ts';

/** Keywords that only annotate (ignored when validating). */
const ANNOTATIONS = new Set(['$schema', '$id', 'title', 'description', 'default', 'examples']);
/** Keywords this validator checks: the subset of JSON Schema 2020-12 that configSchema.ts writes. */
const CHECKED = new Set([
  'type', 'enum', 'const', 'properties', 'additionalProperties', 'required', 'minProperties', 'minimum', 'maximum',
  'exclusiveMinimum', 'exclusiveMaximum', 'multipleOf', 'minLength', 'maxLength', 'pattern', 'items', 'minItems', 'maxItems',
  'uniqueItems', 'oneOf', 'anyOf',
]);

const typeOf = (v: unknown): string =>
  v === null ? 'null' : Array.isArray(v) ? 'array' : typeof v === 'number' ? (Number.isInteger(v) ? 'integer' : 'number') : typeof v;
const typeMatches = (v: unknown, t: string): boolean => {
  const actual = typeOf(v);
  return actual === t || (t === 'number' && actual === 'integer');
};

/**
 * Checks `value` against `schema` for the keywords configSchema.ts uses (type, enum, const, the
 * object, number, string and array keywords, oneOf, anyOf) and returns the problems as
 * `<path>: <what>` lines (empty when valid). A keyword outside that subset throws, so a schema
 * that grows beyond what this checks cannot pass unnoticed.
 */
export function validateAgainstSchema(value: unknown, schema: JsonSchema, path = '$'): string[] {
  for (const k of Object.keys(schema)) {
    if (!ANNOTATIONS.has(k) && !CHECKED.has(k)) throw new Error(`${path}: schema keyword "${k}" is outside the checked subset`);
  }
  const out: string[] = [];
  const say = (msg: string): void => void out.push(`${path}: ${msg}`);
  const sub = (v: unknown, s: unknown, p: string): string[] => validateAgainstSchema(v, s as JsonSchema, p);

  if (schema.type !== undefined) {
    const types = Array.isArray(schema.type) ? (schema.type as string[]) : [schema.type as string];
    if (!types.some((t) => typeMatches(value, t))) return [`${path}: expected ${types.join(' or ')}, got ${typeOf(value)}`];
  }
  if (schema.enum !== undefined && !(schema.enum as unknown[]).includes(value)) say(`${JSON.stringify(value)} is not one of ${(schema.enum as unknown[]).join(', ')}`);
  if (schema.const !== undefined && schema.const !== value) say(`must be ${JSON.stringify(schema.const)}`);

  if (typeof value === 'number') {
    if (typeof schema.minimum === 'number' && !(value >= schema.minimum)) say(`${value} is below ${schema.minimum}`);
    if (typeof schema.maximum === 'number' && !(value <= schema.maximum)) say(`${value} is above ${schema.maximum}`);
    if (typeof schema.exclusiveMinimum === 'number' && !(value > schema.exclusiveMinimum)) say(`${value} is not above ${schema.exclusiveMinimum}`);
    if (typeof schema.exclusiveMaximum === 'number' && !(value < schema.exclusiveMaximum)) say(`${value} is not below ${schema.exclusiveMaximum}`);
    if (typeof schema.multipleOf === 'number' && !Number.isInteger(value / schema.multipleOf)) say(`${value} is not a multiple of ${schema.multipleOf}`);
  }
  if (typeof value === 'string') {
    const n = [...value].length;
    if (typeof schema.minLength === 'number' && n < schema.minLength) say(`shorter than ${schema.minLength}`);
    if (typeof schema.maxLength === 'number' && n > schema.maxLength) say(`longer than ${schema.maxLength}`);
    if (typeof schema.pattern === 'string' && !new RegExp(schema.pattern, 'u').test(value)) say(`${JSON.stringify(value)} does not match ${schema.pattern}`);
  }
  if (Array.isArray(value)) {
    if (typeof schema.minItems === 'number' && value.length < schema.minItems) say(`fewer than ${schema.minItems} items`);
    if (typeof schema.maxItems === 'number' && value.length > schema.maxItems) say(`more than ${schema.maxItems} items`);
    if (schema.uniqueItems === true && new Set(value.map((v) => JSON.stringify(v))).size !== value.length) say('items are not unique');
    if (schema.items !== undefined) value.forEach((v, i) => out.push(...sub(v, schema.items, `${path}[${i}]`)));
  }
  if (typeOf(value) === 'object') {
    const o = value as Record<string, unknown>;
    const props = (schema.properties ?? {}) as Record<string, unknown>;
    for (const r of (schema.required ?? []) as string[]) if (!(r in o)) say(`missing required key "${r}"`);
    if (typeof schema.minProperties === 'number' && Object.keys(o).length < schema.minProperties) say(`fewer than ${schema.minProperties} keys`);
    for (const [k, v] of Object.entries(o)) {
      if (k in props) out.push(...sub(v, props[k], `${path}.${k}`));
      else if (schema.additionalProperties === false) say(`unknown key "${k}"`);
      else if (typeof schema.additionalProperties === 'object') out.push(...sub(v, schema.additionalProperties, `${path}.${k}`));
    }
  }
  for (const kw of ['oneOf', 'anyOf'] as const) {
    const options = schema[kw] as unknown[] | undefined;
    if (!options) continue;
    const results = options.map((s) => sub(value, s, path));
    const passing = results.filter((r) => r.length === 0).length;
    if (kw === 'oneOf' ? passing !== 1 : passing === 0) {
      if (passing > 1) say(`matches ${passing} alternatives of oneOf`);
      else {
        // Report the alternative of the value's own type: its problems say what is wrong inside.
        const ofType = results.filter((r) => !(r.length === 1 && r[0]!.startsWith(`${path}: expected `)));
        out.push(...(ofType.length ? ofType : results).reduce((best, r) => (r.length < best.length ? r : best)));
      }
    }
  }
  return out;
}
