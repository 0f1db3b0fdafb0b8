import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';

/** Hex SHA-256 of a file's bytes, read as a stream (any size). */
export async function sha256File(path: string): Promise<string> {
  const hash = createHash('sha256');
  for await (const chunk of createReadStream(path)) hash.update(chunk as Buffer);
  return hash.digest('hex');
}

/** Hex SHA-256 of a text's UTF-8 bytes. */
export function sha256Text(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}
