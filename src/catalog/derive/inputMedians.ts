import { LINES, type LineId } from '../../core/derive/types.ts';
import type { ColumnPlan, PlannedColumn } from '../normalize/ColumnPlan.ts';
import type { NormalizedRow } from '../normalize/normalizeChunk.ts';
import { CatalogError } from '../readers/CatalogError.ts';
import type { PackedDerived } from './packedDerived.ts';
import { packedField } from './packedDerived.ts';

/**
 * Medians a catalog of broad-line AGN must have (common practice, no source): broad-line
 * luminosities of 1e39–1e46 erg/s and widths of 300–20000 km/s. A median outside is almost
 * always a unit mistake (fluxes in 1e-18 erg s⁻¹ cm⁻² read as erg s⁻¹ cm⁻², widths in m/s).
 */
export const PLAUSIBLE_MEDIAN = {
  logLumErgS: [39, 46],
  fwhmKms: [300, 20000],
} as const;

/** Histogram bins per dex: the median is known to 0.01 dex. */
const BINS_PER_DEX = 100;
const LOG_MIN = -40;
const LOG_MAX = 80;

/** A median in log10 from a fixed histogram: bounded memory whatever the row count. */
class LogMedian {
  private readonly counts = new Uint32Array((LOG_MAX - LOG_MIN) * BINS_PER_DEX);
  n = 0;
  add(logX: number): void {
    if (!Number.isFinite(logX)) return;
    const i = Math.min(this.counts.length - 1, Math.max(0, Math.floor((logX - LOG_MIN) * BINS_PER_DEX)));
    this.counts[i]!++;
    this.n++;
  }
  /** log10 of the median (bin centre), or NaN when empty. */
  median(): number {
    if (this.n === 0) return NaN;
    let seen = 0;
    for (let i = 0; i < this.counts.length; i++) {
      seen += this.counts[i]!;
      if (seen * 2 >= this.n) return LOG_MIN + (i + 0.5) / BINS_PER_DEX;
    }
    return NaN;
  }
}

const fmt = (logX: number): string => (10 ** logX).toPrecision(2);

/**
 * The catalog-level plausibility check of derive: the median broad-line luminosity (from the
 * derived `log_lum_<line>`) and the median FWHM (as read, including widths the row checks
 * refused) of each line. `check()` throws a one-line CatalogError naming the column, the
 * median and the unit the values were probably in, unless the config says they are intended.
 */
export class InputMedians {
  private readonly lum = new Map<LineId, LogMedian>();
  private readonly fwhm = new Map<LineId, LogMedian>();
  private readonly lumColumn = new Map<LineId, PlannedColumn>();
  private readonly fwhmColumn = new Map<LineId, PlannedColumn>();
  /** Per line counted, what `add` reads: the width's column name and a reader of the derived luminosity (built once, not per row). */
  private readonly widthKeys: { line: LineId; m: LogMedian; column: string }[] = [];
  private readonly lumKeys: { line: LineId; m: LogMedian; read: (packed: PackedDerived, k: number) => number }[] = [];

  constructor(
    plan: ColumnPlan,
    private readonly label: string,
  ) {
    const byName = new Map(plan.canonical.map((c) => [c.name, c]));
    for (const line of LINES) {
      const lumCol = byName.get(`flux_${line}`) ?? byName.get(`lum_${line}`);
      if (lumCol) {
        this.lumColumn.set(line, lumCol);
        this.lum.set(line, new LogMedian());
      }
      const w = byName.get(`fwhm_${line}`);
      if (w) {
        this.fwhmColumn.set(line, w);
        this.fwhm.set(line, new LogMedian());
      }
    }
    for (const [line, m] of this.fwhm) this.widthKeys.push({ line, m, column: `fwhm_${line}` });
    for (const [line, m] of this.lum) this.lumKeys.push({ line, m, read: packedField(`logLum.${line}`) });
  }

  /** Adds one row: its widths (valid or refused by the row checks) and, when derived, its line luminosities. */
  add(row: NormalizedRow, packed: PackedDerived | null, k: number): void {
    for (const { line, m, column } of this.widthKeys) {
      const v = row.canonical[column];
      if (typeof v === 'number') m.add(Math.log10(v));
      else {
        const problem = row.problems.find((p) => p.column === column);
        const raw = problem ? Number(problem.value) : NaN;
        if (raw > 0) m.add(Math.log10(this.fwhmColumn.get(line)!.convert(raw)));
      }
    }
    if (!packed) return;
    for (const { line, m, read } of this.lumKeys) {
      if (row.inputs?.lines[line]?.fluxIsLimit) continue;
      m.add(read(packed, k));
    }
  }

  /** Throws CatalogError at the first implausible median, unless `intended`. */
  check(intended: boolean): void {
    if (intended) return;
    const problem = this.problem();
    if (problem) throw new CatalogError(problem);
  }

  /**
   * The message naming every column whose median is implausible in the rows added so far (one
   * line), or null. Every such column is named at once, so that one run shows them all. A flux in
   * a scaled unit is not given one answer: the scale that would put its median at a typical
   * 1e42.5 erg/s is only a hint, and a factor of ten off is 0.47 dex in mass, so the message asks
   * for the unit the file uses.
   */
  problem(): string | null {
    const found: { name: string; text: string }[] = [];
    for (const [line, m] of this.lum) {
      const med = m.median();
      const [lo, hi] = PLAUSIBLE_MEDIAN.logLumErgS;
      if (!(med < lo || med > hi)) continue;
      const col = this.lumColumn.get(line)!;
      const isFlux = col.name.startsWith('flux_');
      const shift = Math.round(med - 42.5);
      const likely = isFlux
        ? `the fluxes look like they are in a scaled unit, about 1e${-shift} erg s-1 cm-2 if their median luminosity is a typical 1e42.5 erg/s: give the unit your file uses (often 1e-17 to 1e-20 erg s-1 cm-2)`
        : med < lo
          ? 'the values look like log10 of the luminosity (log(erg/s))'
          : `the luminosities look like they are in a scaled unit, about 1e${-shift} erg s-1 if their median is a typical 1e42.5 erg/s: give the unit your file uses`;
      found.push({ name: col.name, text: `column ${col.label}, read in ${col.unitLabel}: the median broad-line luminosity is ${fmt(med)} erg/s, outside 1e${lo}–1e${hi}: ${likely}` });
    }
    for (const [line, m] of this.fwhm) {
      const med = m.median();
      const [lo, hi] = PLAUSIBLE_MEDIAN.fwhmKms;
      if (!(10 ** med < lo || 10 ** med > hi)) continue;
      const col = this.fwhmColumn.get(line)!;
      const v = 10 ** med;
      const likely =
        v > hi
          ? v / 1e5 >= lo && v / 1e5 <= hi
            ? 'the widths look like cm/s'
            : 'the widths look like m/s'
          : 'the widths look like they are in 1000 km/s or in Å';
      found.push({ name: col.name, text: `column ${col.label}, read in ${col.unitLabel}: the median FWHM is ${fmt(med)} km/s, outside ${lo}–${hi} km/s: ${likely}` });
    }
    if (found.length === 0) return null;
    const fix = found.length === 1 ? `set columns.${found[0]!.name}.unit in the config` : `set the unit of each in the config (${found.map((f) => `columns.${f.name}.unit`).join(', ')})`;
    return `${this.label}: ${found.map((f) => f.text).join('; ')}; ${fix}, or implausible_medians_intended: true if the values are right`;
  }
}
