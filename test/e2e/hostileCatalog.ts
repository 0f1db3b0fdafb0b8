/**
 * A hostile catalog for the safety tests: ids, passthrough columns and the config's texts hold
 * markup that would run script if a page inserted it as HTML. Every payload sets
 * `window.__pwned` and calls alert(), so a test can check both.
 */

/** Texts that must render as text, never as markup. */
export const HOSTILE_IDS = [
  '<script>window.__pwned=1;alert(1)</script>',
  '"onerror=window.__pwned=1;alert(1)',
  '<img src=x onerror="window.__pwned=1;alert(1)">',
  '\'><svg onload=window.__pwned=1>',
  '天体 Ελληνικά "quoted" & <b>bold</b>',
];

/** A row that fails validation (a negative width), with markup in its id and in the rejected value's neighbours. */
export const HOSTILE_INVALID_ID = '<i>rejected</i> row';
/** The width it gives, which the build rejects. */
export const HOSTILE_INVALID_FWHM = '-350';

const NOTE = '<img src=x onerror="window.__pwned=1;alert(1)"> 天体 Ελληνικά';

const csvField = (s: string) => (/[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s);

/** The hostile catalog as CSV (canonical column names; fluxes in erg s^-1 cm^-2). */
export function hostileCsv(): string {
  const head = 'id,z,fwhm_halpha,fwhm_halpha_err,flux_halpha,flux_halpha_err,log_mstar,log_mstar_err,field,notes';
  const rows = HOSTILE_IDS.map((id, i) =>
    [id, (5 + i * 0.9).toFixed(2), String(1800 + 300 * i), '150', `${(2 + i) * 1e-18}`, '3e-19', (9 + 0.3 * i).toFixed(2), '0.3', `<script>window.__pwned=1</script>F${i}`, NOTE]
      .map(csvField)
      .join(','),
  );
  const invalid = [HOSTILE_INVALID_ID, '9.90', HOSTILE_INVALID_FWHM, '150', '4e-18', '3e-19', '10.00', '0.3', 'F9', NOTE].map(csvField).join(',');
  return [head, ...rows, invalid].join('\n') + '\n';
}

/** A config whose free texts are hostile too. */
export const HOSTILE_CONFIG = `title: "Hostile <script>window.__pwned=1;alert(1)</script> 天体"
group: "<img src=x onerror=\\"window.__pwned=1\\"> group"
description: "Description with <b>markup</b> & \\"quotes\\""
licence: "CC-BY-4.0 <i>x</i>"
citation: "Cite <script>window.__pwned=1</script> Ελληνικά"
draws: 200
seed: 3
`;
