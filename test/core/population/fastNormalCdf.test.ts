import { describe, expect, it } from 'vitest';
import { fastNormalCdf } from '../../../src/core/population/fastNormalCdf.ts';
import { normalCdf } from '../../../src/core/population/normalCdf.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('fastNormalCdf', () => {
  it('agrees with the series/continued-fraction Φ to 1e-9 relative from −37 to 8', () => {
    for (let x = -37; x <= 8; x += 0.0137) {
      expectClose(fastNormalCdf(x), normalCdf(x), { rtol: 1e-9, atol: 1e-12, source: 'internal: the accurate normalCdf, itself checked against scipy 1.10.1' });
    }
  });

  it('gives 0 below the table (x < −40), where Φ underflows, and 1 far above it', () => {
    // scipy 1.10.1 norm.cdf gives 0.0 at −40, −41, −45, −100 and −1e6 and 1.0 at 45 and 1e6 (ln Φ(−40) = −804.6,
    // below the smallest double's ln, −744.4). Below −40 the code takes the asymptote of ln Φ, not the table.
    for (const x of [-40, -41, -45, -100, -1e6]) expect(fastNormalCdf(x), `computed with scipy 1.10.1 norm.cdf(${x}) = 0.0`).toBe(0);
    for (const x of [45, 1e6]) expect(fastNormalCdf(x), `computed with scipy 1.10.1 norm.cdf(${x}) = 1.0`).toBe(1);
  });
});
