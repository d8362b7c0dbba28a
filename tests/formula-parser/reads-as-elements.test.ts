// readsAsElements scans the text by hand (it runs for every abbreviation at start-up); it must
// agree with the plain definition: every word of a capital and its lower-case letters is D, T or
// an element symbol, and nothing else is in the text.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readsAsElements } from '../../src/formula-parser/abbreviations.js';
import { isElementSymbol } from '../../src/elements/element-table.js';

const byDefinition = (text: string) => {
  const words = text.match(/[A-Z][a-z]*|[^A-Z]+/g);
  return words !== null && words.every((w) => w === 'D' || w === 'T' || (w.length <= 2 && isElementSymbol(w)));
};

describe('readsAsElements', () => {
  it('agrees with its definition on random texts', () => {
    fc.assert(fc.property(fc.stringMatching(/^[A-Za-z*µ0-9]{0,6}$/), (s) => readsAsElements(s) === byDefinition(s)), { numRuns: 20000 });
  });

  it('reads the abbreviations that clash with symbols as symbols, and the others not', () => {
    // element symbols (IUPAC Red Book 2005, Table I): TBS is T + B + S, OAc is O + Ac; Tf and Ph are no symbols
    for (const s of ['TBS', 'OAc', 'Ac', 'Pr', 'DT']) expect(readsAsElements(s)).toBe(true);
    for (const s of ['', 'Ph', 'Tf', 'Cp*', 'aB', 'Xx']) expect(readsAsElements(s)).toBe(false);
  });
});
