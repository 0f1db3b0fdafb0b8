import type { DeriveSettings } from './types.ts';

/** Monte Carlo draws per object of these settings (at least one). */
export const drawCount = (settings: DeriveSettings): number => Math.max(1, Math.floor(settings.draws));
