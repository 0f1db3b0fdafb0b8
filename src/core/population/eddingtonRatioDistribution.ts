/**
 * The Eddington-ratio distribution assumed for the intrinsic population: log-normal in λ_Edd.
 * Not fitted: a flux-limited sample constrains it only together with the relation's
 * normalisation, so it is an assumption stated in the output.
 */
export interface EddingtonRatioDistribution {
  /** Mean of log10 λ_Edd. */
  readonly meanLog: number;
  /** Standard deviation of log10 λ_Edd, dex. */
  readonly sigmaLog: number;
  readonly reference: string;
}

/**
 * Default: log λ_Edd ~ N(−0.6, 0.4). Common practice, no source: broad-line samples at z > 4 report median
 * log λ_Edd between about −1 and 0 under the standard virial and bolometric recipe.
 */
export const DEFAULT_EDDINGTON_RATIO_DISTRIBUTION: EddingtonRatioDistribution = {
  meanLog: -0.6,
  sigmaLog: 0.4,
  reference: 'common practice, no source (typical of published z > 4 broad-line samples under the standard recipe)',
};
