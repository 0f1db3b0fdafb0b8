import { describe, expect, it } from 'vitest';
import { detachOnce } from '../../../src/shared/workers/detachOnce.ts';

describe('detachOnce', () => {
  it('detaches a buffer by transferring it, as the first answer of a batch would', () => {
    // A detached ArrayBuffer reports zero length (ECMA-262 DetachArrayBuffer sets its byte length to 0).
    const buffer = detachOnce();
    expect(buffer.byteLength).toBe(0);
    expect(() => new Float64Array(buffer)).toThrow(TypeError);
  });
});
