export * from './types.ts';
export { deriveObject } from './deriveObject.ts';
export { DEFAULT_SETTINGS } from './defaultSettings.ts';
export { FLAG_DESCRIPTIONS, type FlagId } from './flags.ts';
export { planObject, type ObjectPlan } from './objectPlan.ts';
