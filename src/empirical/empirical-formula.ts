/**
 * Empirical and molecular formulas from measurements.
 */
import { notesJson } from '../errors/note-json.js';
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { formulaMassDetail } from '../mass/formula-mass.js';
import { readMeasurements } from './measurements.js';
import { DEFAULT_TOLERANCE, prepareData, searchFormula, searchMolecular, type FormulaFit } from './formula-search.js';
import { hillOrder } from '../formula/hill.js';
import { conventionalFormulaOf } from './written.js';
import { checkInputLength } from '../errors/input-length.js';
import { gcd } from '../exact/gcd.js';

/** An empirical formula with more atoms than this gets a note: such a fit says more about the data's precision than about the compound. */
export const LARGE_EMPIRICAL = 60;
/** A single molar mass is searched within ±1 % (a molar mass from a colligative or MS measurement; common practice). */
export const MOLAR_MASS_WINDOW = 0.01;

export interface EmpiricalOptions {
  /** Molar mass (g/mol) or a range '170-190', for the molecular formula. */
  molarMass?: string;
  /** Analysis tolerance, percentage points (default 0.3). */
  tolerance?: number;
}

/** A compound key (an oxide) and the element values it was split into, as plain numbers. */
export interface PlainConversion {
  key: string;
  formula: string;
  value: number;
  elements: Record<string, number>;
}

export interface EmpiricalResult {
  input: string;
  /** The empirical formula as written: Hill order with carbon, IUPAC's electronegativity order without (Mg2SiO4). */
  empirical: string;
  /** The empirical formula in Hill order (Mg2O4Si). */
  hill: string;
  /** Its molar mass, g/mol (the exact sum as a number, and as text). */
  empiricalMass: number;
  empiricalMassText: string;
  /** The fit of the formula reported (the molecular formula's, when one was found: the percents are the same). */
  fit: FormulaFit;
  /** Other formulas that fit, best first (molecular formulas when a molar mass was given and one fits). */
  alternatives: FormulaFit[];
  /** Measured percents (normalised for masses) and their limits, percentage points. */
  percents: Record<string, number>;
  limits: Record<string, number>;
  /** The analysis tolerance used, percentage points. */
  tolerance: number;
  /** The element by difference, if any. */
  byDifference: string | null;
  /** The molecular formula, when a molar mass was given and a formula of that mass fits. */
  molecular: string | null;
  /** The molecular formula in Hill order. */
  molecularHill: string | null;
  multiple: number | null;
  conversions: PlainConversion[];
  notes: Note[];
}

function reduceFit(f: FormulaFit): { formula: string; hill: string; multiple: number } {
  const g = Object.values(f.counts).reduce((a, b) => gcd(a, b), 0);
  if (g <= 1) return { formula: f.formula, hill: f.hill, multiple: 1 };
  const counts = Object.fromEntries(Object.entries(f.counts).map(([s, c]) => [s, c / g]));
  return { formula: conventionalFormulaOf(counts), hill: formulaMassDetail(Object.entries(counts).map(([s, c]) => `${s}${c}`).join(''), { abbreviations: 'none' }).formula, multiple: g };
}

const MOLAR_MASS_VALUE = /^[0-9]+(\.[0-9]+)?(\s*g\/mol)?$/;
const MOLAR_MASS_RANGE = /^([0-9.]+)\s*(?:-|–|\.\.)\s*([0-9.]+)$/;

/**
 * How a molar mass given for the molecular formula is written: one value ('180.16', '180.16
 * g/mol'), a range ('170-190', '170–190', '170..190') with its two ends, or null for neither. The
 * text is trimmed and at most 64 characters are read, with one run of spaces at most between its
 * parts, so no text costs more than one pass.
 *
 * @example
 * molarMassForm(' 180.16 g/mol ') // { kind: 'value' }
 * molarMassForm('170-190') // { kind: 'range', lo: '170', hi: '190' }
 * molarMassForm('heavy') // null
 */
export function molarMassForm(text: string): { kind: 'value' } | { kind: 'range'; lo: string; hi: string } | null {
  const t = text.trim();
  if (t.length > 64) return null;
  if (MOLAR_MASS_VALUE.test(t)) return { kind: 'value' };
  const range = MOLAR_MASS_RANGE.exec(t);
  return range ? { kind: 'range', lo: range[1], hi: range[2] } : null;
}

/** Reads --molar-mass: one value (searched within ±1 %) or a range. */
function molarWindow(text: string): { lo: number; hi: number; text: string } {
  const form = molarMassForm(text);
  if (form?.kind === 'range') {
    const lo = Number(form.lo);
    const hi = Number(form.hi);
    if (!(lo > 0 && hi > lo && hi <= 100_000)) throw fail({ code: 'BAD_OPTION', message: `\`molarMass: ${text}\`: a range goes from the lower to the higher molar mass, both above zero`, options: ['molarMass'] });
    return { lo, hi, text: `${form.lo}–${form.hi} g/mol` };
  }
  if (form === null) throw fail({ code: 'BAD_OPTION', message: `\`molarMass\` takes a number of g/mol or a range such as 170-190, not '${text}'`, options: ['molarMass'] });
  const M = Number(text.replace(/g\/mol/, '').trim());
  if (!(M > 0 && M <= 100_000)) throw fail({ code: 'BAD_OPTION', message: 'the molar mass must be positive (at most 100000 g/mol)' });
  return { lo: M * (1 - MOLAR_MASS_WINDOW), hi: M * (1 + MOLAR_MASS_WINDOW), text: `${text.replace(/g\/mol/, '').trim()} g/mol ± 1 %` };
}

/**
 * The empirical formula of measurements, and the molecular formula for a molar mass. With a molar
 * mass, the molecular formula is searched directly (every formula of that mass whose percents fit),
 * and when several fit equally well a note says an accurate mass decides (the candidates command).
 *
 * @param input - one measurement set, as for {@link readMeasurements}.
 * @param options - the molar mass (a number of g/mol or a range such as 170-190) for the molecular formula, and the tolerance in percentage points.
 * @returns the empirical formula with its mass, fit and alternatives, the percents and limits, the molecular formula and multiple when a molar mass is given, and the notes.
 * @throws PondusError: INPUT_TOO_LONG for a set or molar mass past its length limit; the codes of {@link readMeasurements} (BAD_MEASUREMENT, UNKNOWN_ELEMENT); BAD_OPTION for a molar mass that is not a positive number of g/mol or a range, or a tolerance out of range; NO_FORMULA_FITS when no formula fits; SEARCH_TOO_LARGE for a search beyond the work limit; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * empirical('C=40.00 H=6.71 O=53.29', { molarMass: '180.16' }).molecular // 'C6H12O6'
 * empirical('C=72.15 H=7.12 N=4.72 O=rest', { molarMass: '299.4' }).molecular // 'C18H21NO3'
 */
export function empirical(input: string, options: EmpiricalOptions = {}): EmpiricalResult {
  checkInputLength(input, 'the measurement set');
  checkInputLength(options.molarMass, 'the molar mass', 100);
  const m = readMeasurements(input);
  const tolerance = options.tolerance ?? DEFAULT_TOLERANCE;
  const window = options.molarMass !== undefined ? molarWindow(options.molarMass) : null;
  const notes: Note[] = [];
  const d = m.difference;
  if (d) notes.push({ code: 'BY_DIFFERENCE', message: `${d.symbol} by difference: ${d.value.toFixed()}${m.kind === 'percent' ? ' %' : ' g'}` });
  notes.push(...(m.notes ?? []));
  let molecular: string | null = null;
  let molecularHill: string | null = null;
  let empiricalHill: string;
  let multiple: number | null = null;
  let fit: FormulaFit;
  let alternatives: FormulaFit[];
  let empiricalFormula: string;
  const data = prepareData(m, { tolerance });
  const rec = (a: number[]) => Object.fromEntries(hillOrder(data.symbols).map((s) => [s, a[data.symbols.indexOf(s)]]));
  const percents = rec(data.percents);
  const limits = rec(data.limits);
  const mol = window ? searchMolecular(m, window.lo, window.hi, { tolerance }) : [];
  if (window && mol.length > 0) {
    fit = mol[0];
    alternatives = mol.slice(1, 6);
    molecular = fit.formula;
    molecularHill = fit.hill;
    const r = reduceFit(fit);
    empiricalFormula = r.formula;
    empiricalHill = r.hill;
    multiple = r.multiple;
    const tied = mol.filter((f) => f.grade === fit.grade);
    if (tied.length > 1) {
      notes.push({
        code: 'DATA_CANNOT_DECIDE',
        message: `${tied.length} molecular formulas of ${window.text} fit the data about equally well (${tied.slice(0, 4).map((f) => f.formula).join(', ')}${tied.length > 4 ? ', …' : ''}); the simplest is shown. The analysis cannot decide between them; an accurate mass can: \`candidateFormulas\` M/Z \`ion: '[M+H]+'\` \`found: '${hillOrder(data.symbols).map((s) => `${s}=${percents[s].toFixed(2)}`).join(' ')}'\``,
        options: ['ion', 'found'],
        functions: ['candidateFormulas'],
      });
    }
  } else {
    const s = searchFormula(m, { tolerance });
    fit = s.best;
    alternatives = s.alternatives;
    empiricalFormula = s.best.formula;
    empiricalHill = s.best.hill;
    if (window) {
      const em = formulaMassDetail(empiricalHill, { abbreviations: 'none' }).molarMass.toNumber();
      notes.push({ code: 'NOT_A_MULTIPLE', message: `no formula of ${window.text} fits the data within the limits (the empirical formula ${empiricalFormula} is ${em.toFixed(3)} g/mol; ${(window.lo / em).toFixed(2)}–${(window.hi / em).toFixed(2)} × that): no molecular formula; check the molar mass, or search near a measured mass with the candidates command` });
    }
  }
  const massResult = formulaMassDetail(empiricalHill, { abbreviations: 'none' }); // a Hill formula: element symbols only
  if (fit.atoms > LARGE_EMPIRICAL && molecular === null) {
    notes.push({ code: 'LARGE_FORMULA', message: `the simplest formula within the limits has ${fit.atoms} atoms: the compound is not what the values suggest, or they are off; check them, or search near a measured mass with the candidates command` });
  }
  return {
    input,
    empirical: empiricalFormula,
    hill: empiricalHill,
    empiricalMass: massResult.molarMass.toNumber(),
    empiricalMassText: massResult.molarMass.toFixed(),
    fit,
    alternatives,
    percents,
    limits,
    tolerance,
    byDifference: d ? d.symbol : null,
    molecular,
    molecularHill,
    multiple,
    conversions: (m.conversions ?? []).map((c) => ({ key: c.key, formula: c.formula, value: c.value.toNumber(), elements: Object.fromEntries(c.parts.map((p) => [p.symbol, p.value.toNumber()])) })),
    notes,
  };
}

/**
 * The JSON object `pondus empirical --json` writes (contract keys `empirical`, `molecular`).
 *
 * @param r - a result of {@link empirical}.
 * @returns the plain JSON object, with the contract keys empirical and molecular.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * empiricalJson(empirical('C=40.00 H=6.71 O=53.29')).empirical // 'CH2O'
 */
export function empiricalJson(r: EmpiricalResult) {
  return {
    input: r.input,
    empirical: r.empirical,
    molecular: r.molecular,
    multiple: r.multiple,
    hill: r.hill,
    molecularHill: r.molecularHill,
    empiricalMass: r.empiricalMass,
    percents: { ...r.percents },
    limits: { ...r.limits },
    tolerance: r.tolerance,
    residuals: { ...r.fit.residuals },
    grade: r.fit.grade,
    alternatives: r.alternatives.map((a) => ({ formula: a.formula, hill: a.hill, residuals: { ...a.residuals }, grade: a.grade })),
    notes: notesJson(r.notes),
    ...(r.conversions.length ? { conversions: r.conversions.map((c) => ({ ...c, elements: { ...c.elements } })) } : {}),
  };
}
