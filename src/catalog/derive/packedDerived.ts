import type { DerivedObject, LimitMarks, LineId, Percentiles } from '../../core/derive/types.ts';
import { LINES } from '../../core/derive/types.ts';

/** The quantities that can be bounds (DerivedObject.isLimit), packed as 1 (bound) or 0. */
export const LIMIT_KEYS = ['logMbh', 'logLbol', 'logEddRatio', 'logMseed', 'lambdaReq', 'deltaLogMbhLocal'] as const satisfies readonly (keyof LimitMarks)[];

/** The numeric fields of a `DerivedObject`, in the order they sit in a packed record. */
export const PACKED_FIELDS = [
  'ageGyr',
  'dlMpc',
  ...LINES.map((l) => `logLum.${l}` as const),
  'logL5100',
  'logMbh',
  'logLbol',
  'logEddRatio',
  'pSuperEddington',
  'logMseed',
  'lambdaReqLight',
  'lambdaReqHeavy',
  'deltaLogMbhLocal',
  'localOffsetSigma',
  'pAboveLocal',
  ...(['logMbh', 'logLbol', 'logEddRatio', 'logMseed', 'deltaLogMbhLocal'] as const).flatMap(
    (q) => [`pct.${q}.p16`, `pct.${q}.p50`, `pct.${q}.p84`] as const,
  ),
  ...LIMIT_KEYS.map((q) => `isLimit.${q}` as const),
] as const;

/** Name of one packed numeric field. */
export type PackedField = (typeof PACKED_FIELDS)[number];

/** Number of doubles per packed object. */
export const PACKED_WIDTH = PACKED_FIELDS.length;

/** Offset of each field within a packed record. */
export const PACKED_OFFSET: Readonly<Record<PackedField, number>> = Object.fromEntries(
  PACKED_FIELDS.map((f, i) => [f, i]),
) as Record<PackedField, number>;

/**
 * The results of one batch in a compact, transferable form: `numbers` holds PACKED_WIDTH
 * doubles per object (NaN for null), the string-valued fields sit in short arrays.
 * `errors[i]` is the message of a derivation that threw (its numbers are all NaN).
 */
export interface PackedDerived {
  count: number;
  numbers: Float64Array;
  mbhMethod: (string | null)[];
  lbolMethod: (string | null)[];
  /** Flags of each object joined with ',' ('' when none). */
  flags: string[];
  errors: (string | null)[];
  /** The same objects under each reading of the run, in the run's reading order (absent when the run has none). */
  readings?: PackedDerived[];
}

/** Allocates an all-NaN packed batch for `count` objects. */
export function allocatePacked(count: number): PackedDerived {
  return {
    count,
    numbers: new Float64Array(count * PACKED_WIDTH).fill(Number.NaN),
    mbhMethod: new Array<string | null>(count).fill(null),
    lbolMethod: new Array<string | null>(count).fill(null),
    flags: new Array<string>(count).fill(''),
    errors: new Array<string | null>(count).fill(null),
  };
}

const num = (v: number | null | undefined): number => (v === null || v === undefined ? Number.NaN : v);

function putPercentiles(out: Float64Array, base: number, p: Percentiles | null): void {
  out[base] = num(p?.p16);
  out[base + 1] = num(p?.p50);
  out[base + 2] = num(p?.p84);
}

/** Offsets of the per-line and per-bound fields, looked up once: building `logLum.${line}` and looking it up per object was most of packInto's time. */
const LUM_OFFSETS = LINES.map((l) => PACKED_OFFSET[`logLum.${l}`]);
const LIMIT_OFFSETS = LIMIT_KEYS.map((q) => PACKED_OFFSET[`isLimit.${q}`]);

/** Writes `d` as record `i` of `packed`. */
export function packInto(packed: PackedDerived, i: number, d: DerivedObject): void {
  const o = packed.numbers;
  const b = i * PACKED_WIDTH;
  o[b + PACKED_OFFSET.ageGyr] = num(d.ageGyr);
  o[b + PACKED_OFFSET.dlMpc] = num(d.dlMpc);
  for (let j = 0; j < LINES.length; j++) o[b + (LUM_OFFSETS[j] as number)] = num(d.logLum[LINES[j] as LineId]);
  o[b + PACKED_OFFSET.logL5100] = num(d.logL5100);
  o[b + PACKED_OFFSET.logMbh] = num(d.logMbh);
  o[b + PACKED_OFFSET.logLbol] = num(d.logLbol);
  o[b + PACKED_OFFSET.logEddRatio] = num(d.logEddRatio);
  o[b + PACKED_OFFSET.pSuperEddington] = num(d.pSuperEddington);
  o[b + PACKED_OFFSET.logMseed] = num(d.logMseed);
  o[b + PACKED_OFFSET.lambdaReqLight] = num(d.lambdaReqLight);
  o[b + PACKED_OFFSET.lambdaReqHeavy] = num(d.lambdaReqHeavy);
  o[b + PACKED_OFFSET.deltaLogMbhLocal] = num(d.deltaLogMbhLocal);
  o[b + PACKED_OFFSET.localOffsetSigma] = num(d.localOffsetSigma);
  o[b + PACKED_OFFSET.pAboveLocal] = num(d.pAboveLocal);
  putPercentiles(o, b + PACKED_OFFSET['pct.logMbh.p16'], d.pct.logMbh);
  putPercentiles(o, b + PACKED_OFFSET['pct.logLbol.p16'], d.pct.logLbol);
  putPercentiles(o, b + PACKED_OFFSET['pct.logEddRatio.p16'], d.pct.logEddRatio);
  putPercentiles(o, b + PACKED_OFFSET['pct.logMseed.p16'], d.pct.logMseed);
  putPercentiles(o, b + PACKED_OFFSET['pct.deltaLogMbhLocal.p16'], d.pct.deltaLogMbhLocal);
  for (let j = 0; j < LIMIT_KEYS.length; j++) o[b + (LIMIT_OFFSETS[j] as number)] = d.isLimit[LIMIT_KEYS[j] as keyof LimitMarks] ? 1 : 0;
  packed.mbhMethod[i] = d.mbhMethod;
  packed.lbolMethod[i] = d.lbolMethod;
  packed.flags[i] = d.flags.join(',');
}

/** Reads field `f` of record `i` (NaN where the derivation gave null). */
export function packedValue(packed: PackedDerived, i: number, f: PackedField): number {
  return packed.numbers[i * PACKED_WIDTH + PACKED_OFFSET[f]]!;
}

/**
 * A reader of field `f`: `(packed, i) => packedValue(packed, i, f)` with the field's offset looked
 * up once. The output columns read every field of every row, and the lookup by name per value
 * was a tenth of the writing thread's time.
 */
export function packedField(f: PackedField): (packed: PackedDerived, i: number) => number {
  const offset = PACKED_OFFSET[f];
  if (offset === undefined) throw new Error(`no packed field ${f}`);
  return (packed, i) => packed.numbers[i * PACKED_WIDTH + offset]!;
}

/** The lines whose luminosity field exists, for callers that iterate them. */
export const PACKED_LINES: readonly LineId[] = LINES;
