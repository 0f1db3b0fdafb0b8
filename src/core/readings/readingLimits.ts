/**
 * The ranges a reading's numbers must lie in, checked for built-in, configured and browser
 * readings alike. Each range says why it is what it is.
 */
export const READING_LIMITS = {
  /**
   * Width-deflation factor d (measured FWHM / core FWHM). 1 is no change; 10 lowers a mass with
   * FWHM exponent 2 by 2 dex, the "up to two orders of magnitude" of the scattering premise
   * (Brazzini et al. 2025, MNRAS Letters 544, L167, abstract; Rusakov et al. 2025, Nature).
   */
  deflation: { min: 1, max: 10, reason: 'the scattering premise lowers masses by up to two orders of magnitude (d = 10 for FWHM exponent 2)' },
  /** L_bol / λL5100: from well below the measured 5 (Greene et al. 2025) to twice the quasar 10.33 (Richards et al. 2006). */
  l5100Ratio: { min: 1, max: 20, reason: 'from below the measured 5 (Greene et al. 2025) to twice the quasar 10.33 (Richards et al. 2006)' },
  /** Line-based L_bol divisor: ~40 for Hα and ~10 for Hβ are published (Yanagisawa et al. 2026); 1 is no change. */
  lineFactor: { min: 1, max: 100, reason: 'the published factors are ~40 (Hα) and ~10 (Hβ) (Yanagisawa et al. 2026)' },
  /** Radiative efficiency ε: between 0 and the ~0.42 of a maximally spinning black hole (Bardeen 1970; common practice). */
  efficiency: { min: 0.01, max: 0.42, reason: 'between 0.01 and 0.42, the efficiency of a maximally spinning black hole' },
  /** Duty cycle: a fraction of the time. */
  dutyCycle: { min: 0.01, max: 1, reason: 'a fraction of the time, between 0.01 and 1' },
} as const;

export type ReadingLimitKey = keyof typeof READING_LIMITS;

/** Whether `x` lies in the range of `key` (inclusive). */
export function inReadingLimit(key: ReadingLimitKey, x: number): boolean {
  const r = READING_LIMITS[key];
  return Number.isFinite(x) && x >= r.min && x <= r.max;
}
