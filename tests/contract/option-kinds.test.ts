// The boundary's table of options (src/errors/option-kinds.ts) is generated from the types of the
// public API; a misspelt, mistyped or missing option is refused instead of ignored or misread.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { balance, calc, empirical, formulaMass, prepareSolution, react, analysis, PondusError } from '../../src/index.js';
// @ts-expect-error: a plain ES module of the build scripts, without types
import { moduleText, TARGET } from '../../scripts/option-kinds.mjs';

const code = (f: () => unknown): string => {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(PondusError);
    return `${(e as PondusError).first.code}: ${(e as PondusError).first.message}`;
  }
  return 'no error';
};

describe('the options of each public function', () => {
  it('the table is the one the types give (node scripts/option-kinds.mjs --write)', () => {
    expect(readFileSync(TARGET, 'utf8')).toBe(moduleText());
  }, 30_000);

  it('a misspelt option is refused with the nearest name, not ignored', () => {
    // calc('1.25 g * 1.0', { roundng: 'half-up' }) rounded half to even, with no word
    expect(code(() => calc('1.25 g * 1.0', { roundng: 'half-up' } as never))).toBe("BAD_ARGUMENT: calc: 'roundng' (argument 2) is not an option of calc; did you mean 'rounding'? (its options: rounding, steps)");
    expect(code(() => formulaMass('H2O', { wieghts: 'abridged' } as never))).toContain("did you mean 'weights'?");
    expect(code(() => balance('H2 + O2 -> H2O', { fixx: 'written' } as never))).toContain("did you mean 'fix'?");
  });

  it('an option of the wrong kind, or a required one missing, is BAD_ARGUMENT, not an internal error', () => {
    expect(code(() => empirical('C=40.00 H=6.71 O=53.29', { molarMass: 180 } as never))).toBe('BAD_ARGUMENT: empirical: option molarMass (argument 2) must be a string, not the number 180');
    expect(code(() => prepareSolution('NaCl', { concentration: '0.1 M', volume: 250 } as never))).toContain('option volume (argument 2) must be a string');
    expect(code(() => prepareSolution('NaCl', { concentration: '0.1 M' } as never))).toBe('BAD_ARGUMENT: prepareSolution: option volume (argument 2) is required');
    expect(code(() => react('H2 + O2 -> H2O', { amounts: 'H2=4.00 g' } as never))).toContain('option amounts (argument 2) must be an array');
    expect(code(() => analysis('C6H6', 'C=92.1', { solvents: 'H2O' } as never))).toContain('option solvents (argument 3) must be an array');
  });

  it('options given rightly still work', () => {
    expect(formulaMass('NaCl', { weights: 'abridged' }).molarMass).toBe(58.44); // source: CIAAW 2021 abridged table
    expect(calc('1.25 g * 1.0', { rounding: 'half-up' }).display).toBe('1.3 g');
  });
});
