import { createReadStream } from 'node:fs';
import { open } from 'node:fs/promises';
import { createGunzip } from 'node:zlib';
import { CatalogError } from './CatalogError.ts';
import { DEFAULT_GZIP_LIMITS, GZIP_RATIO_FLOOR_BYTES, type GzipLimits } from './gzipLimits.ts';

/** Bytes read from disk per step (1 MiB keeps memory flat and syscalls few). */
export const READ_BYTES = 1 << 20;

/** Compressed bytes read per step from a gzip file. */
const GZIP_READ_BYTES = 64 << 10;

/** True when the file begins with the gzip magic bytes 1f 8b. */
export async function isGzipFile(path: string): Promise<boolean> {
  const fh = await open(path, 'r');
  try {
    const b = Buffer.alloc(2);
    const { bytesRead } = await fh.read(b, 0, 2, 0);
    return bytesRead === 2 && b[0] === 0x1f && b[1] === 0x8b;
  } finally {
    await fh.close();
  }
}

/**
 * Streams the bytes of a file, decompressed when it is gzip (detected from its magic bytes,
 * whatever its name). A corrupt or truncated gzip stream is a {@link CatalogError}
 * `<file>: corrupt gzip data (...)`. Memory is bounded by one read buffer. Decompressed bytes
 * are bounded by `limits` (see gzipLimits.ts): more than `maxBytes` in all, or more than
 * `maxRatio` per compressed byte read once 16 MiB have come out, is a CatalogError naming the
 * config key that raises the bound.
 *
 * @param path - file to read
 * @param label - file name used in error messages
 * @param limits - bounds on the decompressed bytes of a gzip file
 */
export async function* readBytes(path: string, label: string, limits: Readonly<GzipLimits> = DEFAULT_GZIP_LIMITS): AsyncGenerator<Buffer> {
  const gz = await isGzipFile(path);
  // Compressed input is read in small steps, so the ratio check sees a bomb after a few megabytes out.
  const file = createReadStream(path, { highWaterMark: gz ? GZIP_READ_BYTES : READ_BYTES });
  const stream = gz ? file.pipe(createGunzip({ chunkSize: 256 * 1024 })) : file;
  let compressed = 0;
  let expanded = 0;
  if (gz) {
    file.on('error', (e) => stream.destroy(e));
    file.on('data', (b) => { compressed += b.length; });
  }
  try {
    for await (const b of stream as AsyncIterable<Buffer>) {
      if (gz) {
        expanded += b.length;
        if (expanded > limits.maxBytes) {
          throw new CatalogError(`${label}: gzip data expands to more than ${formatBytes(limits.maxBytes)}; stopped (raise input.gzip_max_gb in the config if the catalog really is that large)`);
        }
        if (expanded > GZIP_RATIO_FLOOR_BYTES && expanded > limits.maxRatio * compressed) {
          throw new CatalogError(`${label}: gzip data expands more than ${limits.maxRatio} times (${formatBytes(expanded)} from ${formatBytes(compressed)} so far), as a decompression bomb does; stopped (raise input.gzip_max_ratio in the config if the catalog is right)`);
        }
      }
      yield b;
    }
  } catch (e) {
    const err = e as NodeJS.ErrnoException;
    if (gz && typeof err.code === 'string' && err.code.startsWith('Z_')) {
      throw new CatalogError(`${label}: corrupt gzip data (${err.message.split('\n')[0]})`);
    }
    throw e;
  } finally {
    stream.destroy();
    file.destroy();
  }
}

/**
 * Positional reads over a byte stream that only moves forward: `read` at a position behind the
 * last one read is a programming error. Used for gzip-compressed FITS files, which the FITS
 * reader walks from start to end.
 */
export class ForwardReader {
  private readonly it: AsyncIterator<Buffer>;
  private pending: Buffer = Buffer.alloc(0);
  /** File position of `pending[0]`. */
  private at = 0;
  private done = false;

  constructor(source: AsyncIterable<Buffer>) {
    this.it = source[Symbol.asyncIterator]();
  }

  /** Same contract as FileHandle.read: copies up to `length` bytes at `position` into `buffer` at `offset`. */
  async read(buffer: Buffer, offset: number, length: number, position: number): Promise<{ bytesRead: number }> {
    if (position < this.at) throw new Error(`ForwardReader: read at ${position} behind ${this.at}`);
    // Skip to `position`, then fill.
    while (!this.done && this.at + this.pending.length < position + length) {
      if (this.at + this.pending.length <= position) {
        this.at += this.pending.length;
        this.pending = Buffer.alloc(0);
      }
      const r = await this.it.next();
      if (r.done) { this.done = true; break; }
      this.pending = this.pending.length ? Buffer.concat([this.pending, r.value]) : r.value;
    }
    const from = Math.max(0, position - this.at);
    const n = Math.max(0, Math.min(length, this.pending.length - from));
    this.pending.copy(buffer, offset, from, from + n);
    // Keep only what is at or after the end of this read.
    const keep = from + n;
    this.pending = this.pending.subarray(keep);
    this.at += keep;
    return { bytesRead: n };
  }

  /** Stops the underlying stream. */
  async close(): Promise<void> {
    await this.it.return?.();
  }
}

/** Bytes in decimal units, e.g. "64 GB", "1.2 MB". */
function formatBytes(n: number): string {
  const units = ['bytes', 'kB', 'MB', 'GB', 'TB'];
  let u = 0;
  let v = n;
  while (v >= 1000 && u < units.length - 1) { v /= 1000; u++; }
  return `${u === 0 ? v : Number(v.toPrecision(3))} ${units[u]}`;
}
