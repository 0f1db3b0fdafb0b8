/**
 * How a published catalog is cited, in the forms readers and tools expect: a BibTeX entry,
 * CITATION.cff (Citation File Format 1.2.0) and schema.org Dataset metadata (JSON-LD), all
 * from the catalog's metadata sidecar (title, group, description, licence, citation,
 * publication: authors with ORCID iDs, version, DOI).
 */

/** The parts of the sidecar these forms use. */
export interface CitableCatalog {
  title?: string;
  group?: string;
  description?: string;
  licence?: string;
  citation?: string;
  publication?: { authors?: { name: string; orcid?: string; affiliation?: string }[]; version?: string; doi?: string };
  tool?: { name: string; version: string };
}

/** Year of the build, injected so that output is reproducible in tests. */
const bibEscape = (s: string): string => s.replace(/[\\{}]/g, (c) => `\\${c}`).replace(/[&%$#_]/g, (c) => `\\${c}`);

/** A BibTeX `@misc` entry for the catalog; `url` is where the site is published, when known. */
export function bibtexOf(c: CitableCatalog, year: number, url?: string): string {
  // One braced value: persons joined by "and" (BibTeX splits them into first and last names; a
  // name that itself holds the word "and" is braced so it stays one name); a group doubly braced,
  // so that it is one name and not split into first and last.
  const person = (name: string): string => (/\band\b/i.test(name) ? `{${bibEscape(name)}}` : bibEscape(name));
  const authors = c.publication?.authors?.length
    ? `{${c.publication.authors.map((a) => person(a.name)).join(' and ')}}`
    : `{{${bibEscape(c.group ?? 'Anonymous')}}}`;
  const key = (c.publication?.authors?.[0]?.name.split(/\s+/).pop() ?? c.group ?? 'catalog').replace(/[^A-Za-z0-9]/g, '') + year;
  const fields: [string, string | undefined][] = [
    ['author', authors],
    ['title', c.title ? `{${bibEscape(c.title)}}` : undefined],
    ['year', String(year)],
    ['version', c.publication?.version ? `{${bibEscape(c.publication.version)}}` : undefined],
    ['doi', c.publication?.doi ? `{${c.publication.doi}}` : undefined],
    ['url', url ? `{${url}}` : undefined],
    ['note', c.citation ? `{${bibEscape(c.citation)}}` : undefined],
  ];
  return `@misc{${key},\n${fields
    .filter((f): f is [string, string] => f[1] !== undefined)
    .map(([k, v]) => `  ${k} = ${v}`)
    .join(',\n')}\n}\n`;
}

const yamlString = (s: string): string => JSON.stringify(s);

/** CITATION.cff (Citation File Format 1.2.0) for the catalog as a dataset. */
export function citationCffOf(c: CitableCatalog, url?: string): string {
  const lines = ['cff-version: 1.2.0', `message: ${yamlString(c.citation ? `Please cite this catalog as: ${c.citation}` : 'Please cite this catalog as below.')}`, 'type: dataset'];
  lines.push(`title: ${yamlString(c.title ?? 'Derived catalog')}`);
  if (c.publication?.version) lines.push(`version: ${yamlString(c.publication.version)}`);
  if (c.publication?.doi) lines.push(`doi: ${yamlString(c.publication.doi)}`);
  if (c.licence) lines.push(`license: ${yamlString(c.licence)}`);
  if (url) lines.push(`url: ${yamlString(url)}`);
  if (c.description) lines.push(`abstract: ${yamlString(c.description)}`);
  lines.push('authors:');
  const authors = c.publication?.authors?.length ? c.publication.authors : [{ name: c.group ?? 'Anonymous' }];
  for (const a of authors) {
    lines.push(`  - name: ${yamlString(a.name)}`);
    if ('orcid' in a && a.orcid) lines.push(`    orcid: ${yamlString(`https://orcid.org/${a.orcid}`)}`);
    if ('affiliation' in a && a.affiliation) lines.push(`    affiliation: ${yamlString(a.affiliation)}`);
  }
  return lines.join('\n') + '\n';
}

/** schema.org Dataset metadata, as an object to be written as JSON-LD. */
export function datasetJsonLd(c: CitableCatalog, downloads: { name: string; url: string; type: string }[], url?: string): Record<string, unknown> {
  const authors = c.publication?.authors?.map((a) => ({ '@type': 'Person', name: a.name, ...(a.orcid ? { '@id': `https://orcid.org/${a.orcid}` } : {}) }));
  return {
    '@context': 'https://schema.org',
    '@type': 'Dataset',
    name: c.title ?? 'Derived catalog',
    ...(c.description ? { description: c.description } : {}),
    ...(url ? { url } : {}),
    ...(c.publication?.doi ? { identifier: `https://doi.org/${c.publication.doi}` } : {}),
    ...(c.publication?.version ? { version: c.publication.version } : {}),
    ...(c.licence ? { license: c.licence } : {}),
    ...(authors?.length ? { creator: authors } : c.group ? { creator: { '@type': 'Organization', name: c.group } } : {}),
    ...(c.citation ? { citation: c.citation } : {}),
    distribution: downloads.map((d) => ({ '@type': 'DataDownload', name: d.name, contentUrl: d.url, encodingFormat: d.type })),
  };
}

/** JSON for a `<script type="application/ld+json">`: '<' escaped so the text cannot close the element. */
export function jsonLdText(v: unknown): string {
  return JSON.stringify(v).replace(/</g, '\\u003c');
}
