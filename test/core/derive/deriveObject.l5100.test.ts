import { describe, expect, it } from 'vitest';
import { deriveObject } from '../../../src/core/derive/deriveObject.ts';
import { DEFAULT_SETTINGS } from '../../../src/core/derive/defaultSettings.ts';
import { createRng } from '../../../src/core/random/createRng.ts';
import { seedFor } from '../../../src/core/random/seedFor.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const rngFor = (id: string) => createRng(seedFor(DEFAULT_SETTINGS.seed, id));

describe('deriveObject: log_l5100 when no continuum is measured', () => {
  it('estimates λL5100 from broad Hα by Greene & Ho 2005 eq. 1 inverted', () => {
    const d = deriveObject({ id: 'l5100-ha', z: 5, lines: { halpha: { lumErgS: { value: 1e43 }, fwhmKms: { value: 2000 } } }, av: { value: 0 } }, DEFAULT_SETTINGS, rngFor('l5100-ha'));
    // Greene & Ho 2005, ApJ 630, 122, eq. 1: L_Hα = 5.25e42 (λL5100/1e44)^1.157, inverted (closed form)
    expectClose(d.logL5100!, 44 + (43 - Math.log10(5.25e42)) / 1.157, { atol: 1e-12, source: 'GH05 eq. 1 inverted, closed form' });
  });

  it('leaves it empty when neither a continuum nor a Balmer line is given', () => {
    const d = deriveObject({ id: 'l5100-mg', z: 6, lines: { mgii: { fwhmKms: { value: 3000 } } }, lamL3000: { value: 1e45 } }, DEFAULT_SETTINGS, rngFor('l5100-mg'));
    expect(d.logL5100).toBeNull();
  });
});
