/** 2^n for integer n in [−1074, 1023], by table: exact, and cheaper than building the double from its words. */
const OFFSET = 1074;
const TABLE = new Float64Array(OFFSET + 1024);
TABLE[OFFSET] = 1;
for (let n = 1; n <= 1023; n++) TABLE[OFFSET + n] = (TABLE[OFFSET + n - 1] as number) * 2;
for (let n = -1; n >= -1074; n--) TABLE[OFFSET + n] = (TABLE[OFFSET + n + 1] as number) * 0.5;

/** 2^n, exact, for integer n in [−1074, 1023] (undefined outside). */
export function pow2(n: number): number {
  return TABLE[OFFSET + n] as number;
}
