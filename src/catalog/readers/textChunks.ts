import { CatalogError } from './CatalogError.ts';
import { readBytes, READ_BYTES } from './byteStream.ts';
import { DEFAULT_GZIP_LIMITS, type GzipLimits } from './gzipLimits.ts';

/** Bytes read from disk per step for the text formats (1 MiB keeps memory flat and syscalls few). */
export const TEXT_READ_BYTES = READ_BYTES;

const decoder = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true });

/**
 * Streams a UTF-8 text file as decoded strings, without ever holding the whole file. A
 * gzip-compressed file (magic bytes 1f 8b) is decompressed on the fly.
 *
 * A leading byte-order mark is dropped. An invalid byte sequence raises a {@link CatalogError}
 * `<file>: line N: invalid UTF-8 byte sequence`, N being the 1-based line of the bad byte.
 * Multi-byte characters split across reads are carried over, so every yielded string is whole.
 *
 * @param path - file to read
 * @param label - file name used in error messages
 * @param limits - bounds on the decompressed bytes of a gzip file (see readBytes)
 */
export async function* readTextChunks(path: string, label: string, limits: Readonly<GzipLimits> = DEFAULT_GZIP_LIMITS): AsyncGenerator<string> {
  let carry: Buffer | null = null;
  let linesBefore = 0;
  let first = true;
  for await (const raw of readBytes(path, label, limits)) {
    let buf: Buffer = carry ? Buffer.concat([carry, raw]) : raw;
    if (first) {
      first = false;
      if (buf.length >= 3 && buf[0] === 0xef && buf[1] === 0xbb && buf[2] === 0xbf) buf = buf.subarray(3);
    }
    const cut = completePrefixLength(buf);
    carry = cut < buf.length ? Buffer.from(buf.subarray(cut)) : null;
    const whole = buf.subarray(0, cut);
    yield decodeOrThrow(whole, linesBefore, label);
    linesBefore += countNewlines(whole);
  }
  if (carry) decodeOrThrow(carry, linesBefore, label); // an incomplete sequence at end of file
}

function decodeOrThrow(buf: Buffer, linesBefore: number, label: string): string {
  try {
    return decoder.decode(buf);
  } catch {
    const bad = firstInvalidUtf8(buf);
    const line = linesBefore + countNewlines(buf.subarray(0, bad)) + 1;
    throw new CatalogError(`${label}: line ${line}: invalid UTF-8 byte sequence`);
  }
}

/** Length of the longest prefix of `buf` that does not end inside a multi-byte character. */
function completePrefixLength(buf: Buffer): number {
  const n = buf.length;
  for (let k = 1; k <= 3 && k <= n; k++) {
    const b = buf[n - k]!;
    if ((b & 0xc0) === 0x80) continue; // continuation byte: look further back
    const need = b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : b >= 0xc0 ? 2 : 1;
    return need > k ? n - k : n;
  }
  return n;
}

/** Counts LF bytes (a CRLF file counts each line once). */
export function countNewlines(buf: Uint8Array): number {
  let n = 0;
  let i = buf.indexOf(10);
  while (i !== -1) {
    n++;
    i = buf.indexOf(10, i + 1);
  }
  return n;
}

/** Byte offset of the first invalid UTF-8 sequence (only called on the error path). */
function firstInvalidUtf8(buf: Uint8Array): number {
  let i = 0;
  while (i < buf.length) {
    const b = buf[i]!;
    let need: number;
    let min: number;
    if (b < 0x80) { i++; continue; }
    if (b >= 0xc2 && b <= 0xdf) { need = 1; min = 0x80; }
    else if (b >= 0xe0 && b <= 0xef) { need = 2; min = 0x800; }
    else if (b >= 0xf0 && b <= 0xf4) { need = 3; min = 0x10000; }
    else return i;
    let cp = b & (0x3f >> need);
    for (let k = 1; k <= need; k++) {
      const c = buf[i + k];
      if (c === undefined || (c & 0xc0) !== 0x80) return i;
      cp = (cp << 6) | (c & 0x3f);
    }
    if (cp < min || cp > 0x10ffff || (cp >= 0xd800 && cp <= 0xdfff)) return i;
    i += need + 1;
  }
  return buf.length;
}
