/**
 * A physical constant or nominal value as a data record: the number, its unit and where it
 * comes from (standard, table or resolution).
 */
export interface CitedConstant {
  /** The value in `unit`. */
  readonly value: number;
  /** Unit of `value` (cgs unless stated). */
  readonly unit: string;
  /** Source: standard, table or resolution. */
  readonly reference: string;
}
