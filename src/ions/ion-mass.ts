/**
 * The m/z of an ion: the molecule (or n molecules), plus and minus the adduct terms as neutral
 * atoms, less the charge's electrons (CODATA electron mass), over the number of charges.
 * Monoisotopic masses are AME2020 masses of the principal isotopes, as for `mass`.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { ELECTRON_MASS } from '../elements/constants.js';
import { getAtomData } from '../elements/atom-data.js';
import { Decimal } from '../exact/decimal.js';
import { isWhole } from '../formula/amount.js';
import { flattenFormula, type AtomCounts } from '../formula/flatten.js';
import { chargeText, hillFormula } from '../formula/hill.js';
import { parseFormula, type ParseOptions } from '../formula-parser/parse.js';
import type { FormulaTree } from '../formula-parser/tree.js';
import { massError, type MassError } from './mass-error.js';
import type { IonNotation } from './ion-notation.js';
import { readIonNotation } from './read-ion-notation.js';
import { usualCharge } from './usual-charges.js';
import { hrmsLine } from './hrms-line.js';
import { aggregatedDistribution, estimatedBins, MAX_BINS } from '../isotope-pattern/aggregated.js';
import { atomIsotopes } from '../isotope-pattern/isotope-table.js';

/** Options for {@link ionMass}. */
export interface IonOptions extends ParseOptions {
  /** The found m/z as written ('242.1172'): adds the error in ppm and mDa and the report line. */
  found?: string;
  /** Ionisation named in the report line (default 'ESI'). */
  ionisation?: string;
  /** Decimals of the calculated m/z in the report line (default 4). */
  decimals?: number;
}

/** An ion and its m/z, with exact Decimal values and the atom map, for callers inside the library. */
export interface IonDetail {
  /** The formula as given (or the ion notation, when it holds the formula). */
  readonly input: string;
  /** Hill formula of M as given (with its charge, when written charged). */
  readonly formula: string;
  /** The ion notation as pondus writes it ('[M+H]+'), or null for a charged formula given alone. */
  readonly notation: string | null;
  /** The notation as journals print it ('[M + H]+'); for a charged formula alone, 'M+' or 'M-•' style. */
  readonly journalNotation: string;
  /** Hill formula of the ion with its charge ('C15H16NO2^+'). */
  readonly ionFormula: string;
  /** Hill formula of the ion without the charge, as written in report lines ('C15H16NO2'). */
  readonly ionFormulaPlain: string;
  readonly charge: number;
  /** The ion's atoms. */
  readonly atoms: AtomCounts;
  /** m/z in Th (u per elementary charge), exact. */
  readonly mz: Decimal;
  /** The ion's monoisotopic mass in u (m/z × |charge|), electrons accounted for. */
  readonly ionMass: Decimal;
  /** Monoisotopic mass of one neutral molecule M. */
  readonly neutralMass: Decimal;
  /** True when the ion has an odd number of electrons (a radical ion). */
  readonly oddElectron: boolean;
  /** The found m/z and its error, when given. */
  readonly found: MassError | null;
  /** The calculated m/z to the report's decimals. */
  readonly calculatedText: string;
  /** The HRMS line for an experimental section, when a found m/z is given. */
  readonly reportLine: string | null;
  readonly ionisation: string;
  readonly notes: Note[];
}

const IONISATION = /^[A-Za-z0-9][A-Za-z0-9 /+()-]{0,29}$/;

/**
 * Computes an ion's m/z from a formula and an ion notation, or from a charged formula alone
 * (read as the species as written, with a note), with exact Decimal values and the atom map.
 * Throws a PondusError for bad input or a formula whose written charge conflicts with the
 * notation. The public form is {@link ionMass}.
 *
 * @example
 * ionMassDetail('C15H15NO2', '[M+H]+').mz.toFixed(4)                               // '242.1176'
 * ionMassDetail('C15H15NO2', '[M+H]+', { found: '242.1172' }).found.ppm.toFixed(1)  // '-1.5'
 */
export function ionMassDetail(formula: string | null, ion: string | IonNotation | null, options: IonOptions = {}): IonDetail {
  const notation = typeof ion === 'string' ? readIonNotation(ion) : ion;
  const decimals = options.decimals ?? 4;
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > 8) throw fail({ code: 'BAD_OPTION', message: `decimals must be a whole number from 0 to 8, not ${decimals}` });
  const ionisation = options.ionisation ?? 'ESI';
  if (!IONISATION.test(ionisation)) throw fail({ code: 'BAD_OPTION', message: `the ionisation is named in letters, digits, spaces and / + ( ) - (at most 30), as in ESI, APCI, EI, MALDI-TOF: not '${ionisation}'` });
  const notes: Note[] = [];

  let tree: FormulaTree;
  let input: string;
  if (notation && notation.formula !== null) {
    if (formula !== null && formula.trim() !== '') {
      throw fail({ code: 'ION_CONFLICT', message: `the ion '${notation.input}' names its own formula (${notation.formula}) and a formula '${formula}' is given too: give one of them`, column: notation.formulaColumn ?? undefined }, notation.input);
    }
    tree = parseFormula(notation.formula, options);
    input = notation.input;
  } else {
    if (formula === null || formula.trim() === '') throw fail({ code: 'BAD_ION', message: notation ? `the ion '${notation.input}' uses M: give the formula of M too` : 'give a formula and an ion such as [M+H]+' });
    tree = parseFormula(formula, options);
    input = formula;
  }
  // how the formula was read (an abbreviation, a '.' between components): the ion's notes start with it
  notes.push(...tree.notes);
  const atoms = flattenFormula(tree);
  for (const [key, n] of atoms) {
    if (!isWhole(n)) throw fail({ code: 'BAD_COUNT', message: `an ion has whole numbers of atoms; '${tree.input}' has ${n.toString()} ${key}` }, tree.input);
  }
  const formulaHill = hillFormula(atoms, tree.charge);
  if (tree.components.length > 1) {
    notes.push({ code: 'WHOLE_FORMULA', message: `M is the whole formula ${formulaHill} (all ${tree.components.length} components); for one component alone, give its formula` });
  }
  const neutralMass = monoisotopic(atoms);

  let charge: number;
  let ionAtoms: AtomCounts;
  let journal: string;
  if (notation === null) {
    if (tree.charge === 0) {
      throw fail({ code: 'BAD_ION', message: `'${tree.input}' is neutral: give the ion, such as [M+H]+, [M+Na]+ or [M-H]-, or write a charged formula` }, tree.input);
    }
    charge = tree.charge;
    ionAtoms = atoms;
    journal = '';
  } else {
    if (tree.charge !== 0) {
      throw fail({
        code: 'ION_CONFLICT',
        message: `'${tree.input}' carries a charge (${chargeWords(tree.charge)}) and the ion ${notation.canonical} gives one too: give the neutral formula with the ion, or the charged formula alone (read as the species as written)`,
      }, tree.input);
    }
    charge = notation.charge;
    ionAtoms = combine(atoms, notation);
    journal = notation.journal;
  }

  const electrons = electronCount(ionAtoms) - charge;
  const oddElectron = electrons % 2 !== 0;
  const ionFormula = hillFormula(ionAtoms, charge);
  const ionFormulaPlain = hillFormula(ionAtoms, 0);

  if (notation === null) {
    const mag = Math.abs(charge);
    journal = `M${mag === 1 ? '' : mag}${charge > 0 ? '+' : '-'}${oddElectron ? '•' : ''}`;
    const kind = oddElectron ? `an odd-electron ion (radical ${charge > 0 ? 'cation' : 'anion'}, M${charge > 0 ? '+' : '-'}•)` : `an even-electron ${charge > 0 ? 'cation' : 'anion'}`;
    const hint = charge < 0 ? 'for the deprotonated molecule give the neutral formula with [M-H]-' : 'for the protonated molecule give the neutral formula with [M+H]+';
    notes.push({ code: 'CHARGED_FORMULA', message: `'${tree.input}' is read as the species as written: ${ionFormula}, ${mag} electron${mag === 1 ? '' : 's'} ${charge > 0 ? 'fewer' : 'more'} than the neutral atoms, ${kind}; ${hint}` });
  } else {
    const usual = usualCharge(notation.terms);
    if (notation.terms.length === 0 && !notation.radical) {
      notes.push({ code: 'CHARGE_AS_WRITTEN', message: `${notation.canonical} is read as ${notation.multiplier === 1 ? 'M' : `${notation.multiplier}M`} with ${Math.abs(charge)} electron${Math.abs(charge) === 1 ? '' : 's'} ${charge > 0 ? 'removed' : 'added'} (the m/z of ${notation.multiplier === 1 ? '' : notation.multiplier}M${chargeText(charge).slice(1)}•); this ion has an ${oddElectron ? 'odd' : 'even'} number of electrons` });
    } else if (usual !== null && !notation.radical && usual !== charge) {
      notes.push({ code: 'UNUSUAL_CHARGE', message: `the terms of ${notation.canonical} usually give a charge of ${chargeWords(usual)}, not ${chargeWords(charge)}; the m/z is computed for the charge written` });
    }
    if (notation.radical && !oddElectron) {
      notes.push({ code: 'ELECTRON_PARITY', message: `${notation.canonical} is written as a radical ion, but ${ionFormula} has an even number of electrons (M itself has an odd number)` });
    } else if (!notation.radical && oddElectron && notation.terms.length > 0) {
      notes.push({ code: 'ELECTRON_PARITY', message: `${ionFormula} has an odd number of electrons: a radical ion (M itself has an odd number)` });
    }
  }

  const ionMassValue = monoisotopic(ionAtoms).minus(new Decimal(ELECTRON_MASS).times(charge));
  const mz = ionMassValue.div(Math.abs(charge));
  const calculatedText = mz.toFixed(decimals);
  const top = mostAbundantPeak(ionAtoms as Map<string, number>, charge);
  if (top && top.shift !== 0) {
    notes.push({ code: 'MOST_ABUNDANT_PEAK', message: `the m/z given is the monoisotopic ion's; the most intense peak of the isotope cluster is M${top.shift > 0 ? '+' : '-'}${Math.abs(top.shift)} at m/z ${top.mz.toFixed(decimals)} (see the pattern command)` });
  }
  let found: MassError | null = null;
  let reportLine: string | null = null;
  if (options.found !== undefined) {
    found = massError(options.found, mz, decimals);
    notes.push(...found.notes);
    reportLine = hrmsLine({ ionisation, journalNotation: journal, ionFormulaPlain, calculatedText, foundText: found.text });
  }
  return {
    input,
    formula: formulaHill,
    notation: notation?.canonical ?? null,
    journalNotation: journal,
    ionFormula,
    ionFormulaPlain,
    charge,
    atoms: ionAtoms,
    mz,
    ionMass: ionMassValue,
    neutralMass,
    oddElectron,
    found,
    calculatedText,
    reportLine,
    ionisation,
    notes,
  };
}

/** A found m/z compared with the calculated one, as plain data: numbers, with the exact decimals beside them. */
export interface IonError {
  /** The found value as written. */
  text: string;
  value: number;
  /** Decimals written in the found value. */
  decimals: number;
  /** found − calculated, in u (Th for m/z). */
  difference: number;
  differenceExact: string;
  /** (found − calculated)/calculated × 10⁶, unrounded. */
  ppm: number;
  ppmExact: string;
  /** (found − calculated) × 1000, unrounded. */
  mDa: number;
  mDaExact: string;
}

/** An ion and its m/z: plain data (numbers as numbers, the exact decimals as text beside them). */
export interface IonResult {
  /** The formula as given (or the ion notation, when it holds the formula). */
  input: string;
  /** Hill formula of M as given (with its charge, when written charged). */
  formula: string;
  /** The ion notation as pondus writes it ('[M+H]+'), or null for a charged formula given alone. */
  notation: string | null;
  /** The notation as journals print it ('[M + H]+'); for a charged formula alone, 'M+' or 'M-•' style. */
  journalNotation: string;
  /** Hill formula of the ion with its charge ('C15H16NO2^+'). */
  ionFormula: string;
  /** Hill formula of the ion without the charge, as written in report lines ('C15H16NO2'). */
  ionFormulaPlain: string;
  charge: number;
  /** The ion's atoms, by atom key ('C', '13C', 'D'). */
  atoms: Record<string, number>;
  /** m/z in Th (u per elementary charge), the nearest number, and exact as text. */
  mz: number;
  mzExact: string;
  /** The ion's monoisotopic mass in u (m/z × |charge|), electrons accounted for. */
  ionMass: number;
  ionMassExact: string;
  /** Monoisotopic mass of one neutral molecule M. */
  neutralMass: number;
  neutralMassExact: string;
  /** True when the ion has an odd number of electrons (a radical ion). */
  oddElectron: boolean;
  /** The found m/z and its error, when given. */
  found: IonError | null;
  /** The calculated m/z to the report's decimals. */
  calculatedText: string;
  /** The HRMS line for an experimental section, when a found m/z is given. */
  reportLine: string | null;
  ionisation: string;
  notes: Note[];
}

/**
 * Computes an ion's m/z from a formula and an ion notation, or from a charged formula alone
 * (read as the species as written, with a note), as plain data. Throws a PondusError for bad
 * input or a formula whose written charge conflicts with the notation.
 *
 * @param formula - the formula of M, or null when the ion names its own formula; a charged formula alone is read as the species as written.
 * @param ion - the ion notation (as text or read by {@link readIonNotation}), or null for a charged formula alone.
 * @param options - the found m/z for the mass error, the ionisation for the HRMS line, the decimals reported (0–8), and the formula options.
 * @returns the ion's formula, charge, m/z, ion and neutral masses, whether it is an odd-electron ion, the found m/z with its error when given, the HRMS report line and the notes.
 * @throws PondusError: a formula that cannot be read (the formula language's codes: UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, UNCLOSED_GROUP, AMBIGUOUS_READING, …); the codes of {@link readIonNotation} (BAD_ION, INPUT_TOO_LONG, CONTROL_CHARACTER); BAD_OPTION for decimals out of range or an ionisation name that is not plain; ION_CONFLICT for a formula given both in the ion and beside it, or a written charge that conflicts with the notation; BAD_ION for M without its formula, a neutral formula without an ion, an ion that takes away atoms M does not have, or one that leaves no atoms; BAD_COUNT for a count that is not whole; BAD_NUMBER for a found m/z that is not a positive plain decimal; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * ionMass('C15H15NO2', '[M+H]+').mz.toFixed(4)                               // '242.1176'
 * ionMass('C15H15NO2', '[M+H]+', { found: '242.1172' }).found.ppm.toFixed(1)  // '-1.5'
 * ionMass(null, '[C6H12O6+Na]+').ionFormula                                    // 'C6H12NaO6^+'
 */
export function ionMass(formula: string | null, ion: string | IonNotation | null, options: IonOptions = {}): IonResult {
  return plainIon(ionMassDetail(formula, ion, options));
}

/**
 * The plain form of an {@link IonDetail}.
 *
 * @example
 * plainIon(ionMassDetail('H2O', '[M+H]+')).atoms // { H: 3, O: 1 }
 */
export function plainIon(d: IonDetail): IonResult {
  const f = d.found;
  return {
    input: d.input,
    formula: d.formula,
    notation: d.notation,
    journalNotation: d.journalNotation,
    ionFormula: d.ionFormula,
    ionFormulaPlain: d.ionFormulaPlain,
    charge: d.charge,
    atoms: Object.fromEntries([...d.atoms].map(([k, n]) => [k, Number(n)])),
    mz: d.mz.toNumber(),
    mzExact: d.mz.toFixed(),
    ionMass: d.ionMass.toNumber(),
    ionMassExact: d.ionMass.toFixed(),
    neutralMass: d.neutralMass.toNumber(),
    neutralMassExact: d.neutralMass.toFixed(),
    oddElectron: d.oddElectron,
    found: f
      ? { text: f.text, value: f.value.toNumber(), decimals: f.decimals, difference: f.difference.toNumber(), differenceExact: f.difference.toFixed(), ppm: f.ppm.toNumber(), ppmExact: f.ppm.toFixed(), mDa: f.mDa.toNumber(), mDaExact: f.mDa.toFixed() }
      : null,
    calculatedText: d.calculatedText,
    reportLine: d.reportLine,
    ionisation: d.ionisation,
    notes: d.notes,
  };
}

/** n·M plus and minus the terms; a term taking away more atoms than there are is refused. */
function combine(atoms: AtomCounts, notation: IonNotation): AtomCounts {
  const out: AtomCounts = new Map();
  for (const [k, n] of atoms) out.set(k, (n as number) * notation.multiplier);
  for (const t of notation.terms) {
    for (const [k, n] of t.atoms) {
      const next = ((out.get(k) as number | undefined) ?? 0) + t.sign * t.count * (n as number);
      if (next < 0) {
        const have = (out.get(k) as number | undefined) ?? 0;
        const m = notation.multiplier === 1 ? 'M' : `${notation.multiplier}M`;
        throw fail({ code: 'BAD_ION', message: `${notation.canonical} takes away ${t.count * (n as number)} ${k} with '${t.text}', but ${m} has ${have === 0 ? 'none' : `only ${have}`}`, column: t.column, length: Array.from(t.text).length }, notation.input);
      }
      if (next === 0) out.delete(k);
      else out.set(k, next);
    }
  }
  if (out.size === 0) throw fail({ code: 'BAD_ION', message: `${notation.canonical} leaves no atoms` }, notation.input);
  return out;
}

/**
 * Monoisotopic mass of neutral atoms (principal isotopes, AME2020), exact.
 *
 * @example
 * monoisotopic(new Map([['H', 2], ['O', 1]])).toString() // '18.010564683056'
 */
export function monoisotopic(atoms: AtomCounts): Decimal {
  let m = new Decimal(0);
  for (const [key, n] of atoms) {
    const k = /^([0-9]*)([A-Za-z]+)$/.exec(key)!;
    const d = getAtomData(k[2], k[1] ? Number(k[1]) : null)!;
    m = m.plus(new Decimal(d.monoisotopic.text).times(n as number));
  }
  return m;
}

/** The largest peak of the aggregated pattern, as a nominal shift from the monoisotopic ion and its centroid m/z. */
function mostAbundantPeak(atoms: Map<string, number>, charge: number): { shift: number; mz: number } | null {
  if (estimatedBins(atoms) > MAX_BINS) return null;
  const d = aggregatedDistribution(atoms);
  let best = 0;
  for (let i = 1; i < d.p.length; i++) if (d.p[i] > d.p[best]) best = i;
  let nominal = 0;
  for (const [key, n] of atoms) {
    const iso = atomIsotopes(key);
    nominal += n * iso.massNumbers[iso.principal];
  }
  const z = Math.abs(charge);
  return { shift: (d.offset + best - nominal) / z, mz: (d.pm[best] / d.p[best] - Number(ELECTRON_MASS) * charge) / z };
}

/** Electrons of the neutral atoms: the sum of atomic numbers. */
function electronCount(atoms: AtomCounts): number {
  let e = 0;
  for (const [key, n] of atoms) {
    const k = /^([0-9]*)([A-Za-z]+)$/.exec(key)!;
    e += getAtomData(k[2], k[1] ? Number(k[1]) : null)!.element.z * (n as number);
  }
  return e;
}

/** A charge in words for messages: '1+', '2-', '0'. */
function chargeWords(z: number): string {
  return z === 0 ? '0' : `${Math.abs(z)}${z > 0 ? '+' : '-'}`;
}
