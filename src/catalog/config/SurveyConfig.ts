import type { LineId } from '../../core/derive/types.ts';
import type { EddingtonRatioDistribution } from '../../core/population/eddingtonRatioDistribution.ts';
import type { SurveySpec } from '../../core/population/surveySpec.ts';

/** The `survey:` block of a census config, validated. */
export interface SurveyConfig {
  readonly spec: SurveySpec;
  /** Catalog column naming each object's field (required with more than one field). */
  readonly fieldColumn?: string;
  /** Per line, a catalog column holding each object's own limiting flux (erg s⁻¹ cm⁻² after `flux_unit`). */
  readonly limitColumns: Partial<Record<LineId, string>>;
  /** Multiplier taking the limit values as written to erg s⁻¹ cm⁻². */
  readonly fluxScale: number;
  readonly fit: {
    readonly eddingtonRatio: EddingtonRatioDistribution;
    readonly mStarRange: readonly [number, number];
    readonly walkers: number;
    readonly steps: number;
    readonly burn: number;
  };
  readonly densities: {
    /** Bin edges of log M_BH and log L_bol (dex). */
    readonly logMbhEdges: readonly number[];
    readonly logLbolEdges: readonly number[];
    /** Redshift ranges [lo, hi). */
    readonly zRanges: readonly (readonly [number, number])[];
  };
}
