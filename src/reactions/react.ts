/**
 * Reaction stoichiometry: limiting reagent, theoretical yield of each product,
 * excess reagent left, percent yield. Amounts are read by the reagent-table
 * engine (`reagent-table/material.ts`): mass, moles, volume × concentration,
 * a volume of a neat liquid with its density, equivalents or mol % of the
 * first reactant given by its own amount. Results are plain data.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { AMOUNT, MASS, measureAs } from '../calc/measure.js';
import { formulaMassDetail, type MassOptions } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { exact } from '../sigfig/measured.js';
import { divide, multiply, quantity, subtract, type Quantity } from '../sigfig/quantity.js';
import type { RoundingMode } from '../sigfig/round.js';
import { sameDims, unitOf } from '../sigfig/units.js';
import { Decimal } from '../exact/decimal.js';
import { materialForMoles, molesFromQuantity, readAmount, readMaterial, type Material } from '../reagent-table/material.js';
import { readRowText } from '../reagent-table/row-text.js';
import { tableAmount, weighOrTake, type TableAmount } from '../reagent-table/table.js';
import { balanceParsed, type BalanceOptions, type BalanceResult } from './balance.js';
import { parseEquation, type Species } from './equation.js';
import type { Rational } from './rational.js';
import { readKeyValuePair } from '../key-values/read-key-values.js';

export interface ReactOptions extends BalanceOptions {
  /** The atomic-weight table of the molar masses: 'standard' (the default) or 'abridged'. */
  weights?: MassOptions['weights'];
  /**
   * Amounts of reactants: 'H2=4.00 g', 'HCl=25.0 mL of 0.100 M', 'O2=0.500 mol',
   * 'Ac2O=2.00 mL, density=1.08 g/mL', 'Ac2O=1.5 equiv', with purity=, solution= as in a reagent table.
   */
  amounts: string[];
  /** The amount of a product actually obtained, for percent yield: 'H2O=30.1 g'. */
  actual?: string;
  rounding?: RoundingMode;
}

/** A species with its coefficient and amounts, as plain data (amounts in mol and g). */
export interface SpeciesLine {
  species: string;
  formula: string;
  coefficient: number;
  exactCoefficient: string;
  /** Molar mass, g/mol (null for the electron). */
  molarMass: number | null;
  /** Amount given (reactants), or produced (products). */
  moles: TableAmount | null;
  /** Mass given or produced. */
  mass: TableAmount | null;
  /**
   * For a reactant planned in mol or equivalents: what to take of it (instructions at working
   * precision), the mass of the material as it is (at its purity), and the volume for a liquid or
   * solution; null for a reactant given by mass or volume, or with no amount.
   */
  take: { mass: TableAmount | null; volume: TableAmount | null; of: string } | null;
}

export interface ReactResult {
  input: string;
  balanced: string;
  reactants: SpeciesLine[];
  products: SpeciesLine[];
  /** The limiting reagent as written. */
  limiting: string;
  /** Extent of reaction at completion. */
  extent: TableAmount;
  /** Reagents left over at completion, with the amount and mass left. */
  excess: { species: string; moles: TableAmount; mass: TableAmount | null }[];
  percentYield: { species: string; actual: TableAmount; theoretical: TableAmount; percent: TableAmount } | null;
  /** Catalysts (left out of the balance) with the amounts given for them. */
  catalysts: { species: string; formula: string; equiv: number | null; moles: TableAmount | null; mass: TableAmount | null }[];
  balance: BalanceResult;
  notes: Note[];
}

const G_PER_MOL = unitOf('g/mol');

function molarMassOf(s: Species, options: ReactOptions): Quantity | null {
  if (s.formula === 'e-') return null;
  return quantity(reportedMolarMass(formulaMassDetail(s.text, options)), G_PER_MOL);
}

function findSpecies(key: string, all: Species[], input: string): Species {
  const k = key.trim();
  const hit = all.find((s) => s.text === k) ?? all.find((s) => s.formula === safeHill(k));
  if (!hit) throw fail({ code: 'BAD_AMOUNT', message: `'${k}' is not a species of the equation (${all.map((s) => s.text).join(', ')})` }, input);
  return hit;
}

function safeHill(text: string): string | null {
  try {
    return formulaMassDetail(text).formula;
  } catch {
    return null;
  }
}

function splitAmount(text: string): [string, string] {
  const pair = readKeyValuePair(text);
  if (!pair || pair.keyText === '') throw fail({ code: 'BAD_AMOUNT', message: `'${text}' is not SPECIES=AMOUNT (e.g. H2=4.00 g, HCl=25.0 mL of 0.100 M)` }, text);
  return [pair.keyText, pair.valueText];
}

function ratioQuantity(r: Rational): Quantity {
  return quantity(exact(new Decimal(r.num.toString()).div(r.den.toString())), null);
}

/**
 * Limiting reagent, theoretical yields and excess for amounts of reactants.
 *
 * @param equation - the equation, as for {@link balance}.
 * @param options - amounts of reactants ('H2=4.00 g', 'HCl=25.0 mL of 0.100 M', 'Ac2O=1.5 equiv', …), the actual amount of a product for percent yield, rounding, and the balance options.
 * @returns each species' coefficient and amounts, the limiting reagent, the theoretical yields, the excess left and the percent yield when an actual amount is given, and the notes.
 * @throws PondusError: the codes of {@link balance} (BAD_EQUATION, BAD_OPTION, NO_BALANCE, NOT_UNIQUE, the formula codes, …); BAD_AMOUNT for no amounts, an amount not written species=amount, a species not in the equation, a product given as a reactant, a species given twice, equivalents with no reactant to take them of, electrons given by mass, or an actual amount that is not of a product or not positive; BAD_RECORD or INPUT_TOO_LONG for an amount's row that cannot be read (as in {@link readRowText}: an unknown key, a key twice, …); BAD_AMOUNT for a density, purity or solution that cannot be used, or a volume without a density or molarity; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * react('H2 + O2 -> H2O', { amounts: ['H2=4.00 g', 'O2=16.0 g'] }).limiting // 'O2'
 * react('C7H6O3 + C4H6O3 -> C9H8O4 + C2H4O2', { amounts: ['C7H6O3=2.00 g', 'C4H6O3=3.0 equiv'] }).products[0].mass?.display // '2.61 g'
 */
export function react(equation: string, options: ReactOptions): ReactResult {
  const rounding = options.rounding ?? 'half-even';
  const bal = balanceParsed(parseEquation(equation, options), options);
  const eq = bal.equation;
  const all = [...eq.reactants, ...eq.products];
  const coef = new Map<Species, Rational>(all.map((s, i) => [s, bal.exact[i]]));
  const notes: Note[] = [...bal.result.notes];
  if (!options.amounts || options.amounts.length === 0) throw fail({ code: 'BAD_AMOUNT', message: 'give the amount of at least one reactant: `amounts: H2=4.00 g`', options: ['amounts'] }, equation);
  // read every amount first; equivalents are of the first reactant given by its own amount
  const catalystAmounts: { a: string; s: Species; spec: ReturnType<typeof readRowText>; amount: ReturnType<typeof readAmount> }[] = [];
  const read = options.amounts.flatMap((a) => {
    const [key] = splitAmount(a);
    const cat = eq.catalysts.find((c) => c.text === key.trim() || c.formula === safeHill(key.trim()));
    if (cat) {
      const spec = readRowText(a, 'catalyst');
      catalystAmounts.push({ a, s: cat, spec, amount: readAmount(spec.amount ?? '', cat.text, notes) });
      return [];
    }
    const s = findSpecies(key, all, a);
    if (s.side !== 'reactant') throw fail({ code: 'BAD_AMOUNT', message: `${s.text} is a product; give amounts of reactants (and the product obtained with \`actual\`)`, options: ['actual'] }, a);
    const spec = readRowText(a, 'reagent');
    const amount = readAmount(spec.amount ?? '', s.text, notes);
    return [{ a, s, spec, amount }];
  });
  const given = new Map<Species, Quantity>();
  // the material of each reactant (a solution, a density, a purity), read for every amount given
  const materials = new Map<Species, Material>(read.map(({ s, spec }) => [s, readMaterial(spec, s.text, notes)]));
  let reference: Species | null = null;
  for (const { a, s, amount } of read) {
    if (given.has(s)) throw fail({ code: 'BAD_AMOUNT', message: `${s.text} is given twice` }, a);
    if (amount.kind !== 'quantity') continue;
    const m = molarMassOf(s, options);
    if (sameDims(amount.quantity.dims, MASS) && !m) throw fail({ code: 'BAD_AMOUNT', message: 'electrons have no molar mass here: give their amount in mol' }, a);
    given.set(s, molesFromQuantity(amount.quantity, m, materials.get(s)!, s.text).moles);
    reference ??= s;
  }
  for (const { a, s, amount } of read) {
    if (amount.kind !== 'equiv') continue;
    if (!reference) throw fail({ code: 'BAD_AMOUNT', message: `${s.text} is given in ${amount.written}, but no reactant is given by its own amount to take them of` }, a);
    if (given.has(s)) throw fail({ code: 'BAD_AMOUNT', message: `${s.text} is given twice` }, a);
    given.set(s, multiply(given.get(reference)!, amount.equiv));
    notes.push({ code: 'EQUIV_OF', message: `${s.text}: ${amount.number} ${amount.written} of ${reference.text} (the first reactant given by its own amount)` });
  }
  const firstGiven = reference ? given.get(reference)! : null;
  for (const r of eq.reactants) {
    if (!given.has(r)) notes.push({ code: 'ASSUMED_EXCESS', message: `no amount given for ${r.text}: taken to be in excess` });
  }
  // extent of reaction allowed by each reactant: n / ν (ν exact)
  let limiting: Species | null = null;
  let extent: Quantity | null = null;
  for (const [s, n] of given) {
    const x = divide(n, ratioQuantity(coef.get(s)!));
    if (!extent || x.value.lt(extent.value)) {
      extent = x;
      limiting = s;
    }
  }
  const nu = (s: Species) => ratioQuantity(coef.get(s)!);
  const amt = (q: Quantity | null, unit: string) => (q ? tableAmount(q, 'result', [], unit, rounding) : null);
  // what to take of a reactant planned in mol or equivalents that is not the pure substance as weighed
  const planned = new Set(read.filter(({ amount }) => amount.kind === 'equiv' || sameDims(amount.quantity.dims, AMOUNT)).map(({ s }) => s));
  const takeOf = (s: Species, moles: Quantity | null, mm: Quantity | null): SpeciesLine['take'] => {
    const mat = materials.get(s);
    if (!moles || !mat || !planned.has(s) || (!mm && !mat.molarity)) return null;
    const [mass, volume] = weighOrTake({ moles, ...materialForMoles(moles, mm, mat) }, moles, [], mat, s.text, rounding, notes);
    const spec = read.find((x) => x.s === s)!.spec;
    const details = [spec.solution?.trim(), spec.density && `density ${spec.density.trim()}`, spec.purity && `purity ${spec.purity.trim()}`].filter((x) => x).join('; ');
    const of = `${mat.molarity || mat.massFraction ? 'the solution' : mat.density ? 'the liquid' : 'the reagent'}${details ? ` (${details})` : ''}`;
    return mass || volume ? { mass, volume, of } : null;
  };
  const line = (s: Species, moles: Quantity | null): SpeciesLine => {
    const mm = molarMassOf(s, options);
    const c = coef.get(s)!;
    return {
      species: s.text,
      formula: s.formula,
      coefficient: c.toNumber(),
      exactCoefficient: c.toString(),
      molarMass: mm ? mm.value.toNumber() : null,
      moles: amt(moles, 'mol'),
      mass: amt(moles && mm ? multiply(moles, mm) : null, 'g'),
      take: s.side === 'reactant' ? takeOf(s, moles, mm) : null,
    };
  };
  const productMoles = new Map<Species, Quantity>(eq.products.map((s) => [s, multiply(extent!, nu(s))]));
  const reactants = eq.reactants.map((s) => line(s, given.get(s) ?? null));
  const products = eq.products.map((s) => line(s, productMoles.get(s)!));
  const givenMass = new Map(read.filter(({ s, amount }) => amount.kind === 'quantity' && sameDims(amount.quantity.dims, MASS) && !materials.get(s)!.purity && !materials.get(s)!.massFraction).map(({ s, amount }) => [s, (amount as { quantity: Quantity }).quantity]));
  const excess = eq.reactants
    .filter((s) => given.has(s) && s !== limiting)
    .map((s) => {
      const used = multiply(extent!, nu(s));
      const left = subtract(given.get(s)!, used);
      const mm = molarMassOf(s, options);
      // a reactant weighed: the mass left is the mass given less the mass used, to the decimals of the masses (2.80 g − 1.05 g = 1.75 g)
      const weighed = givenMass.get(s);
      const massLeft = weighed && mm ? subtract(weighed, multiply(used, mm)) : mm ? multiply(left, mm) : null;
      return { species: s.text, moles: amt(left, 'mol')!, mass: amt(massLeft, 'g') };
    });
  const together = excess.filter((e) => e.moles.value === 0).map((e) => e.species);
  if (together.length) notes.push({ code: 'STOICHIOMETRIC_AMOUNTS', message: `${[limiting!.text, ...together].join(' and ')} are in the ratio of the equation: all are used up (${limiting!.text} is named the limiting reagent as the first)` });
  const catalysts: ReactResult['catalysts'] = eq.catalysts.map((c) => {
    const given = catalystAmounts.find((x) => x.s === c);
    const mm = molarMassOf(c, options);
    if (!given) return { species: c.text, formula: c.formula, equiv: null, moles: null, mass: null };
    const mat = readMaterial(given.spec, c.text, notes);
    let moles: Quantity;
    let equiv: number | null = null;
    if (given.amount.kind === 'equiv') {
      if (!reference) throw fail({ code: 'BAD_AMOUNT', message: `${c.text} is given in ${given.amount.written}, but no reactant is given by its own amount to take them of` }, given.a);
      moles = multiply(firstGiven!, given.amount.equiv);
      equiv = given.amount.equiv.value.toNumber();
    } else {
      moles = molesFromQuantity(given.amount.quantity, mm, mat, c.text).moles;
      if (firstGiven) equiv = moles.value.div(firstGiven.value).toNumber();
    }
    const m = materialForMoles(moles, mm, mat);
    return { species: c.text, formula: c.formula, equiv, moles: amt(moles, 'mol'), mass: m.mass ? amt(m.mass, 'g') : null };
  });
  let percentYield: ReactResult['percentYield'] = null;
  if (options.actual) {
    const [key, value] = splitAmount(options.actual);
    const s = findSpecies(key, all, options.actual);
    if (s.side !== 'product') throw fail({ code: 'BAD_AMOUNT', message: `${s.text} is not a product` }, options.actual);
    const q = measureAs(value, [MASS, AMOUNT], `the amount of ${s.text} obtained`, notes);
    if (q.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: `the amount of ${s.text} obtained must be positive` }, options.actual);
    const n = productMoles.get(s)!;
    const mm = molarMassOf(s, options);
    const isMass = sameDims(q.dims, MASS);
    if (isMass && !mm) throw fail({ code: 'BAD_AMOUNT', message: 'electrons have no molar mass here: give their amount in mol' }, options.actual);
    const theoretical = isMass ? multiply(n, mm!) : n;
    const percent = multiply(divide(q, theoretical), quantity(exact(100), null));
    const pct = tableAmount(percent, 'result', [], '', rounding);
    percentYield = {
      species: s.text,
      actual: tableAmount(q, 'result', [], isMass ? 'g' : 'mol', rounding),
      theoretical: tableAmount(theoretical, 'result', [], isMass ? 'g' : 'mol', rounding),
      percent: { ...pct, displayUnit: '%', display: `${pct.figure} %` },
    };
    if (percent.value.gt(100)) notes.push({ code: 'YIELD_OVER_100', message: `a yield over 100 % (${percent.value.toFixed(1)} %): the product may be wet or impure, or an amount is wrong` });
  }
  return { input: equation, balanced: bal.result.balanced, reactants, products, limiting: limiting!.text, extent: amt(extent!, 'mol')!, excess, percentYield, catalysts, balance: bal.result, notes };
}
