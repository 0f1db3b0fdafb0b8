import { describe, expect, it } from 'vitest';
import {
  CELL_EMPTY,
  CELL_NOT_A_NUMBER,
  CELL_NOT_BOOLEAN,
  CELL_NOT_FINITE,
  CELL_OK,
  cellResult,
  readBool,
  readNumber,
  showCell,
} from '../../../src/catalog/normalize/readCell.ts';
import type { Cell } from '../../../src/catalog/readers/types.ts';

const num = (c: Cell) => {
  const r = cellResult();
  readNumber(c, r);
  return r.status === CELL_OK ? r.num : r.status;
};
const bool = (c: Cell) => {
  const r = cellResult();
  readBool(c, r);
  return r.status === CELL_OK ? r.bool : r.status;
};

describe('readNumber', () => {
  it.each<[Cell, number]>([
    [3, 3], ['3', 3], [' -2.5e3 ', -2500], ['+7', 7], ['.5', 0.5], ['1E-18', 1e-18],
  ])('reads %j as %j', (c, want) => expect(num(c)).toBe(want));

  it.each<[Cell, number]>([
    [null, CELL_EMPTY], ['', CELL_EMPTY], ['   ', CELL_EMPTY],
    // NaN is missing, as an empty cell is (issue 8 item 9: one catalog in every format means the same).
    [NaN, CELL_EMPTY], ['nan', CELL_EMPTY], ['NaN', CELL_EMPTY], [' -nan ', CELL_EMPTY],
    [-Infinity, CELL_NOT_FINITE],
    ['inf', CELL_NOT_FINITE], ['-Inf', CELL_NOT_FINITE], ['+infinity', CELL_NOT_FINITE], ['Infinity', CELL_NOT_FINITE],
    ['abc', CELL_NOT_A_NUMBER], ['1,5', CELL_NOT_A_NUMBER], ['12abc', CELL_NOT_A_NUMBER], ['0x10', CELL_NOT_A_NUMBER],
    ['0b1', CELL_NOT_A_NUMBER], ['0o7', CELL_NOT_A_NUMBER], [true, CELL_NOT_A_NUMBER], ['infinite', CELL_NOT_A_NUMBER],
  ])('classifies %j as status %j', (c, want) => expect(num(c)).toBe(want));

  it('reads a leading zero as decimal', () => expect(num('007')).toBe(7));
});

describe('readBool', () => {
  it.each<[Cell, boolean | number]>([
    [true, true], [false, false], [1, true], [0, false], ['yes', true], ['NO', false], ['t', true], ['f', false],
    ['True', true], ['false', false], ['1', true], ['0', false], [null, CELL_EMPTY], [' ', CELL_EMPTY],
    ['maybe', CELL_NOT_BOOLEAN], [2, CELL_NOT_BOOLEAN], ['y', CELL_NOT_BOOLEAN], ['truest', CELL_NOT_BOOLEAN],
  ])('reads %j as %j', (c, want) => expect(bool(c)).toBe(want));
});

describe('showCell', () => {
  it('shows text as written (trimmed) and numbers in shortest form', () => {
    expect(showCell(' -1.20e3 ')).toBe('-1.20e3');
    expect(showCell(-1200)).toBe('-1200');
    expect(showCell(NaN)).toBe('NaN');
  });

  it('cuts long text to 40 characters', () => {
    expect(showCell('a'.repeat(50))).toBe(`${'a'.repeat(37)}...`);
    expect(showCell('a'.repeat(40))).toBe('a'.repeat(40));
  });
});
