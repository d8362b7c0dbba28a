/**
 * Elemental analysis: calculated against found mass percents, the verdict at a
 * tolerance, the solvates or salt partners that explain a miss, and the line
 * for the experimental section.
 *
 * The verdict rule: calculated values are rounded to two decimals (half to
 * even), as they are reported; the deviation is found − calculated, exactly;
 * an element passes when |deviation| ≤ tolerance. At the default 0.4, a
 * deviation of exactly 0.40 passes and 0.41 fails. With `rounding: 'half-up'`
 * (a house or pharmacopoeial rule) the calculated values are rounded half up
 * instead, and the verdict follows those reported values.
 */
import { ATOMS } from '../elements/atom-data.js';
import { Decimal } from '../exact/decimal.js';
import { SCALE_DIGITS } from '../exact/scaled.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import type { Note } from '../errors/issue.js';
import { formulaMassDetail, type MassOptions, type MassDetail } from '../mass/formula-mass.js';
import { hillOrder } from '../formula/hill.js';
import { FOUND_SCALE, readFoundValues, readPlainFound } from './found-values.js';
import type { RoundingMode } from '../sigfig/round.js';
import { SOLVENTS } from './solvents.js';
import { readNumber } from '../sigfig/read-number.js';
import { solventByName } from './solvents.js';
import { continuousAmount, solvateSearch, type MassVector } from './solvate-fit.js';
import { reportFormulaOf } from './report-formula.js';
import { LazyTexts } from '../exact/lazy-texts.js';

export interface AnalysisOptions extends MassOptions {
  /** Allowed |found − calculated| in percentage points (default 0.4, the common journal rule). */
  tolerance?: Decimal | string | number;
  /** Solvents and salt partners to try: names (water, DCM, EtOAc, TFA, …) or formulas. */
  solvents?: string[];
  /** Grid step for solvate amounts (default 0.05). */
  step?: number;
  /** Largest amount of each partner (default 2). */
  max?: number;
  /** Grid step for salt partners, the acids that protonate a basic site (default 0.5: whole or half amounts). */
  saltStep?: number;
  /** How many fits to report (default 5). */
  top?: number;
  /** How calculated percents are rounded to two decimals (default half-even). */
  rounding?: RoundingMode;
}

export interface Partner {
  /** As given: 'DCM', 'H2O'. */
  given: string;
  /** Its formula in Hill order. */
  formula: string;
  /** Its formula as a report writes it (HCl, not ClH). */
  written: string;
  name: string | null;
  /** True for an acid that forms a salt with a basic site (HCl, TFA, H2SO4, …). */
  salt: boolean;
}

/**
 * Acids that form salts with a basic nitrogen, by Hill formula (common practice): the hydrogen
 * halides, TFA, sulfuric, nitric, phosphoric, perchloric, tetrafluoroboric and hexafluorophosphoric
 * acids, methane- and toluenesulfonic acids, and maleic/fumaric, oxalic, citric and tartaric acids.
 * Acetic and formic acid are treated as solvents.
 */
export const SALT_ACIDS: ReadonlySet<string> = new Set(['ClH', 'BrH', 'HI', 'FH', 'C2HF3O2', 'H2O4S', 'HNO3', 'H3O4P', 'ClHO4', 'BF4H', 'F6HP', 'CH4O3S', 'C7H8O3S', 'C4H4O4', 'C2H2O4', 'C6H8O7', 'C4H6O6']);

export interface Fit {
  /** The formula with its solvates, as written in a report: 'C20H25N3O·0.5H2O'. */
  formula: string;
  /** Each partner: Hill formula, as written, name, amount (number and exact text). */
  solvates: { formula: string; written: string; name: string | null; amount: number; amountText: string }[];
  /** Calculated percents, rounded to two decimals as reported, by element (Hill order). */
  calculated: Record<string, number>;
  /** found − calculated, exactly, by element. */
  deviation: Record<string, number>;
  maxDeviation: number;
  pass: boolean;
  reportLine: string;
}

export interface AnalysisResult {
  input: string;
  /** The compound's formula in Hill order. */
  formula: string;
  /** The formula as the report line writes it, component by component: 'C11H15N·C2HF3O2·0.5H2O'. */
  reportFormula: string;
  /** Calculated percents, rounded to two decimals as reported, by element (Hill order). */
  calculated: Record<string, number>;
  /** Found values as given (numbers), and as written (at least two decimals). */
  found: Record<string, number>;
  foundText: Record<string, string>;
  /** found − calculated, exactly, by element. */
  deviation: Record<string, number>;
  maxDeviation: number;
  pass: boolean;
  /** The tolerance, percentage points, and as written. */
  tolerance: number;
  toleranceText: string;
  /** Whether each element is within the tolerance. */
  within: Record<string, boolean>;
  reportLine: string;
  /** Best fits with solvates (the bare formula included), best first; empty without solvents. */
  fits: Fit[];
  /** The least-squares amount of each single partner. */
  continuous: { formula: string; written: string; name: string | null; amount: number; maxDeviation: number }[];
  notes: Note[];
}

/**
 * Checks found percents against a formula, and fits solvates when asked.
 *
 * @param formula - the compound's formula, neutral (a salt written whole with its counter-ions).
 * @param foundText - the found mass percents, e.g. 'C=72.30, H=7.91, N=12.60' (or as journals print them, 'C, 72.30; H, 7.91').
 * @param options - tolerance in percentage points (default 0.4), solvents and salt partners to fit, the fitting grid (step, max, saltStep), how many fits to report, rounding, and the mass options.
 * @returns the calculated and found percents with their deviations, whether all are within tolerance, the solvate fits best first, and the notes.
 * @throws PondusError: a formula that cannot be read (the formula language's codes: UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, UNCLOSED_GROUP, AMBIGUOUS_READING, …); UNKNOWN_ELEMENT or BAD_MEASUREMENT for a found value that cannot be read, is negative or over 100 %, or found values that add up to well over 100 %; BAD_MEASUREMENT for a charged formula or a found element the formula (and solvents) do not contain; BAD_NUMBER for a tolerance that is not a number; BAD_OPTION for a tolerance out of range, an unknown solvent or a grid that makes no sense; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * analysis('C20H25N3O', 'C=72.30, H=7.91, N=12.60', { solvents: ['water'] }).fits[0].formula // 'C20H25N3O·0.5H2O'
 */
export function analysis(formula: string, foundText: string, options: AnalysisOptions = {}): AnalysisResult {
  return (options.solvents === undefined || options.solvents.length === 0 ? plainAnalysis(formula, foundText, options) : null) ?? exactAnalysis(formula, foundText, options);
}

/**
 * {@link analysis} computed with Decimal throughout: the general way, which the plain way
 * below gives way to for anything out of the ordinary (and which tests compare it with).
 *
 * @example
 * exactAnalysis('C6H6', 'C=92.26,H=7.74').pass // true
 */
export function exactAnalysis(formula: string, foundText: string, options: AnalysisOptions = {}): AnalysisResult {
  const read = readFoundValues(foundText);
  const found = read.values;
  const rounding = options.rounding ?? 'half-even';
  const tolerance = toleranceOf(options);
  const base = formulaMassDetail(formula, options);
  if (base.charge !== 0) throw fail({ code: 'BAD_MEASUREMENT', message: 'elemental analysis is of a neutral compound; give the whole salt, e.g. C12H14N2^2+ with its counter-ions' }, formula);
  const partners = (options.solvents ?? []).map((s) => partnerOf(s, options));
  const partnerMasses = partners.map((p) => formulaMassDetail(p.formula, options));
  for (const [symbol, value] of found) {
    if (value.isZero()) continue; // found 0.00: the compound has none, and the check says whether that fits
    if (!base.atoms.has(symbol) && !partnerMasses.some((m) => m.atoms.has(symbol))) {
      throw fail({ code: 'BAD_MEASUREMENT', message: `a found value for ${symbol}, which ${base.formula} does not contain${partners.length ? ' (nor any solvent given)' : ''}` }, foundText);
    }
  }
  const symbols = hillOrder(found.keys());
  // found values are measurements: reported with the decimals written, never padded ('60.2' is not '60.20')
  const textOf = new Map(symbols.map((s) => [s, found.get(s)!.toFixed(decimalsOf(read.text.get(s)!))]));
  const written = reportFormulaOf(base);
  const own = ownFigures(base, symbols, found);
  const bare = evaluateFit(written, base, [], symbols, found, tolerance, textOf, rounding, own);
  const notes: Note[] = [...base.notes, ...read.notes, ...impossibleNotes(base, partners, partnerMasses, symbols, found, tolerance, options, own)];
  // salt partners only where the compound can take them: an acid needs a basic site, and a formula
  // cannot tell an amine from an amide, so each N atom counts as one site (at most that many acids)
  const sites = Number(base.atoms.get('N') ?? 0);
  const offered = partners.map((p) => !p.salt || sites > 0);
  partners.forEach((p, j) => {
    if (!offered[j]) notes.push({ code: 'PARTNER_NOT_OFFERED', message: `${p.written} is an acid that forms a salt with a basic site (nitrogen), and ${base.formula} has no nitrogen: it is not fitted` });
  });

  let exactFits: ExactFit[] = [];
  const continuous: AnalysisResult['continuous'] = [];
  if (partners.length > 0) {
    const step = options.step ?? 0.05;
    const max = options.max ?? 2;
    if (!(step > 0 && step <= max && max <= 20 && max / step <= 2000)) throw fail({ code: 'BAD_OPTION', message: `step ${step} and max ${max} make no sensible grid (0 < step ≤ max ≤ 20, at most 2000 steps)` });
    const saltStep = options.saltStep ?? 0.5;
    if (!(saltStep > 0 && saltStep <= 2)) throw fail({ code: 'BAD_OPTION', message: `the salt step ${saltStep} must be above 0 and at most 2` });
    const foundNums = own.foundNumbers;
    const vec = (m: MassDetail): MassVector => ({ masses: symbols.map((s) => exactMass(m, s).toNumber()), total: m.molarMass.toNumber() });
    const baseVec: MassVector = { masses: own.massNumbers, total: own.molarNumber };
    const partnerVecs = partnerMasses.map(vec);
    const steps = partners.map((p) => (p.salt ? saltStep : step));
    const maxes = partners.map((p, j) => (!offered[j] ? 0 : p.salt ? Math.min(max, sites) : max));
    const search = solvateSearch(foundNums, baseVec, partnerVecs, steps, maxes, options.top ?? 5);
    notes.push(...search.notes);
    const candidates = search.candidates;
    exactFits = candidates.map((c) => {
      const used = c.amounts.map((a, j) => ({ a, j })).filter((x) => x.a > 0);
      return evaluateFit(
        written,
        base,
        used.map((u) => ({ amount: new Decimal(u.a.toFixed(6)), partner: partners[u.j], mass: partnerMasses[u.j] })),
        symbols,
        found,
        tolerance,
        textOf,
        rounding,
        own,
      );
    });
    partners.forEach((p, j) => {
      if (!offered[j]) return;
      const x = continuousAmount(foundNums, baseVec, partnerVecs[j], maxes[j]);
      const amount = new Decimal(x.toFixed(3));
      const f = evaluateFit(written, base, [{ amount, partner: p, mass: partnerMasses[j] }], symbols, found, tolerance, textOf, rounding, own);
      continuous.push({ formula: p.formula, written: p.written, name: p.name, amount: amount.toNumber(), maxDeviation: f.maxDeviation.toNumber() });
    });
  }
  const plain = plainFit(bare);
  return {
    input: formula,
    formula: base.formula,
    reportFormula: written,
    calculated: plain.calculated,
    found: Object.fromEntries(symbols.map((s, i) => [s, own.foundNumbers[i]])),
    foundText: Object.fromEntries(symbols.map((s) => [s, textOf.get(s)!])),
    deviation: plain.deviation,
    maxDeviation: plain.maxDeviation,
    pass: bare.pass,
    tolerance: tolerance.toNumber(),
    toleranceText: tolerance.toFixed(),
    within: Object.fromEntries(symbols.map((s) => [s, bare.deviation.get(s)!.abs().lte(tolerance)])),
    reportLine: bare.reportLine,
    fits: exactFits.map(plainFit),
    continuous,
    notes,
  };
}

function toleranceOf(options: AnalysisOptions): Decimal {
  const tolerance = options.tolerance instanceof Decimal ? options.tolerance : readNumber(String(options.tolerance ?? '0.4')).value;
  if (tolerance.isNegative() || tolerance.gt(100)) throw fail({ code: 'BAD_OPTION', message: `tolerance ${tolerance.toFixed()} is out of range` });
  return tolerance;
}

/** A tolerance's figures for the plain way: in 10^-8 percentage points (null past 8 decimals), as a number and as text. */
interface ToleranceFigures {
  scaled: number | null;
  number: number;
  text: string;
}

/** By tolerance: a batch reads the same one (the same Decimal, remembered by readNumber) line after line. */
const toleranceFigures = new WeakMap<Decimal, ToleranceFigures>();

function figuresOf(t: Decimal): ToleranceFigures {
  let f = toleranceFigures.get(t);
  if (f === undefined) {
    f = { scaled: t.decimalPlaces() <= 8 ? Number(t.times(FOUND_SCALE).toFixed()) : null, number: t.toNumber(), text: t.toFixed() };
    toleranceFigures.set(t, f);
  }
  return f;
}

/** A whole number of hundredths as text to two decimals ('74.27'). */
const hundredthsText = (k: number) => `${Math.floor(k / 100)}.${String(k % 100).padStart(2, '0')}`;

/** The texts of the percents 0.00 to 100.00 by hundredths, each made on first use. */
const percentTexts = new LazyTexts(10_001);

/** 10^-8 percentage points in a hundredth. */
const HUNDREDTH = FOUND_SCALE / 100;

/**
 * The check without partners, in floating point where it decides and exact whole numbers
 * (10^-8 percentage points) where the result must be exact: for a found set {@link readPlainFound}
 * reads and a formula whose element masses are exact whole numbers of 10^-12 u. The same result as
 * {@link exactAnalysis}, field for field; null, to go that way, for anything else: a found set
 * read otherwise, a tolerance past 8 decimals, a percent within 10^-6 of a rounding tie, and
 * every input the general way refuses (so that it refuses it with its own error). A found value
 * floating point cannot clear of the IMPOSSIBLE_PERCENT note is checked by the general way's own
 * check, on Decimal values. Solvents are not looked at: {@link analysis} comes here only without.
 *
 * @param formula - the compound's formula, neutral.
 * @param foundText - the found mass percents, e.g. 'C=74.75 H=7.49 N=12.58'.
 * @param options - as for analysis, without solvents.
 * @returns the result analysis gives, or null where the general way must decide.
 * @throws PondusError: the codes of formulaMassDetail for a formula that cannot be read; BAD_NUMBER or BAD_OPTION for a tolerance analysis refuses.
 * @example
 * plainAnalysis('C6H6', 'C=92.26 H=7.74')?.pass // true
 * plainAnalysis('C6H6', 'C=92.26 H=+7.74')       // null
 */
export function plainAnalysis(formula: string, foundText: string, options: AnalysisOptions = {}): AnalysisResult | null {
  const read = readPlainFound(foundText);
  if (read === null) return null;
  const tolerance = toleranceOf(options);
  const tol = figuresOf(tolerance);
  if (tol.scaled === null) return null;
  const base = formulaMassDetail(formula, options);
  if (base.charge !== 0) return null;
  // as base.atoms.has(symbol), without building the map: its keys are those of the vector's ids
  const ids = base.vector.ids;
  for (let j = 0; j < read.symbols.length; j++) {
    if (read.scaled[j] === 0) continue;
    let has = false;
    for (let q = 0; q < ids.length && !has; q++) has = ATOMS.data[ids[q]].key === read.symbols[j];
    if (!has) return null;
  }
  const symbols = hillOrder(read.symbols);
  const massScaled = elementScaled(base, symbols);
  if (massScaled === null) return null;
  const molarNumber = base.molarMassNumber();
  const n = symbols.length;
  const calculated: Record<string, number> = {};
  const found: Record<string, number> = {};
  const texts: Record<string, string> = {};
  const deviation: Record<string, number> = {};
  const within: Record<string, boolean> = {};
  let calcd = '';
  let given = '';
  let maxScaled = 0;
  let common: ReturnType<typeof commonPartnerShares> | null = null;
  let exactNotes = false;
  for (let i = 0; i < n; i++) {
    const s = symbols[i];
    const j = n === read.symbols.length && read.symbols[i] === s ? i : read.symbols.indexOf(s);
    const text = read.texts[j];
    const f = read.scaled[j];
    // an exact whole number over 10^8: the nearest double of the text, as Number(text) reads it
    const foundNumber = f / FOUND_SCALE;
    const massNumber = massScaled[i] / SCALE;
    // as percentTo2 rounds: floating point, unless within 10^-6 of a tie
    const x = (massNumber / molarNumber) * 10_000;
    if (!(Number.isFinite(x) && x >= 0 && x < 1e12 && Math.abs(x - Math.floor(x) - 0.5) > 1e-6)) return null;
    const k = Math.round(x);
    const c = k <= 10_000 ? (percentTexts.get(k) ?? percentTexts.keep(k, hundredthsText(k))) : hundredthsText(k);
    // as impossibleNotes decides without exact quotients; past that, the general way
    const ownNumber = (massNumber / molarNumber) * 100;
    if (foundNumber - ownNumber - tol.number >= -1e-9) {
      const share = (common ??= commonPartnerShares(options)).get(s);
      if (!(share && foundNumber - Math.max(ownNumber, share.percentNumber) - tol.number < -1e-9)) exactNotes = true;
    }
    // found − calculated exactly, in 10^-8 percentage points; the quotient of two exact doubles is the nearest double of the decimal
    const d = f - k * HUNDREDTH;
    const abs = d < 0 ? -d : d;
    if (abs > maxScaled) maxScaled = abs;
    // k/100 is the nearest double of the text, as Number(c) reads it
    calculated[s] = k / 100;
    found[s] = foundNumber;
    texts[s] = text;
    deviation[s] = d / FOUND_SCALE;
    within[s] = abs <= tol.scaled;
    calcd += `${i ? '; ' : ''}${s}, ${c}`;
    given += `${i ? '; ' : ''}${s}, ${text}`;
  }
  const written = reportFormulaOf(base);
  let notes: Note[] = base.notes.length || read.notes.length ? [...base.notes, ...read.notes] : [];
  if (exactNotes) {
    // a found value floating point cannot clear: the general way's own check, on its Decimal values
    const exact = new Map(read.symbols.map((s, j) => [s, new Decimal(read.texts[j])]));
    notes = [...notes, ...impossibleNotes(base, [], [], symbols, exact, tolerance, options, ownFigures(base, symbols, exact))];
  }
  return {
    input: formula,
    formula: base.formula,
    reportFormula: written,
    calculated,
    found,
    foundText: texts,
    deviation,
    maxDeviation: maxScaled / FOUND_SCALE,
    pass: maxScaled <= tol.scaled,
    tolerance: tol.number,
    toleranceText: tol.text,
    within,
    reportLine: `Anal. Calcd for ${written}: ${calcd}. Found: ${given}.`,
    fits: [],
    continuous: [],
    notes,
  };
}

function decimalsOf(written: string): number {
  const dot = written.indexOf('.');
  return dot < 0 ? 0 : written.length - dot - 1;
}

const solventShares = new Map<string, Map<string, { share: Decimal; percentNumber: number; name: string }>>();

/** The largest mass share of each element among the common solvents and salt partners (cached per weight table). */
function commonPartnerShares(options: MassOptions): Map<string, { share: Decimal; percentNumber: number; name: string }> {
  const key = options.weights ?? 'standard';
  let out = solventShares.get(key);
  if (out) return out;
  out = new Map();
  for (const { formula, name } of Object.values(SOLVENTS)) {
    const m = formulaMassDetail(formula, { weights: options.weights });
    for (const s of m.atoms.keys()) {
      const share = exactMass(m, s).div(m.molarMass);
      const prev = out.get(s);
      if (!prev || share.gt(prev.share)) out.set(s, { share, percentNumber: share.times(100).toNumber(), name });
    }
  }
  solventShares.set(key, out);
  return out;
}

/**
 * Found values no solvate or salt partner could explain: more of an element than the formula,
 * the partners given or any common solvent contains (a mixture's percent lies between its parts').
 */
function impossibleNotes(base: MassDetail, partners: Partner[], partnerMasses: MassDetail[], symbols: string[], found: Map<string, Decimal>, tolerance: Decimal, options: MassOptions, figures: OwnFigures): Note[] {
  const notes: Note[] = [];
  const tol = tolerance.toNumber();
  for (let i = 0; i < symbols.length; i++) {
    const s = symbols[i];
    const v = found.get(s)!;
    // well within the tolerance in floating point: no exact quotient needed
    const ownNumber = (figures.massNumbers[i] / figures.molarNumber) * 100;
    if (figures.foundNumbers[i] - ownNumber - tol < -1e-9) continue;
    // without partners, a common solvent or salt partner that holds more of the element, well
    // beyond the value, explains it too (floating point decides all but a near tie)
    if (partners.length === 0) {
      const common = commonPartnerShares(options).get(s);
      if (common && figures.foundNumbers[i] - Math.max(ownNumber, common.percentNumber) - tol < -1e-9) continue;
    }
    const ownMass = figures.masses()[i];
    const own = ownMass.div(base.molarMass).times(100);
    if (v.minus(own).lte(tolerance)) continue;
    let most = { percent: own, what: base.formula };
    partnerMasses.forEach((m, j) => {
      const p = exactMass(m, s).div(m.molarMass).times(100);
      if (p.gt(most.percent)) most = { percent: p, what: partners[j].name ?? partners[j].formula };
    });
    const common = commonPartnerShares(options).get(s);
    if (common && common.share.times(100).gt(most.percent)) most = { percent: common.share.times(100), what: common.name };
    if (v.minus(most.percent).gt(tolerance)) {
      notes.push({ code: 'IMPOSSIBLE_PERCENT', message: `${s} found at ${v.toFixed()} % is more than ${base.formula} (${own.toFixed(2)} %) with any solvate or salt partner could contain (at most ${most.percent.toFixed(2)} %, ${most.what}): check the value and the formula` });
    }
  }
  return notes;
}

function partnerOf(given: string, options: MassOptions): Partner {
  const named = solventByName(given);
  const formulaText = named ? named.formula : given;
  try {
    const m = formulaMassDetail(formulaText, options);
    return { given, formula: m.formula, written: reportFormulaOf(m), name: named ? named.name : null, salt: SALT_ACIDS.has(m.formula) };
  } catch (e) {
    if (e instanceof PondusError && !named) {
      throw fail({ code: 'BAD_OPTION', message: `unknown solvent '${given}': give a name (water, DCM, chloroform, MeOH, EtOH, EtOAc, ether, THF, acetone, MeCN, DMF, DMSO, toluene, hexane, HCl, TFA, …) or a formula` }, given);
    }
    throw e;
  }
}

interface Used {
  amount: Decimal;
  partner: Partner;
  mass: MassDetail;
}

/** A fit computed exactly, before it becomes plain data. */
interface ExactFit {
  formula: string;
  solvates: { formula: string; written: string; name: string | null; amount: Decimal }[];
  calculated: Map<string, Decimal>;
  /** The calculated percents as the nearest doubles. */
  calculatedNumbers: Map<string, number>;
  deviation: Map<string, Decimal>;
  maxDeviation: Decimal;
  pass: boolean;
  reportLine: string;
}

/** The plain form of an exact fit: numbers are the shortest doubles of the exact decimals. */
function plainFit(f: ExactFit): Fit {
  const rec = (m: Map<string, Decimal>) => Object.fromEntries([...m].map(([k, v]) => [k, v.toNumber()]));
  return {
    formula: f.formula,
    solvates: f.solvates.map((s) => ({ formula: s.formula, written: s.written, name: s.name, amount: s.amount.toNumber(), amountText: s.amount.toFixed() })),
    calculated: Object.fromEntries(f.calculatedNumbers),
    deviation: rec(f.deviation),
    maxDeviation: f.maxDeviation.toNumber(),
    pass: f.pass,
    reportLine: f.reportLine,
  };
}

/**
 * The compound's own figures for the found elements, in their order, computed once: the nearest
 * doubles of its element masses, molar mass and found values, and the exact element masses, made
 * only when a fit with a partner or a near tie in rounding needs them.
 */
interface OwnFigures {
  masses(): Decimal[];
  massNumbers: number[];
  molarNumber: number;
  foundNumbers: number[];
}

function ownFigures(base: MassDetail, symbols: readonly string[], found: Map<string, Decimal>): OwnFigures {
  let exact: Decimal[] | null = null;
  const masses = () => (exact ??= elementMasses(base, symbols));
  const scaled = elementScaled(base, symbols);
  // an exact sum in 10^-12 u divided by 10^12 is the nearest double of the exact mass, as is the molar mass's
  const massNumbers = scaled !== null ? scaled.map((s) => s / SCALE) : masses().map((m) => m.toNumber());
  return { masses, massNumbers, molarNumber: base.molarMassNumber(), foundNumbers: symbols.map((s) => found.get(s)!.toNumber()) };
}

const SCALE = 10 ** SCALE_DIGITS;

/** The mass of each found element in 10^-12 u, as exact integers; null when a count or a sum is not a safe whole number. */
function elementScaled(m: MassDetail, symbols: readonly string[]): number[] | null {
  const { ids, counts, whole } = m.vector;
  if (!whole) return null;
  const table = m.weights === 'abridged' ? ATOMS.abridgedScaled : ATOMS.standardScaled;
  const out = symbols.map(() => 0);
  for (let k = 0; k < ids.length; k++) {
    const i = symbols.indexOf(ATOMS.data[ids[k]].symbol);
    if (i < 0) continue;
    const w = table[ids[k]];
    const n = counts[k];
    if (typeof w !== 'number' || typeof n !== 'number') return null;
    out[i] += n * w;
    if (!Number.isSafeInteger(out[i])) return null;
  }
  return out;
}

function evaluateFit(baseWritten: string, base: MassDetail, used: Used[], symbols: readonly string[], found: Map<string, Decimal>, tolerance: Decimal, textOf: Map<string, string>, rounding: RoundingMode, own: OwnFigures): ExactFit {
  let total: Decimal | null = null;
  const elementMass = used.length === 0 ? null : own.masses().slice();
  for (const u of used) {
    total = (total ?? base.molarMass).plus(u.mass.molarMass.times(u.amount));
    symbols.forEach((s, i) => {
      elementMass![i] = elementMass![i].plus(exactMass(u.mass, s).times(u.amount));
    });
  }
  const totalNumber = total === null ? own.molarNumber : total.toNumber();
  const whole = () => total ?? base.molarMass;
  const calculated = new Map<string, Decimal>();
  const calculatedNumbers = new Map<string, number>();
  const calculatedText: string[] = [];
  const deviation = new Map<string, Decimal>();
  let maxDeviation = new Decimal(0);
  symbols.forEach((s, i) => {
    const c = percentTo2(() => (elementMass === null ? own.masses()[i] : elementMass[i]), whole, rounding, elementMass === null ? own.massNumbers[i] : elementMass[i].toNumber(), totalNumber);
    calculated.set(s, c.value);
    calculatedNumbers.set(s, c.number);
    calculatedText.push(c.text);
    const d = found.get(s)!.minus(c.value);
    deviation.set(s, d);
    if (d.abs().gt(maxDeviation)) maxDeviation = d.abs();
  });
  const formula = baseWritten + used.map((u) => `·${u.amount.eq(1) ? '' : u.amount.toFixed()}${u.partner.written}`).join('');
  const reportLine = `Anal. Calcd for ${formula}: ${symbols.map((s, i) => `${s}, ${calculatedText[i]}`).join('; ')}. Found: ${symbols.map((s) => `${s}, ${textOf.get(s)}`).join('; ')}.`;
  return {
    formula,
    solvates: used.map((u) => ({ formula: u.partner.formula, written: u.partner.written, name: u.partner.name, amount: u.amount })),
    calculated,
    calculatedNumbers,
    deviation,
    maxDeviation,
    pass: maxDeviation.lte(tolerance),
    reportLine,
  };
}

/** Mass of one element in a formula unit, g/mol, exactly. */
/**
 * 100·part/whole rounded to 2 decimals. Floating point settles it unless the
 * value is within 10⁻⁶ of a half-way point between two 2-decimal values;
 * only then is the exact Decimal quotient needed.
 */
function percentTo2(part: () => Decimal, whole: () => Decimal, rounding: RoundingMode, partNumber: number, wholeNumber: number): { value: Decimal; number: number; text: string } {
  const x = (partNumber / wholeNumber) * 10_000;
  if (Number.isFinite(x) && x >= 0 && x < 1e12 && Math.abs(x - Math.floor(x) - 0.5) > 1e-6) {
    const k = Math.round(x);
    // the text is the value to 2 decimals, and the nearest double of that text is the value's
    const text = `${Math.floor(k / 100)}.${String(k % 100).padStart(2, '0')}`;
    return { value: new Decimal(text), number: Number(text), text };
  }
  const value = part().div(whole()).times(100).toDecimalPlaces(2, rounding === 'half-up' ? Decimal.ROUND_HALF_UP : Decimal.ROUND_HALF_EVEN);
  return { value, number: value.toNumber(), text: value.toFixed(2) };
}

const ZERO = new Decimal(0);

function exactMass(m: MassDetail, symbol: string): Decimal {
  return m.contributions.filter((c) => c.symbol === symbol).reduce((s, c) => s.plus(c.mass), new Decimal(0));
}

/** exactMass for each symbol, in one pass over the contributions (the same sums, in the same order). */
function elementMasses(m: MassDetail, symbols: readonly string[]): Decimal[] {
  const out = symbols.map(() => ZERO);
  for (const c of m.contributions) {
    const i = symbols.indexOf(c.symbol);
    if (i >= 0) out[i] = out[i].plus(c.mass);
  }
  return out;
}
