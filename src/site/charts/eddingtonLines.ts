/** The Eddington ratios drawn as reference lines on the L_bol–M_BH plane. */
export const EDDINGTON_RATIOS: readonly number[] = [0.01, 0.1, 1, 10];

/**
 * log10 L_bol (erg s^-1) of a black hole of log10 mass `logMbh` (M_sun) accreting at Eddington
 * ratio `lambda`, with `lEddPerMsun` the Eddington luminosity per solar mass (erg s^-1):
 * log L = log λ + log(L_Edd/M_sun) + log M.
 */
export function logLbolAtEddington(logMbh: number, lambda: number, lEddPerMsun: number): number {
  return Math.log10(lambda) + Math.log10(lEddPerMsun) + logMbh;
}

/** A straight segment of a constant-λ line inside the frame, and where its label goes. */
export interface EddingtonSegment {
  lambda: number;
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  /** Label position (on the line, near its upper end) in data units. */
  labelX: number;
  labelY: number;
}

/**
 * The part of each constant-λ line inside the x and y domains (log M_sun, log erg s^-1), or
 * nothing for a line that misses the frame.
 */
export function eddingtonSegments(
  lambdas: readonly number[],
  lEddPerMsun: number,
  xDomain: readonly [number, number],
  yDomain: readonly [number, number],
): EddingtonSegment[] {
  const out: EddingtonSegment[] = [];
  for (const lambda of lambdas) {
    const c = logLbolAtEddington(0, lambda, lEddPerMsun);
    const x1 = Math.max(xDomain[0], yDomain[0] - c);
    const x2 = Math.min(xDomain[1], yDomain[1] - c);
    if (!(x2 > x1)) continue;
    // near the upper end, but far enough inside the frame that the label is not clipped
    const labelX = Math.max(x1, Math.min(x1 + 0.86 * (x2 - x1), xDomain[1] - 0.1 * (xDomain[1] - xDomain[0]), yDomain[1] - 0.1 * (yDomain[1] - yDomain[0]) - c));
    out.push({ lambda, x1, y1: x1 + c, x2, y2: x2 + c, labelX, labelY: labelX + c });
  }
  return out;
}

/** "λ = 0.01", "λ = 1", "λ = 10". */
export function formatLambda(lambda: number): string {
  return `λ = ${lambda >= 1 ? lambda.toFixed(0) : String(lambda)}`;
}
