import type { Cosmology } from '../../core/cosmology/cosmology.ts';
import type { LineId } from '../../core/derive/types.ts';
import { vmax } from '../../core/population/vmax.ts';
import type { SurveySpec } from '../../core/population/surveySpec.ts';
import { CALIBRATIONS } from '../../core/virial/calibrations.ts';
import type { SurveyConfig } from '../config/SurveyConfig.ts';
import { CatalogError } from '../readers/CatalogError.ts';
import type { PopulationRow } from './readPopulationRows.ts';

/** One object's place in the survey. */
export interface ObjectVolume {
  readonly id: string;
  readonly field: number | null;
  readonly line: LineId | null;
  readonly vmaxCmpc3: number | null;
  readonly vOverVmax: number | null;
  /** The object would not pass the survey's criteria as described (kept, flagged `below_survey_limit`). */
  readonly belowLimit: boolean;
  /** Why it has no V_max, in words (null when it has one). */
  readonly reason: string | null;
  /** The object's own limiting flux (per-object limit column), erg s⁻¹ cm⁻². */
  readonly limitCgs?: number;
}

const lineOf = (method: string | null): LineId | null => (method ? ((CALIBRATIONS as Record<string, { line: LineId }>)[method]?.line ?? null) : null);

/**
 * Places every object in the survey: its field (by the field column), its detection line (the line its mass came
 * from), and its V_max. Objects that cannot be placed are kept with a reason. Throws CatalogError (exit 2) when an
 * object names no known field, or when the spectrograph's range excludes every line the fields search.
 * @param label - the catalog as named in messages.
 */
export function objectVolumes(rows: readonly PopulationRow[], survey: SurveyConfig, cosmo: Cosmology, label: string): ObjectVolume[] {
  const spec = survey.spec;
  const fieldIndex = new Map(spec.fields.map((f, i) => [f.name, i]));
  const unknown = rows.filter((r) => !r.flags.includes('invalid_input') && survey.fieldColumn !== undefined && (r.field === null || !fieldIndex.has(r.field)));
  if (unknown.length > 0) {
    const first = unknown[0] as PopulationRow;
    throw new CatalogError(
      `${label}: ${unknown.length} object${unknown.length === 1 ? '' : 's'} in no survey field (first: id ${first.id}, ${survey.fieldColumn} = ${first.field === null ? 'empty' : JSON.stringify(first.field)}); fields: ${spec.fields.map((f) => f.name).join(', ')}`,
    );
  }
  return rows.map((r): ObjectVolume => {
    const field = survey.fieldColumn === undefined ? 0 : (fieldIndex.get(r.field as string) ?? null);
    const line = lineOf(r.mbhMethod);
    const none = (reason: string, belowLimit = false): ObjectVolume => ({ id: r.id, field, line, vmaxCmpc3: null, vOverVmax: null, belowLimit, reason });
    if (r.flags.includes('invalid_input')) return none('invalid input row');
    if (r.z === null || field === null) return none('no redshift or field');
    if (line === null) return none('no black-hole mass, so no detection line');
    const f = r.flux[line];
    if (!f || f.value === null) return none(`no observed ${line} flux`);
    if (r.flags.includes('mbh_upper_limit')) return none(`the ${line} flux is an upper limit`, true);
    const own = f.limit;
    let s: SurveySpec = spec;
    if (survey.limitColumns[line] !== undefined) {
      if (own === null || !(own > 0)) return none(`no own limiting flux in ${survey.limitColumns[line]}`);
      // The object's own limit stands for the depth at its position in every field (documented).
      s = { ...spec, fields: spec.fields.map((fl) => ({ ...fl, limits: { ...fl.limits, [line]: { kind: 'constant', fluxCgs: own } } })) };
    }
    if (!s.fields[field]?.limits[line]) return none(`field ${spec.fields[field]?.name} has no ${line} limit`);
    const v = vmax(cosmo, s, { z: r.z, line, fluxObsCgs: f.value, ...(f.err !== null ? { fluxErrCgs: f.err } : {}) }, field);
    if (v.belowLimit) return { ...none(`below the ${line} limit, S/N or window of field ${spec.fields[field]?.name}`, true), ...(own !== null ? { limitCgs: own } : {}) };
    return {
      id: r.id, field, line, vmaxCmpc3: v.vmaxCmpc3, vOverVmax: (v.vCmpc3 as number) / (v.vmaxCmpc3 as number), belowLimit: false, reason: null,
      ...(own !== null ? { limitCgs: own } : {}),
    };
  });
}
