/** Thrown for a unit string that cannot be read or does not fit the quantity; the message names the unit. */
export class UnitError extends Error {
  override name = 'UnitError';
}
