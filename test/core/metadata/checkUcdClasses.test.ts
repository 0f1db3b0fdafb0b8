import { describe, expect, it } from 'vitest';
import { checkUcd } from '../../../src/core/metadata/index.ts';

describe('checkUcd word classes', () => {
  it('lets photometric, colour and either-place words stand first or later, ignores case and spaces around words, and names the word as the list spells it', () => {
    // Classes from the UCD1+ 1.5 list (ucd-list.txt): E phot.count, C phot.color, Q stat.percentile, S arith.ratio, P meta.code.
    expect(checkUcd('phot.count;phot.color')).toBeNull();
    expect(checkUcd('phys.mass;phot.count')).toBeNull();
    expect(checkUcd('stat.percentile')).toBeNull();
    expect(checkUcd('phys.mass;stat.percentile')).toBeNull();
    expect(checkUcd(' PHYS.MASS ; stat.median ')).toBeNull();
    expect(checkUcd('   ')).toBe('is empty');
    expect(checkUcd('phys.mass;')).toBe('has an empty word in "phys.mass;"');
    expect(checkUcd('ARITH.RATIO')).toBe('"arith.ratio" may only follow another word (it is a secondary word), not start a UCD');
    expect(checkUcd('phys.mass;META.CODE')).toBe('"meta.code" may only start a UCD (it is a primary word)');
    expect(checkUcd('phys.mass;Phys.Mas')).toBe('"Phys.Mas" is not a UCD1+ word');
  });
});
