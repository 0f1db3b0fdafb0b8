import { open } from 'node:fs/promises';

/** Largest Parquet footer or JSON file read to recognise one of our outputs (our own are far smaller). */
export const MAX_SIGNATURE_BYTES = 64 << 20;

/** Reads `length` bytes at `position` (fewer at the end of the file). */
export type ReadAt = (position: number, length: number) => Promise<Buffer>;

/**
 * Opens `path` read-only and answers `test(read, size)`; a file that cannot be opened, any read
 * or parse error, counts as "not ours" (false). The file is always closed.
 */
export async function testFileSignature(path: string, test: (read: ReadAt, size: number) => Promise<boolean>): Promise<boolean> {
  const file = await open(path, 'r').catch(() => null);
  if (!file) return false;
  try {
    const { size } = await file.stat();
    const read: ReadAt = async (position, length) => {
      const buf = Buffer.alloc(length);
      const { bytesRead } = await file.read(buf, 0, length, position);
      return buf.subarray(0, bytesRead);
    };
    return await test(read, size);
  } catch {
    return false;
  } finally {
    await file.close().catch(() => undefined);
  }
}

/** A Parquet file's footer (PAR1 at both ends, footer length within bounds), or null when the file is not one. */
export async function parquetFooter(read: ReadAt, size: number): Promise<Buffer | null> {
  if (size < 12 || (await read(0, 4)).toString('latin1') !== 'PAR1') return null;
  const tail = await read(size - 8, 8);
  if (tail.subarray(4).toString('latin1') !== 'PAR1') return null;
  const footerLength = tail.readUInt32LE(0);
  if (footerLength > Math.min(size - 12, MAX_SIGNATURE_BYTES)) return null;
  return read(size - 8 - footerLength, footerLength);
}
