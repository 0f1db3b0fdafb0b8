import type { ColumnKind } from './types.ts';
import { hasLeadingZero, isBoolText, isIntegerText, isNumberText } from './cellText.ts';

/**
 * Infers the kind of one text column from every one of its cells (the full first pass of the
 * CSV/TSV reader).
 *
 * Rules: all non-empty cells integers → `int`; all numeric (incl. NaN/inf spellings) → `float`;
 * all `true`/`false` → `bool`; otherwise `string`. Two deliberate choices:
 * - an all-integer column holding a value beyond ±(2^53 − 1) becomes `string`, so that 64-bit
 *   identifiers are never silently rounded;
 * - a numeric column holding a value with a leading zero (`007`, `0042`) becomes `string`, so
 *   that codes and field names written with leading zeros keep them;
 * - a column with no non-empty cell at all becomes `float` (a missing measurement is the common
 *   case in a catalog; every cell is null anyway).
 */
export class KindInference {
  private anyValue = false;
  private allInt = true;
  private allNumber = true;
  private allBool = true;
  private unsafeInt = false;
  private leadingZero = false;

  /** Records one non-empty cell. */
  add(s: string): void {
    this.anyValue = true;
    if (!this.leadingZero && s.length > 1 && hasLeadingZero(s)) this.leadingZero = true;
    if (this.allInt) {
      if (isIntegerText(s)) {
        if (!this.unsafeInt && s.length > 15 && !Number.isSafeInteger(Number(s))) this.unsafeInt = true;
        this.allBool = false;
        return;
      }
      this.allInt = false;
    }
    if (this.allNumber) {
      if (isNumberText(s)) { this.allBool = false; return; }
      this.allNumber = false;
    }
    if (this.allBool && !isBoolText(s)) this.allBool = false;
  }

  /** The inferred kind, once every cell has been added. */
  get kind(): ColumnKind {
    if (!this.anyValue) return 'float';
    if (this.leadingZero && this.allNumber) return 'string';
    if (this.allInt) return this.unsafeInt ? 'string' : 'int';
    if (this.allNumber) return 'float';
    return this.allBool ? 'bool' : 'string';
  }
}
