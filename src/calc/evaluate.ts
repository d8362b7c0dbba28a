/**
 * Evaluates a calculator tree with measured quantities: the textbook rules for
 * significant figures at each step (no rounding until the end), units checked
 * and carried, and — when any input is written `value ± u` — first-order
 * uncertainty propagation. Records each step for --explain.
 */
import { Decimal } from '../exact/decimal.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import { columnOf } from '../formula-parser/prescan.js';
import { formulaMassDetail } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { molarMassUncertainty } from '../mass/uncertainty.js';
import { dividedBy, sigFigsOf, type Measured } from '../sigfig/measured.js';
import { add, divide, multiply, negate, power, quantity, subtract, type Quantity } from '../sigfig/quantity.js';
import { readNumber } from '../sigfig/read-number.js';
import { displayMeasured } from '../sigfig/round.js';
import { isPercent, MASS, sameDims, unitFactor, unitOf, VOLUME } from '../sigfig/units.js';
import type { CalcTree, ExprNode } from './tree.js';
import type { Note } from '../errors/issue.js';

/** One step of a calculation, for --explain. */
export interface CalcStep {
  /** What was done, in words and figures. */
  text: string;
  /** The rule that set the precision of the result. */
  rule: string;
}

export interface Evaluation {
  result: Quantity;
  /** Standard uncertainties of the inputs written with ±, by input number. */
  inputs: Map<number, Decimal>;
  steps: CalcStep[];
  /** Remarks on how the input was read, each once. */
  notes: Note[];
}

interface Ctx {
  input: string;
  inputs: Map<number, Decimal>;
  steps: CalcStep[];
  /** Whether the steps are written down (false: a batch that does not show them). */
  record: boolean;
  notes: Note[];
  uncertain: boolean;
}

/** What {@link evaluate} may leave out. */
export interface EvaluateOptions {
  /** Write down the steps (default true); false leaves `steps` empty, for a caller that does not show them. */
  steps?: boolean;
}

/**
 * Evaluates a parsed calculation.
 *
 * @example
 * evaluate(parseExpression('8.80 g + 2.1 g')).result.lsd // -1
 * evaluate(parseExpression('8.80 g + 2.1 g'), { steps: false }).steps // []
 */
export function evaluate(tree: CalcTree, options: EvaluateOptions = {}): Evaluation {
  const ctx: Ctx = { input: tree.input, inputs: new Map(), steps: [], record: options.steps !== false, notes: [], uncertain: hasPlusMinus(tree.expr) };
  const result = withInput(ctx, () => evalNode(tree.expr, ctx));
  // the same remark about a number written twice is said once
  const seen = new Set<string>();
  const notes = ctx.notes.filter((n) => !seen.has(n.message) && !!seen.add(n.message));
  return { result, inputs: ctx.inputs, steps: ctx.steps, notes };
}

function hasPlusMinus(n: ExprNode): boolean {
  switch (n.kind) {
    case 'number':
      return n.plusMinus !== null;
    case 'formulaMass':
    case 'ratio':
      return false;
    case 'binary':
      return hasPlusMinus(n.left) || hasPlusMinus(n.right);
    case 'negate':
      return hasPlusMinus(n.operand);
    case 'power':
      return hasPlusMinus(n.base);
  }
}

const src = (ctx: Ctx, n: ExprNode) => ctx.input.slice(n.start, n.end).trim();
const col = (ctx: Ctx, offset: number) => columnOf(ctx.input, offset);

function withInput<T>(ctx: Ctx, fn: () => T): T {
  try {
    return fn();
  } catch (e) {
    if (e instanceof PondusError && e.input === undefined) throw new PondusError(e.issues, ctx.input);
    throw e;
  }
}

/** Evaluates a node; a PondusError thrown on the way gets the input in evaluate (withInput, once for the whole tree). */
function evalNode(n: ExprNode, ctx: Ctx): Quantity {
  switch (n.kind) {
    case 'number':
      return literal(n, ctx);
    case 'formulaMass':
      return formulaMassQuantity(n, ctx);
    case 'ratio':
      return ratio(n, ctx);
    case 'negate':
      return negate(evalNode(n.operand, ctx));
    case 'power': {
      const b = evalNode(n.base, ctx);
      const r = power(b, n.exponent, col(ctx, n.start));
      if (ctx.record) ctx.steps.push({ text: `(${src(ctx, n.base)})^${n.exponent}`, rule: b.lsd === null ? 'exact' : `a power keeps the significant figures of its base (${sigFigsOf(b)})` });
      return r;
    }
    case 'binary': {
      const a = evalNode(n.left, ctx);
      const b = perReference(n) ? referenceAmount(n, ctx) : evalNode(n.right, ctx);
      const r = n.op === '+' ? add(a, b, col(ctx, n.opStart)) : n.op === '-' ? subtract(a, b, col(ctx, n.opStart)) : n.op === '*' ? multiply(a, b) : divide(a, b, col(ctx, n.opStart));
      if (ctx.record) ctx.steps.push({ text: `${src(ctx, n.left)} ${n.op === '*' ? '×' : n.op === '/' ? '÷' : n.op} ${src(ctx, n.right)}`, rule: ruleFor(n, a, b, ctx) });
      return r;
    }
  }
}

function ruleFor(n: Extract<ExprNode, { kind: 'binary' }>, a: Quantity, b: Quantity, ctx: Ctx): string {
  if (a.lsd === null && b.lsd === null) return 'both exact: no limit on precision';
  if (n.op === '+' || n.op === '-') {
    const [lim, name] = a.lsd === null ? [b, n.right] : b.lsd === null ? [a, n.left] : a.lsd >= b.lsd ? [a, n.left] : [b, n.right];
    return `a ${n.op === '+' ? 'sum' : 'difference'} keeps the fewest decimal places: last digit at 10^${lim.lsd}, set by ${src(ctx, name)}`;
  }
  const sa = sigFigsOf(a);
  const sb = sigFigsOf(b);
  const [lim, name] = sa <= sb ? [sa, n.left] : [sb, n.right];
  const exactNote = a.lsd === null || b.lsd === null ? ' (the exact number does not limit it)' : '';
  return `a ${n.op === '*' ? 'product' : 'quotient'} keeps the fewest significant figures: ${lim}, set by ${src(ctx, name)}${exactNote}`;
}

type NumberNode = Extract<ExprNode, { kind: 'number' }>;

/**
 * Whether a quotient is written as a strength "per N unit" (`125 mg/5 mL`,
 * `2.00 g / 100 g`): a number with a unit divided by a whole number, with no
 * decimal point or ±, of a mass or a volume. That N is the reference amount the
 * strength is stated for, defined rather than measured (like the 100 of
 * g/100 mL), so it does not limit the figures.
 */
function perReference(n: Extract<ExprNode, { kind: 'binary' }>): n is Extract<ExprNode, { kind: 'binary' }> & { left: NumberNode; right: NumberNode } {
  if (n.op !== '/' || n.left.kind !== 'number' || n.right.kind !== 'number') return false;
  const r = n.right;
  if (n.left.unit === null || r.unit === null || r.plusMinus !== null || !/^[0-9]+$/.test(r.text) || /^0+$/.test(r.text)) return false;
  const u = unitOf(r.unit);
  return sameDims(u.dims, MASS) || sameDims(u.dims, VOLUME);
}

/** The divisor of a "per N unit" strength, read as exact, with a note naming the reading and how to write the other. */
function referenceAmount(n: Extract<ExprNode, { kind: 'binary' }> & { left: NumberNode; right: NumberNode }, ctx: Ctx): Quantity {
  const r = n.right;
  const column = col(ctx, r.start);
  const unit = unitOf(r.unit as string, column);
  const figures = r.text.replace(/^0+/, '').length;
  ctx.notes.push({
    code: 'EXACT_NUMBER',
    message: `${src(ctx, n)} is read as a strength: ${src(ctx, n.left)} per exactly ${r.text} ${unit.symbol} (a stated reference amount, it does not limit the figures); for a measured ${sameDims(unit.dims, MASS) ? 'mass' : 'volume'} write ${r.text}. ${unit.symbol} (${figures} significant figure${figures === 1 ? '' : 's'})`,
  });
  return quantity({ value: readNumber(r.text, column).value, lsd: null }, unit);
}

function literal(n: NumberNode, ctx: Ctx): Quantity {
  const column = col(ctx, n.start);
  const num = readNumber(n.text, column);
  const unit = n.unit ? unitOf(n.unit, column) : null;
  const whole = /^[0-9]+$/.test(n.text) && n.plusMinus === null;
  // a bare integer without a unit is an exact number (a count, a factor, the 100 of a percentage);
  // so is 100 % written without a decimal point: the defined whole of a percentage
  const definedHundred = whole && unit !== null && isPercent(unit) && n.text === '100';
  const isExact = (whole && !unit) || definedHundred;
  if (definedHundred) ctx.notes.push({ code: 'EXACT_NUMBER', message: `${n.text} ${unit.symbol} is read as exactly 100 ${unit.symbol} (the defined whole of a percentage, it does not limit the figures); write 100.0 ${unit.symbol} for a measured value` });
  if (num.ambiguous && !isExact) ctx.notes.push({ code: 'TRAILING_ZEROS', message: `the trailing zeros of ${n.text} are read as not significant (${sigFigsOf(num)} significant figure${sigFigsOf(num) === 1 ? '' : 's'}); write ${n.text}. or use scientific notation if they are` });
  const q = quantity(isExact ? { value: num.value, lsd: null } : num, unit);
  if (n.plusMinus !== null) {
    const u = readNumber(n.plusMinus, column);
    if (u.value.isNegative()) throw fail({ code: 'BAD_NUMBER', message: 'an uncertainty cannot be negative', column });
    const id = ctx.inputs.size;
    const scale = unitFactor(unit);
    ctx.inputs.set(id, u.value.times(scale));
    q.grad.set(id, new Decimal(1));
  }
  return q;
}

/**
 * A ratio `a:b` is a / b. Whole numbers in a ratio are defined (ratio strength
 * 1:1000 is 1 part in 1000 exactly); a part written with a decimal point is a
 * measured number and keeps its figures.
 */
function ratio(n: Extract<ExprNode, { kind: 'ratio' }>, ctx: Ctx): Quantity {
  const column = col(ctx, n.start);
  const part = (text: string): Measured => {
    const r = readNumber(text, column);
    return /^[0-9]+$/.test(text) ? { value: r.value, lsd: null } : r;
  };
  const a = part(n.parts);
  const b = part(n.whole);
  if (b.value.isZero()) throw fail({ code: 'DIVISION_BY_ZERO', message: `the ratio ${n.text} has 0 as its second number`, column });
  const unit = n.unit ? unitOf(n.unit, column) : null;
  const value = dividedBy(a, b);
  const q = quantity(value, unit);
  const exact = a.lsd === null && b.lsd === null;
  const shown = `${displayMeasured(value).text}${unit ? ` ${unit.symbol}` : ''}`;
  const wv = unit ? '' : `; for a solid in a liquid (${n.parts} g in ${n.whole} mL) write ${n.parts}:${n.whole} g/mL`;
  if (ctx.record) ctx.steps.push({ text: `${n.text} = ${n.parts} ÷ ${n.whole}`, rule: exact ? 'a ratio of whole numbers is defined: exact' : `a quotient keeps the fewest significant figures: ${sigFigsOf(value)}` });
  ctx.notes.push({ code: 'RATIO', message: `${n.text} is read as the ratio ${n.parts}/${n.whole} = ${shown}, ${exact ? 'exact (the numbers of a ratio are defined)' : 'with the figures of its measured part'}${wv}` });
  return q;
}

/** What M(formula) reads as: the molar mass with its tabulated precision, its notes, and (when asked for) its standard uncertainty. */
interface FormulaMassRead {
  reported: Measured;
  notes: Note[];
  uncertainty: { value: Decimal; standardUncertainty: Decimal } | null;
}

/** The formulas read lately (a batch names the same reagents again and again); bounded, emptied when full. */
const FORMULA_MASSES = new Map<string, FormulaMassRead>();
const MAX_FORMULAS_REMEMBERED = 512;

function readFormulaMass(formula: string, uncertain: boolean): FormulaMassRead {
  const key = uncertain ? `±${formula}` : formula;
  let read = FORMULA_MASSES.get(key);
  if (read === undefined) {
    const r = formulaMassDetail(formula);
    const reported = reportedMolarMass(r);
    const u = uncertain ? molarMassUncertainty(r) : null;
    read = { reported, notes: r.notes.map((note) => ({ code: note.code, message: note.message })), uncertainty: u && { value: u.value, standardUncertainty: u.standardUncertainty } };
    if (key.length <= 200) {
      if (FORMULA_MASSES.size >= MAX_FORMULAS_REMEMBERED) FORMULA_MASSES.clear();
      FORMULA_MASSES.set(key, read);
    }
  }
  return read;
}

const G_PER_MOL = unitOf('g/mol');

function formulaMassQuantity(n: Extract<ExprNode, { kind: 'formulaMass' }>, ctx: Ctx): Quantity {
  let r;
  try {
    r = readFormulaMass(n.formula, ctx.uncertain);
  } catch (e) {
    if (e instanceof PondusError) {
      // point the caret into the expression: the formula starts 2 characters after M(
      const shift = col(ctx, n.start) + 1;
      throw new PondusError(e.issues.map((i) => ({ ...i, column: i.column !== undefined ? i.column + shift : col(ctx, n.start) })), ctx.input);
    }
    throw e;
  }
  for (const note of r.notes) ctx.notes.push({ code: note.code, message: note.message });
  if (r.uncertainty) {
    const id = 1_000_000 + ctx.inputs.size;
    ctx.inputs.set(id, r.uncertainty.standardUncertainty);
    const q = quantity({ value: r.uncertainty.value, lsd: r.reported.lsd }, G_PER_MOL);
    q.grad.set(id, new Decimal(1));
    return q;
  }
  return quantity(r.reported, G_PER_MOL);
}
