// Type tests of the public API (checked by tsc from tests/types/typecheck.test.ts): the main
// result types keep their stable keys, the guarded functions keep the signatures of the functions
// they wrap, and the safe… functions return a SafeResult that narrows on `success`. They read the
// declarations users get (dist/types, which npm test builds first).
import { expectTypeOf } from 'vitest';
import {
  analysis,
  balance,
  calc,
  composition,
  formulaMass,
  parseFormula,
  PondusError,
  react,
  safeAnalysis,
  safeFormulaMass,
  safeSaltFactor,
  saltFactor,
  writtenFormula,
  type AnalysisResult,
  type BalanceResult,
  type CalcResult,
  type CompositionResult,
  type FormulaTree,
  type IssueCode,
  type MassOptions,
  type MassResult,
  type Note,
  type ReactResult,
  type SafeResult,
  type SaltFactorResult,
} from '../../dist/types/index.js';

// formulaMass: (formula text or tree, options?) → MassResult with the stable keys
expectTypeOf(formulaMass).parameter(0).toEqualTypeOf<string | FormulaTree>();
expectTypeOf(formulaMass).parameter(1).toEqualTypeOf<MassOptions | undefined>();
expectTypeOf(formulaMass).returns.toEqualTypeOf<MassResult>();
expectTypeOf<MassResult['input']>().toEqualTypeOf<string>();
expectTypeOf<MassResult['formula']>().toEqualTypeOf<string>();
expectTypeOf<MassResult['charge']>().toEqualTypeOf<number>();
expectTypeOf<MassResult['notes']>().toMatchTypeOf<readonly Note[]>();
expectTypeOf<MassResult>().toHaveProperty('molarMass');
expectTypeOf<MassResult>().toHaveProperty('monoisotopicMass');
expectTypeOf<MassResult>().toHaveProperty('nominalMass');
// @ts-expect-error a number is not a formula
formulaMass(42);
// @ts-expect-error weights is 'standard' or 'abridged'
formulaMass('H2O', { weights: 'old' });

// composition
expectTypeOf(composition).returns.toEqualTypeOf<CompositionResult>();
expectTypeOf<CompositionResult['formula']>().toEqualTypeOf<string>();
expectTypeOf<CompositionResult['elements'][number]>().toHaveProperty('symbol');
expectTypeOf<CompositionResult['elements'][number]>().toHaveProperty('massPercent');

// analysis: (formula, found values, options?)
expectTypeOf(analysis).parameter(1).toEqualTypeOf<string>();
expectTypeOf(analysis).returns.toEqualTypeOf<AnalysisResult>();
expectTypeOf<AnalysisResult['pass']>().toEqualTypeOf<boolean>();
expectTypeOf<AnalysisResult['reportLine']>().toEqualTypeOf<string>();
expectTypeOf<AnalysisResult['fits'][number]>().toHaveProperty('solvates');
// @ts-expect-error found values are text
analysis('C6H6', { C: 92.26 });

// balance and react
expectTypeOf(balance).returns.toEqualTypeOf<BalanceResult>();
expectTypeOf<BalanceResult['balanced']>().toEqualTypeOf<string>();
expectTypeOf<BalanceResult['species']>().toEqualTypeOf<string[]>();
expectTypeOf<BalanceResult>().toHaveProperty('coefficients');
expectTypeOf(react).returns.toEqualTypeOf<ReactResult>();
expectTypeOf<ReactResult['limiting']>().toEqualTypeOf<string>();

// calc
expectTypeOf(calc).returns.toEqualTypeOf<CalcResult>();
expectTypeOf<CalcResult['display']>().toEqualTypeOf<string>();
expectTypeOf<CalcResult['sigFigs']>().toEqualTypeOf<number | null>();
expectTypeOf<CalcResult['unit']>().toEqualTypeOf<string>();

// safe…: the same parameters as the throwing function, a SafeResult that narrows
expectTypeOf(safeFormulaMass).parameters.toEqualTypeOf<Parameters<typeof formulaMass>>();
expectTypeOf(safeFormulaMass).returns.toEqualTypeOf<SafeResult<MassResult>>();
expectTypeOf(safeSaltFactor).parameters.toEqualTypeOf<Parameters<typeof saltFactor>>();
expectTypeOf(safeSaltFactor).returns.toEqualTypeOf<SafeResult<SaltFactorResult>>();
expectTypeOf(safeAnalysis).parameters.toEqualTypeOf<Parameters<typeof analysis>>();
const r = safeFormulaMass('H2O');
if (r.success) expectTypeOf(r.data).toEqualTypeOf<MassResult>();
else {
  expectTypeOf(r.error).toEqualTypeOf<PondusError>();
  expectTypeOf(r.error.issues[0].code).toEqualTypeOf<IssueCode>();
}
safeSaltFactor('C17H19NO3·HCl', 'C17H19NO3', { parentMass: '10.0 mg' });

// errors as data
expectTypeOf<PondusError['issues'][number]['column']>().toEqualTypeOf<number | undefined>();
expectTypeOf<'BAD_ARGUMENT'>().toMatchTypeOf<IssueCode>();

// wrong assertions are caught (each line below must be a type error)
// @ts-expect-error the formula is a string
expectTypeOf<MassResult['formula']>().toEqualTypeOf<number>();
// @ts-expect-error pass is a boolean
expectTypeOf<AnalysisResult['pass']>().toEqualTypeOf<string>();

// formula language
expectTypeOf(parseFormula).returns.toEqualTypeOf<FormulaTree>();
expectTypeOf(writtenFormula).returns.toEqualTypeOf<string>();
