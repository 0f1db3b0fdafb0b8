export { UnitError } from './unitError.ts';
export { CANONICAL_UNITS, KIND_SPECS, type KindSpec, type QuantityKind } from './quantityKind.ts';
export { unitConverter } from './unitConverter.ts';
export { describeUnit, type UnitDescription } from './describeUnit.ts';
export { parseUnit, type ParsedUnit } from './parseUnit.ts';
export { dimensionName, type Dimension } from './dimension.ts';
export { lookupSymbol, SI_PREFIXES, UNIT_SYMBOLS, type UnitSymbol } from './unitSymbols.ts';
export { VO_LOG_LUMINOSITY, VO_UNITS } from './voUnits.ts';
