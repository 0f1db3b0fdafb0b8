/**
 * The Readings page's state in its URL: the reading the charts show (`reading`), the two readings
 * compared (`a`, `b`), and a custom reading's settings (`deflation`, `l5100`, `dust`, `eff`), so a
 * link reopens the same view.
 */
export interface ReadingsPageState {
  reading: string;
  a: string;
  b: string;
  custom: CustomReadingParams | null;
}

/** The custom reading's form values. */
export interface CustomReadingParams {
  deflation: number;
  l5100Ratio: number | null;
  dust: 'standard' | 'none';
  efficiency: number | null;
}

const numParam = (p: URLSearchParams, k: string): number | null => {
  const v = p.get(k);
  if (v === null || v.trim() === '') return null;
  const x = Number(v);
  return Number.isFinite(x) ? x : null;
};

/** Reads the state from a query string; unknown reading ids fall back to `known[0]` (or the second for `b`). */
export function parseReadingsState(search: string, known: readonly string[]): ReadingsPageState {
  const p = new URLSearchParams(search);
  const pick = (k: string, fallback: string) => {
    const v = p.get(k);
    return v && (known.includes(v) || v === 'custom') ? v : fallback;
  };
  const first = known[0] ?? 'standard';
  const second = known[1] ?? first;
  const deflation = numParam(p, 'deflation');
  const custom: CustomReadingParams | null =
    deflation !== null || p.has('l5100') || p.has('dust') || p.has('eff')
      ? { deflation: deflation ?? 1, l5100Ratio: numParam(p, 'l5100'), dust: p.get('dust') === 'none' ? 'none' : 'standard', efficiency: numParam(p, 'eff') }
      : null;
  return { reading: pick('reading', first), a: pick('a', first), b: pick('b', second), custom };
}

/** The query string of a state (without the leading '?'). */
export function readingsStateQuery(s: ReadingsPageState): string {
  const p = new URLSearchParams({ reading: s.reading, a: s.a, b: s.b });
  if (s.custom) {
    p.set('deflation', String(s.custom.deflation));
    if (s.custom.l5100Ratio !== null) p.set('l5100', String(s.custom.l5100Ratio));
    p.set('dust', s.custom.dust);
    if (s.custom.efficiency !== null) p.set('eff', String(s.custom.efficiency));
  }
  return p.toString();
}
