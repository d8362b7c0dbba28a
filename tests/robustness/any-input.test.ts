import fc from 'fast-check';
import { describe, it } from 'vitest';
import * as pondus from '../../src/index.js';
import { errorCode } from '../support/error-code.js';

// Every entry point, fed anything at all, either answers or throws a PondusError (errorCode fails the
// test on any other exception): no crash, no hang, no stack trace reaching the user.
const entryPoints: [string, (s: string) => unknown][] = [
  ['formulaMass', (s) => pondus.formulaMass(s)],
  ['formulaMass with abbreviations', (s) => pondus.formulaMass(s, { abbreviations: true })],
  ['composition with a part', (s) => pondus.composition(s, { part: 'H2O' })],
  ['calc', (s) => pondus.calc(s)],
  ['balance', (s) => pondus.balance(s)],
  ['empirical', (s) => pondus.empirical(s, { molarMass: '100' })],
  ['mixtureComposition', (s) => pondus.mixtureComposition(s)],
  ['analysis (found values)', (s) => pondus.analysis('C6H6', s, { solvents: ['water'] })],
  ['analysis (formula)', (s) => pondus.analysis(s, 'C=50,H=5')],
  ['prepareSolution', (s) => pondus.prepareSolution('NaCl', { concentration: s, volume: '1.00 L' })],
  ['react', (s) => pondus.react('H2 + O2 -> H2O', { amounts: [s] })],
  ['conversionFactor', (s) => pondus.conversionFactor(s, 'Fe2O3')],
  ['candidateFormulas', (s) => pondus.candidateFormulas({ mass: s, elements: 'C0-10 H0-20 O0-5' })],
  ['readSheet', (s) => pondus.readSheet(s)],
];

const pieces = ['C', 'H', 'O', 'N', 'Cl', 'D', '(', ')', '[', ']', '{', '}', '·', '.', '2', '0', '1.5', '^', '+', '-', '->', '=', ' ', 'g', 'mL', 'M', 'M(', 'rest', '%', ',', 'e-', '±', '*', '/', 'to', '\u0000', '💧', '1e5', 'sample', '"', '\n', '__proto__'];
const anyInput = fc.oneof(fc.string({ maxLength: 40 }), fc.array(fc.constantFrom(...pieces), { maxLength: 16 }).map((a) => a.join('')));

describe('any input gets an answer or a clear error', () => {
  for (const [name, fn] of entryPoints) {
    it(name, () => {
      fc.assert(
        fc.property(anyInput, (s) => {
          errorCode(() => fn(s));
        }),
        { numRuns: 400 },
      );
    });
  }
});
