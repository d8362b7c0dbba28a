/**
 * The reagent table of a synthesis: one reference (limiting) reagent given as a
 * measured amount; the others by equivalents or mol %, or by their own amounts
 * (equivalents computed); catalysts and additives shown but left out of the
 * stoichiometry; the solvent for a target concentration; the product's
 * theoretical yield and, from what was obtained, the percent yield.
 *
 * What to weigh or take (from equivalents, or from an amount in moles: a target)
 * is an instruction, shown at working precision; what follows from measured
 * amounts (the moles of a mass or volume given, the theoretical yield, the
 * percent yield) is a result with the figures of the measurements.
 */
import type { Note } from '../errors/issue.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import { formulaMassDetail } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import type { ParseOptions } from '../formula-parser/parse.js';
import { MOLARITY, measureAs, VOLUME } from '../calc/measure.js';
import { exact } from '../sigfig/measured.js';
import { displayResult, displayInstruction, fewFiguresNote, inputFigures, instruction, massUnitFor, volumeUnitFor, type InputFigures, type Instruction } from '../sigfig/instruction.js';
import { divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import type { RoundingMode } from '../sigfig/round.js';
import { AMOUNT, baseUnitText, sameDims, unitOf } from '../sigfig/units.js';
import { Decimal } from '../exact/decimal.js';
import { balanceParsed } from '../reactions/balance.js';
import { parseEquation } from '../reactions/equation.js';
import { isLiquid, materialForMoles, molesFromQuantity, readAmount, readMaterial, type Material, type MaterialAmount, type MaterialSpec } from './material.js';
import { hazardOf, lookUpName, type Hazard } from './names.js';

/** The part a row plays. Catalysts and additives are left out of the stoichiometry. */
export type ReagentRole = 'reference' | 'reagent' | 'catalyst' | 'additive' | 'product';

/** ROLES in the order a table lists them. */
export const REAGENT_ROLES: readonly ReagentRole[] = Object.freeze(['reference', 'reagent', 'catalyst', 'additive', 'product']);

/** One row as written (from options or from a procedure file). */
export interface ReagentSpec extends MaterialSpec {
  role: ReagentRole;
  /** The reagent as written: a formula (C7H6O3, PPh3, NaOtBu) or a common name (n-BuLi, THF). */
  reagent: string;
  /** The formula, when the reagent is given by a name the tool does not know. */
  formula?: string;
  /** The amount: '2.00 g', '5.00 mmol', '2.5 mL', '1.5 equiv', '5 mol %' (empty for a product). */
  amount?: string;
  /** The form weighed, when it differs (a hydrate or salt): 'CuSO4·5H2O'. One unit of it holds one of the reagent. */
  form?: string;
  /** The text the row came from (its input). */
  text?: string;
}

/** Options of a reagent table. */
export interface ReagentTableOptions extends ParseOptions {
  /** Target concentration of the reference reagent in the solvent: '0.2 M'. */
  concentration?: string;
  /** The solvent's name, for the solvent row: 'THF'. */
  solvent?: string;
  /** The equation, for the product's coefficient relative to the reference (1:1 when not given). */
  equation?: string;
  /** The amount of product obtained, for the percent yield: '2.10 g'. */
  actual?: string;
  rounding?: RoundingMode;
}

/** An amount as plain data: the unrounded value in base units, and what is shown. */
export interface TableAmount {
  /** 'instruction' (to weigh or take: working precision) or 'result' (measurement figures). */
  kind: 'instruction' | 'result';
  /** Unrounded, in the base unit ('g', 'mol', 'L'). */
  value: number;
  unit: string;
  /** The figure in the display unit, without the unit: '1.532'. */
  figure: string;
  /** The display unit: 'mmol', 'g', 'mg', 'mL', 'µL'. */
  displayUnit: string;
  /** Figure and unit: '1.532 g'. */
  display: string;
  sigFigs: number | null;
}

/** One row of the table, as plain data. */
export interface ReagentRow {
  /** The row as written. */
  input: string;
  /** The part it plays; 'solvent' for the solvent row of a target concentration. */
  role: ReagentRole | 'solvent';
  reagent: string;
  /** Hill formula of the reagent. */
  formula: string;
  /** The full name when the reagent was given by a name. */
  name: string | null;
  /** Molar mass of what is weighed (the form, when given), g/mol (null for a solvent). */
  molarMass: number | null;
  molarMassDisplay: string;
  /** Equivalents relative to the reference (null for a solvent-free product row without a ratio). */
  equiv: number | null;
  equivDisplay: string;
  /** Amount of reagent, mmol shown. */
  amount: TableAmount | null;
  /** Mass to weigh (neat as it comes, or of the solution by mass), or the theoretical yield of a product. */
  mass: TableAmount | null;
  /** Volume to take (liquids and solutions). */
  volume: TableAmount | null;
  /** For a product with --actual: the percent yield. */
  percentYield: TableAmount | null;
  /** The written fields, for a procedure file. */
  spec: { amount: string; purity: string; density: string; solution: string; form: string; formula: string };
  hazard: Hazard | null;
  notes: Note[];
}

/** A whole reagent table. */
export interface ReagentTable {
  rows: ReagentRow[];
  /** The reference reagent as written. */
  reference: string;
  /** Amount of the reference, mol. */
  referenceMoles: number;
  /** The solvent volume for the target concentration, or null (also a row, before the product). */
  solvent: { name: string | null; concentration: string; volume: TableAmount } | null;
  /** Cautions for what will be acted on (titrate organolithiums, concentrated acids, the lab's procedures). */
  cautions: string[];
  notes: Note[];
}

/** The general caution every reagent table carries. */
export const TABLE_CAUTION =
  "check each reagent's label (formula, hydrate or salt form, assay, concentration) and SDS, and follow your lab's procedures and risk assessment; pondus computes, it does not replace a second check";

const G_PER_MOL = unitOf('g/mol');

/** The shared context of a table: the reference and what rows are computed against. */
export interface TableContext {
  reference: { spec: ReagentSpec; moles: Quantity; inputs: InputFigures[] };
  productRatio: Map<string, Quantity>;
  options: ReagentTableOptions;
  notes: Note[];
  /** The product the amount obtained (`actual`) is of: the first product row; null without products. */
  yieldOf?: ReagentSpec | null;
  /** How many product rows the table has. */
  products?: number;
}

interface Resolved {
  formula: string;
  name: string | null;
  molarMass: Quantity | null;
  weighedFormula: string;
  notes: Note[];
}

function resolve(spec: ReagentSpec, options: ParseOptions): Resolved {
  const notes: Note[] = [];
  const text = spec.reagent.trim();
  if (text === '') throw fail({ code: 'BAD_RECORD', message: 'a row names no reagent' });
  let formulaText = spec.formula?.trim() || '';
  let name: string | null = null;
  if (!formulaText) {
    const hit = lookUpName(text);
    if (hit) {
      formulaText = hit.formula;
      name = hit.name;
      notes.push({ code: 'NAME_READ', message: `${text} is read as ${hit.name}, ${hit.formula} (${hit.source})` });
    } else formulaText = text;
  }
  let mass;
  try {
    mass = formulaMassDetail(formulaText, options);
  } catch (e) {
    if (e instanceof PondusError && !spec.formula && /[a-z]{3,}|\s|-/.test(text)) {
      throw new PondusError(e.issues.map((i) => ({ ...i, message: `${text}: ${i.message}; a name the tool does not know needs its formula (formula=…)` })), e.input);
    }
    throw e;
  }
  for (const n of mass.notes) notes.push({ ...n, message: `${text}: ${n.message}` });
  let weighed = mass;
  if (spec.form && spec.form.trim()) {
    weighed = formulaMassDetail(spec.form.trim(), options);
    for (const n of weighed.notes) notes.push({ ...n, message: `${spec.form.trim()}: ${n.message}` });
    notes.push({ code: 'WEIGHED_FORM', message: `${text} is weighed as ${spec.form.trim()} (M ${weighed.molarMassText()} g/mol), taken to hold one ${mass.formula} per formula unit` });
  }
  return { formula: mass.formula, name, molarMass: quantity(reportedMolarMass(weighed), G_PER_MOL), weighedFormula: weighed.formula, notes };
}

/**
 * The mass and volume columns of a reagent given by its own amount. An amount in moles is a plan,
 * so the mass to weigh and the volume to take that follow from it are instructions, at working
 * precision, with a note when the amount has few figures; a mass or volume given was measured,
 * and what follows from it is a result.
 */
/**
 * The mass and volume of a material for an amount, as shown in a table: instructions (working
 * precision, with the few-figures note) when the amount was planned in moles or equivalents,
 * results when it was measured; the volume only for a liquid or solution.
 *
 * @example
 * const solution = { purity: null, density: null, molarity: measure('2.5 M'), massFraction: null, solvent: null }
 * weighOrTake({ moles: measure('5.50 mmol'), mass: null, volume: measure('2.20 mL') }, measure('5.50 mmol'), [], solution, 'nBuLi', 'half-even', [])[1]?.display // '2.200 mL'
 */
export function weighOrTake(got: MaterialAmount, given: Quantity, inputs: InputFigures[], mat: Material, what: string, rounding: RoundingMode, notes: Note[]): [TableAmount | null, TableAmount | null] {
  const planned = sameDims(given.dims, AMOUNT);
  const kind = planned ? 'instruction' : 'result';
  const mass = got.mass ? tableAmount(got.mass, kind, inputs, massUnitFor(got.mass), rounding) : null;
  const volume = got.volume && isLiquid(mat) ? tableAmount(got.volume, kind, inputs, volumeUnit(got.volume), rounding) : null;
  const taken = volume ? got.volume : got.mass;
  if (planned && taken) {
    const few = fewFiguresNote(instruction(taken, inputs), `the amount of ${what}`, null);
    if (few) notes.push(few);
  }
  return [mass, volume];
}

/**
 * A quantity as plain data, shown as an instruction (working precision) or a result (textbook figures).
 *
 * @example
 * tableAmount(measure('2.5 g'), 'instruction', [], 'g', 'half-even').display // '2.500 g'
 */
export function tableAmount(q: Quantity, kind: 'instruction' | 'result', inputs: InputFigures[], unit: string | null, rounding: RoundingMode): TableAmount {
  const wanted = unit === '' ? null : unit;
  const d = kind === 'instruction' ? displayInstruction(instruction(q, inputs), wanted, rounding) : displayResult(q, wanted, rounding);
  return { kind, value: q.value.toNumber(), unit: baseUnitText(q.dims), figure: d.figure, displayUnit: d.unit, display: d.text, sigFigs: d.sigFigs };
}

function volumeUnit(q: Quantity): string {
  return volumeUnitFor(q, unitOf('mL'));
}

function equivText(e: Quantity, rounding: RoundingMode): string {
  if (e.lsd === null) return e.value.toDecimalPlaces(4).toFixed();
  return displayResult(e, null, rounding).figure;
}

/**
 * Reads the reference row and the table's shared data; throws a PondusError for a bad reference,
 * or (USAGE) for an amount obtained with no product row.
 *
 * @example
 * tableContext([{ role: 'reference', reagent: 'C7H6O3', amount: '2.00 g' }], {}).reference.moles.value.toFixed(5) // '0.01448'
 */
export function tableContext(specs: readonly ReagentSpec[], options: ReagentTableOptions = {}): TableContext {
  // an amount obtained with no product row would be dropped
  if (options.actual !== undefined && !specs.some((s) => s.role === 'product')) throw fail({ code: 'USAGE', message: `the amount obtained (${options.actual}) is of a product: give the product row with \`product\``, options: ['actual', 'product'] });
  const refs = specs.filter((s) => s.role === 'reference');
  if (refs.length === 0) throw fail({ code: 'BAD_RECORD', message: 'no reference reagent: give one row as the reference (the limiting reagent), with its amount' });
  if (refs.length > 1) throw fail({ code: 'BAD_RECORD', message: `${refs.length} reference reagents (${refs.map((r) => r.reagent).join(', ')}): give exactly one` });
  const spec = refs[0];
  const notes: Note[] = [];
  const what = spec.reagent.trim();
  const amount = readAmount(spec.amount ?? '', what, notes);
  if (amount.kind === 'equiv') throw fail({ code: 'BAD_AMOUNT', message: `the reference reagent ${what} sets 1 equiv: give its amount as a mass, moles or a volume, not '${spec.amount}'` });
  const r = resolve(spec, options);
  const mat = readMaterial(spec, what, notes);
  const got = molesFromQuantity(amount.quantity, r.molarMass, mat, what);
  const inputs = [inputFigures(`the amount of ${what}`, spec.amount ?? '', amount.quantity)];
  const productRatio = new Map<string, Quantity>();
  if (options.equation) {
    // the product's coefficient relative to the reference, from the balanced equation
    const b = balanceParsed(parseEquation(options.equation, options), {});
    const all = [...b.equation.reactants, ...b.equation.products];
    const refIndex = all.findIndex((s) => s.side === 'reactant' && (s.text === what || s.formula === r.formula));
    if (refIndex < 0) throw fail({ code: 'BAD_RECORD', message: `the reference ${what} is not a reactant of the equation ${options.equation}` });
    const nuRef = b.exact[refIndex];
    all.forEach((s, i) => {
      const q = b.exact[i].div(nuRef);
      const ratio = quantity(exact(new Decimal(q.num.toString()).div(q.den.toString())), null);
      productRatio.set(s.formula, ratio);
      productRatio.set(s.text, ratio);
    });
    for (const n of b.result.notes) notes.push({ ...n, message: `the equation: ${n.message}` });
  }
  const products = specs.filter((s) => s.role === 'product');
  return { reference: { spec, moles: got.moles, inputs }, productRatio, options, notes, yieldOf: products[0] ?? null, products: products.length };
}


function cautionFor(hazard: Hazard | null, mat: Material, reagent: string): string | null {
  if (hazard === 'pyrophoric' || hazard === 'water-reactive') {
    const kind = hazard === 'pyrophoric' ? 'pyrophoric' : 'water-reactive';
    return mat.molarity
      ? `${reagent} is ${kind}: titrate the solution before use, as its molarity falls with storage (common practice), and handle it under inert gas`
      : `${reagent} is ${kind}: handle it under inert gas, away from water (common practice)`;
  }
  if (hazard === 'concentrated-acid') {
    const conc = (mat.massFraction && mat.massFraction.value.gte('0.25')) || (mat.molarity && mat.molarity.value.gte(6)) || (!mat.massFraction && !mat.molarity);
    if (conc) return `${reagent} is a concentrated acid: wear eye and hand protection, work in a fume hood, and add acid to water, never water to acid (common practice)`;
  }
  return null;
}

/**
 * Computes one row of the table against its context.
 *
 * @example
 * const ctx = tableContext([{ role: 'reference', reagent: 'C7H6O3', amount: '2.00 g' }])
 * reagentRow(ctx, { role: 'reagent', reagent: 'C4H6O3', amount: '3.0 equiv', density: '1.08 g/mL' }).volume?.display // '4.106 mL'
 */
export function reagentRow(ctx: TableContext, spec: ReagentSpec): ReagentRow {
  const rounding = ctx.options.rounding ?? 'half-even';
  const what = spec.reagent.trim();
  const notes: Note[] = [];
  const r = resolve(spec, ctx.options);
  notes.push(...r.notes);
  const mat = readMaterial(spec, what, notes);
  const nRef = ctx.reference.moles;
  const isRef = spec === ctx.reference.spec || spec.role === 'reference';
  let moles: Quantity;
  let equiv: Quantity | null;
  let mass: TableAmount | null = null;
  let volume: TableAmount | null = null;
  let amountJson: TableAmount | null;
  let percentYield: TableAmount | null = null;
  let writtenEquiv: string | null = null;
  const inputs = ctx.reference.inputs;
  if (spec.role === 'product') {
    if (spec.amount && spec.amount.trim()) throw fail({ code: 'BAD_AMOUNT', message: `the product ${what} takes no amount: its theoretical yield is computed (give what was obtained with \`actual\`)`, options: ['actual'] });
    let ratio = ctx.productRatio.get(r.formula) ?? ctx.productRatio.get(what) ?? null;
    if (ratio === null) {
      ratio = quantity(exact(1), null);
      notes.push({ code: 'PRODUCT_RATIO', message: ctx.options.equation ? `${what} is not in the equation: one ${what} per reference taken` : `no equation given: one ${what} per ${ctx.reference.spec.reagent.trim()} (1 equiv) taken for the theoretical yield` });
    }
    moles = multiply(nRef, ratio);
    equiv = ratio;
    const theoretical = multiply(moles, r.molarMass!);
    amountJson = tableAmount(moles, 'result', inputs, 'mmol', rounding);
    mass = tableAmount(theoretical, 'result', inputs, massUnitFor(theoretical), rounding);
    // the amount obtained is of one product: the first product row (a second one gets no yield, and says so)
    const yieldHere = ctx.yieldOf === undefined || ctx.yieldOf === null || ctx.yieldOf === spec;
    if (ctx.options.actual && !yieldHere) {
      notes.push({ code: 'YIELD_OF_FIRST_PRODUCT', message: `no percent yield: the amount obtained (${ctx.options.actual}) is of the first product, ${ctx.yieldOf!.reagent.trim()}` });
    }
    if (ctx.options.actual && yieldHere) {
      if ((ctx.products ?? 1) > 1) notes.push({ code: 'YIELD_OF_FIRST_PRODUCT', message: `the amount obtained (${ctx.options.actual}) is read as of ${what}, the first of the ${ctx.products} products` });
      const q = measureAs(ctx.options.actual, [[1, 0, 0], [0, 1, 0]], `the amount of ${what} obtained`, notes);
      if (q.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: `the amount of ${what} obtained must be positive` });
      const theo = sameDims(q.dims, [1, 0, 0]) ? theoretical : moles;
      const pct = multiply(divide(q, theo), quantity(exact(100), null));
      percentYield = tableAmount(pct, 'result', inputs, '', rounding);
      percentYield.displayUnit = '%';
      percentYield.display = `${percentYield.figure} %`;
      if (pct.value.gt(100)) notes.push({ code: 'YIELD_OVER_100', message: `a yield over 100 % (${pct.value.toFixed(1)} %): the product may be wet or impure, or an amount is wrong` });
    }
  } else if (isRef) {
    const amount = readAmount(spec.amount ?? '', what, notes);
    if (amount.kind !== 'quantity') throw fail({ code: 'BAD_AMOUNT', message: `the reference ${what} needs a measured amount` });
    const got = molesFromQuantity(amount.quantity, r.molarMass, mat, what);
    moles = got.moles;
    equiv = quantity(exact(1), null);
    amountJson = tableAmount(moles, 'result', inputs, 'mmol', rounding);
    [mass, volume] = weighOrTake(got, amount.quantity, inputs, mat, what, rounding, notes);
  } else {
    const amount = readAmount(spec.amount ?? '', what, notes);
    if (amount.kind === 'equiv') {
      equiv = amount.equiv;
      if (amount.written === 'equiv') writtenEquiv = amount.number;
      moles = multiply(nRef, equiv);
      const ins: Instruction = instruction(moles, inputs);
      amountJson = tableAmount(moles, 'instruction', inputs, 'mmol', rounding);
      const m = materialForMoles(moles, r.molarMass, mat);
      if (m.mass) mass = tableAmount(m.mass, 'instruction', inputs, massUnitFor(m.mass), rounding);
      if (m.volume) volume = tableAmount(m.volume, 'instruction', inputs, volumeUnit(m.volume), rounding);
      const few = fewFiguresNote(ins, `the amount of ${what}`, null);
      if (few) notes.push(few);
    } else {
      const got = molesFromQuantity(amount.quantity, r.molarMass, mat, what);
      moles = got.moles;
      equiv = divide(moles, nRef);
      amountJson = tableAmount(moles, 'result', [], 'mmol', rounding);
      [mass, volume] = weighOrTake(got, amount.quantity, [inputFigures(`the amount of ${what}`, spec.amount ?? '', amount.quantity)], mat, what, rounding, notes);
      notes.push({ code: 'EQUIV_COMPUTED', message: `${what} is given by its own amount: ${equivText(equiv, rounding)} equiv of ${ctx.reference.spec.reagent.trim()} computed` });
    }
    if (spec.role === 'catalyst' || spec.role === 'additive') {
      notes.push({ code: 'NOT_IN_STOICHIOMETRY', message: `${what} is a${spec.role === 'additive' ? 'n additive' : ' catalyst'}: shown in the table, left out of the stoichiometry` });
    } else if (equiv.value.lt(1)) {
      notes.push({ code: 'BELOW_ONE_EQUIV', message: `${what} at ${equivText(equiv, rounding)} equiv: if it reacts one to one with ${ctx.reference.spec.reagent.trim()}, it limits the yield, not the reference` });
    }
  }
  const hazard = hazardOf(what, r.formula);
  const caution = cautionFor(hazard, mat, what);
  if (caution) notes.push({ code: 'CAUTION', message: caution });
  if (mat.solvent) notes.push({ code: 'SOLUTION', message: `${what} is taken as a solution in ${mat.solvent}` });
  const mm = r.molarMass!;
  return {
    input: spec.text ?? what,
    role: spec.role,
    reagent: what,
    formula: r.formula,
    name: r.name,
    molarMass: mm.value.toNumber(),
    molarMassDisplay: displayResult(mm, null, rounding).figure,
    equiv: equiv ? equiv.value.toNumber() : null,
    equivDisplay: writtenEquiv ?? (equiv ? equivText(equiv, rounding) : ''),
    amount: amountJson,
    mass,
    volume,
    percentYield,
    spec: {
      amount: spec.amount?.trim() ?? '',
      purity: spec.purity?.trim() ?? '',
      density: spec.density?.trim() ?? '',
      solution: spec.solution?.trim() ?? '',
      form: spec.form?.trim() ?? '',
      formula: spec.formula?.trim() ?? '',
    },
    hazard,
    notes,
  };
}

/**
 * The solvent volume for a target concentration of the reference: V = n(reference) ÷ c (an instruction).
 *
 * @example
 * const ctx = tableContext([{ role: 'reference', reagent: 'C7H6O3', amount: '2.00 g' }])
 * solventVolume(ctx, '0.2 M')?.display // '72.40 mL'
 */
export function solventVolume(ctx: TableContext, concentration: string): TableAmount {
  return solventInstruction(ctx, concentration).volume;
}

function solventInstruction(ctx: TableContext, concentration: string): { volume: TableAmount; notes: Note[] } {
  const notes: Note[] = [];
  const c = measureAs(concentration, [MOLARITY], 'the target concentration', notes);
  if (c.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: `the target concentration must be positive: '${concentration}'` });
  const v = divide(ctx.reference.moles, c);
  if (!sameDims(v.dims, VOLUME)) throw fail({ code: 'INTERNAL_ERROR', message: 'the solvent volume is not a volume' });
  const inputs = [...ctx.reference.inputs, inputFigures('the target concentration', concentration, c)];
  const few = fewFiguresNote(instruction(v, inputs), 'the solvent volume', 'the concentration reached');
  if (few) notes.push(few);
  return { volume: tableAmount(v, 'instruction', inputs, volumeUnit(v), ctx.options.rounding ?? 'half-even'), notes };
}

/**
 * The solvent row: the volume for a target concentration of the reference (an instruction).
 *
 * @example
 * const ctx = tableContext([{ role: 'reference', reagent: 'C7H6O3', amount: '2.00 g' }])
 * solventRow(ctx, 'toluene', '0.2 M').volume?.display // '72.40 mL'
 */
export function solventRow(ctx: TableContext, name: string | null, concentration: string, text?: string): ReagentRow {
  const { volume, notes } = solventInstruction(ctx, concentration);
  const label = name && name.trim() ? name.trim() : 'solvent';
  const hit = name ? lookUpName(name) : null;
  if (hit) notes.push({ code: 'NAME_READ', message: `${label} is read as ${hit.name}, ${hit.formula} (${hit.source})` });
  notes.push({ code: 'SOLVENT_VOLUME', message: `${label}: ${volume.display} brings ${ctx.reference.spec.reagent.trim()} to ${concentration.trim()} (reagent volumes not counted)` });
  return {
    input: text ?? `${label} to ${concentration.trim()}`,
    role: 'solvent',
    reagent: label,
    formula: hit ? hit.formula : '',
    name: hit ? hit.name : null,
    molarMass: null,
    molarMassDisplay: '',
    equiv: null,
    equivDisplay: '',
    amount: null,
    mass: null,
    volume,
    percentYield: null,
    spec: { amount: concentration.trim(), purity: '', density: '', solution: '', form: '', formula: '' },
    hazard: null,
    notes,
  };
}

/**
 * Cautions for a table: one per hazardous row, then the general one.
 *
 * @param rows - the rows of a reagent table.
 * @returns the distinct cautions of the hazardous rows, in row order, then the general caution for every table.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * tableCautions([]).length // 1
 */
export function tableCautions(rows: readonly ReagentRow[]): string[] {
  const out: string[] = [];
  for (const r of rows) for (const n of r.notes) if (n.code === 'CAUTION' && !out.includes(n.message)) out.push(n.message);
  out.push(TABLE_CAUTION);
  return out;
}

/**
 * The whole reagent table; throws the first row's PondusError.
 *
 * @param specs - the rows: each a role (reference, reagent, catalyst, additive, product), a reagent's name or formula, and its amount, purity, density, solution or form as text.
 * @param options - an equation to take the stoichiometry from, the target concentration of the reference and its solvent, the amount of product obtained, rounding, and the formula options.
 * @returns each row's formula, molar mass, equivalents, moles, mass and volume, the reference and its moles, the solvent volume when a concentration is given, the cautions and the notes.
 * @throws PondusError: BAD_RECORD for a row with no reagent, no reference row or more than one, or a reference that is not a reactant of the equation; BAD_AMOUNT for an amount that cannot be read or is not positive, a reference given in equivalents, an amount given for a product, a volume without a density or molarity, a density, purity or solution strength that cannot be used, a reagent with no molar mass given by mass, or a target concentration that is not positive; BAD_OPTION for a solvent without a target concentration; a reagent's formula that cannot be read (the formula language's codes: UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, AMBIGUOUS_READING, …); the codes of {@link balance} for an equation (BAD_EQUATION, NO_BALANCE, NOT_UNIQUE, …); a measurement that cannot be read (BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const specs = [{ role: 'reference', reagent: 'C7H6O3', amount: '2.00 g' }, { role: 'product', reagent: 'C9H8O4' }]
 * reagentTable(specs).rows[1].mass?.display // '2.61 g'
 */
export function reagentTable(specs: readonly ReagentSpec[], options: ReagentTableOptions = {}): ReagentTable {
  const ctx = tableContext(specs, options);
  const rows = specs.map((s) => reagentRow(ctx, s));
  const notes = [...ctx.notes];
  let solvent: ReagentTable['solvent'] = null;
  if (options.concentration) {
    const row = solventRow(ctx, options.solvent ?? null, options.concentration);
    solvent = { name: options.solvent ?? null, concentration: options.concentration.trim(), volume: row.volume! };
    const at = rows.findIndex((r) => r.role === 'product');
    rows.splice(at < 0 ? rows.length : at, 0, row);
  } else if (options.solvent) {
    throw fail({ code: 'BAD_OPTION', message: `a solvent (${options.solvent}) needs a target concentration of the reference to set its volume (e.g. 0.2 M)` });
  }
  return { rows, reference: ctx.reference.spec.reagent.trim(), referenceMoles: ctx.reference.moles.value.toNumber(), solvent, cautions: tableCautions(rows), notes };
}
