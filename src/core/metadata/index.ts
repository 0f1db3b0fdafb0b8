export { checkUcd } from './checkUcd.ts';
export { UCD_LIST_SOURCE, UCD_WORDS, type UcdSyllable } from './ucdWords.ts';
