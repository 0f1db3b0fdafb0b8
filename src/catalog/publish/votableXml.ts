import type { ColumnDoc } from '../metadata/columnDoc.ts';
import type { TableDoc } from './tableDoc.ts';

const XML_ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };

/** Escapes text for XML content and attributes; drops the control characters XML 1.0 forbids. */
export function xmlText(s: string): string {
  // eslint-disable-next-line no-control-regex
  return s.replace(/[\u0000-\u0008\u000b\u000c\u000e-\u001f]/g, '').replace(/[&<>"']/g, (c) => XML_ESCAPES[c]!);
}

/** VOTable datatype of each output kind. */
const VOTABLE_DATATYPE: Record<ColumnDoc['kind'], string> = { float: 'double', int: 'long', bool: 'boolean', string: 'char' };

/** One FIELD element. */
function field(c: ColumnDoc): string {
  const attrs = [
    `name="${xmlText(c.name)}"`,
    `datatype="${VOTABLE_DATATYPE[c.kind]}"`,
    ...(c.kind === 'string' ? ['arraysize="*"'] : []),
    ...(c.unit ? [`unit="${xmlText(c.unit)}"`] : []),
    ...(c.ucd ? [`ucd="${xmlText(c.ucd)}"`] : []),
  ];
  return `      <FIELD ${attrs.join(' ')}>\n        <DESCRIPTION>${xmlText(c.description)}</DESCRIPTION>\n      </FIELD>`;
}

/**
 * The VOTable 1.4 document of a table up to its FIELDs, split where the DATA element goes:
 * `head + data + tail`. With an empty `data` it is the data-less VOTable of the IVOA VOParquet
 * 1.0 Note (Taylor et al. 2025), which goes into Parquet's `IVOA.VOTable-Parquet.content` key.
 */
export function votableParts(doc: TableDoc): { head: string; tail: string } {
  const params = doc.meta.map(([k, v]) => `      <INFO name="${xmlText(k)}" value="${xmlText(v)}"/>`);
  const head = [
    '<?xml version="1.0" encoding="UTF-8"?>',
    '<VOTABLE version="1.4" xmlns="http://www.ivoa.net/xml/VOTable/v1.3">',
    '  <RESOURCE type="results">',
    `    <TABLE name="${xmlText(doc.name)}">`,
    ...(doc.description ? [`      <DESCRIPTION>${xmlText(doc.description)}</DESCRIPTION>`] : []),
    ...params,
    ...doc.columns.map(field),
    '',
  ].join('\n');
  const tail = ['    </TABLE>', '  </RESOURCE>', '</VOTABLE>', ''].join('\n');
  return { head, tail };
}
