import { open } from 'node:fs/promises';
import type { ExportFormat } from '../config/publicationConfig.ts';

/** Most bytes read from the start of a file to find our header (ours hold it in the first few kilobytes per column). */
const MAX_HEAD_BYTES = 8 << 20;

/**
 * What marks each extra copy as ours, in the file's header: the format's own start, then the
 * tool entry every export writes from the table's metadata (`tool: dawn-census …` in the ECSV
 * YAML header, `<INFO name="tool" value="dawn-census …"/>` in the VOTable, the `CREATOR` card
 * of the FITS table).
 */
const SIGNATURE: Record<ExportFormat, { start: string; tool: RegExp }> = {
  ecsv: { start: '# %ECSV ', tool: /^#\s+tool: ['"]?dawn-census /m },
  votable: { start: '<?xml', tool: /<INFO name="tool" value="dawn-census / },
  fits: { start: 'SIMPLE  =', tool: /CREATOR = 'dawn-census / },
};

/**
 * Whether the regular file at `path` is an ECSV, VOTable or FITS copy this tool wrote (see
 * exportCatalog): it starts as the format does and its header names dawn-census as the tool.
 * Reads at most 8 MiB from the start; a read error counts as "not ours".
 */
export async function isToolExport(path: string, format: ExportFormat): Promise<boolean> {
  const file = await open(path, 'r').catch(() => null);
  if (!file) return false;
  try {
    const buf = Buffer.alloc(MAX_HEAD_BYTES);
    const { bytesRead } = await file.read(buf, 0, MAX_HEAD_BYTES, 0);
    const head = buf.subarray(0, bytesRead).toString('latin1');
    const sig = SIGNATURE[format];
    if (!head.startsWith(sig.start)) return false;
    // Only the header counts: the ECSV's comment lines, the VOTable before its data, the FITS cards before END.
    const end = format === 'ecsv' ? headerEndEcsv(head) : format === 'votable' ? head.indexOf('<DATA') : fitsHeaderEnd(head);
    return sig.tool.test(end < 0 ? head : head.slice(0, end));
  } catch {
    return false;
  } finally {
    await file.close().catch(() => undefined);
  }
}

/** Index of the first line of an ECSV text that is not a comment (the column names), or -1. */
function headerEndEcsv(text: string): number {
  const m = /^[^#]/m.exec(text);
  return m ? m.index : -1;
}

/** Index just past the header of the FITS table extension (the second END card), or -1. */
function fitsHeaderEnd(text: string): number {
  let ends = 0;
  for (let at = 0; at + 80 <= text.length; at += 80) {
    if (text.startsWith('END     ', at) || text.slice(at, at + 80) === 'END'.padEnd(80)) {
      ends += 1;
      if (ends === 2) return at + 80;
    }
  }
  return -1;
}
