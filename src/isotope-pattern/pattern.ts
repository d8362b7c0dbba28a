/**
 * Isotope patterns of molecules and ions: the aggregated pattern (one peak per nominal mass,
 * at its centroid) or the fine structure (isotopologues to a coverage), optionally merged at
 * a resolving power as an instrument would show it. Ions take their m/z with the electrons
 * accounted for; labelled atoms ([13C], D) count as their single nuclide.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { ELECTRON_MASS } from '../elements/constants.js';
import type { Decimal } from '../exact/decimal.js';
import { isWhole } from '../formula/amount.js';
import { flattenFormula } from '../formula/flatten.js';
import { hillFormula } from '../formula/hill.js';
import { parseFormula, type ParseOptions } from '../formula-parser/parse.js';
import { ionMassDetail, monoisotopic } from '../ions/ion-mass.js';
import { aggregatedDistribution } from './aggregated.js';
import { fineStructure } from './fine-structure.js';
import { atomIsotopes, isotopeAverage } from './isotope-table.js';
import { resolvePeaks, type Stick } from './resolve-peaks.js';

/** Options for {@link isotopePattern}. */
export interface PatternOptions extends ParseOptions {
  /** An ion notation ('[M+H]+'); without it, a neutral formula gives the molecule's pattern and a charged one the species as written. */
  ion?: string;
  /** 'aggregated' (default: one peak per nominal mass) or 'fine' (isotopologues). */
  kind?: 'aggregated' | 'fine';
  /** Resolving power R (FWHM = m/R) at which the fine structure is merged; omit for every isotopologue apart. Implies kind 'fine'. */
  resolvingPower?: number;
  /** Share of the probability the fine structure must hold (default 0.999). */
  coverage?: number;
  /** Peaks below this percentage of the largest are left out of the list (default 0.1). */
  minRelative?: number;
}

/** One peak of a pattern. */
export interface PatternPeak {
  /** m/z (for a neutral molecule, the mass in u). */
  mz: number;
  /** Fraction of all the molecules (or ions) this peak holds. */
  abundance: number;
  /** Percentage of the largest peak. */
  relative: number;
  /** Nominal mass above the monoisotopic one (M+1 is 1, M-2 is -2). */
  shift: number;
  /** The heavy isotopes of the most abundant isotopologue in the peak ('' for the monoisotopic one); fine structure only. */
  label: string | null;
  /** How many isotopologues the peak holds; fine structure only. */
  isotopologues: number | null;
}

/** An isotope pattern: plain data (numbers as numbers, the exact monoisotopic m/z as text beside it). */
export interface PatternResult {
  input: string;
  /** Hill formula of M as given. */
  formula: string;
  ion: string | null;
  /** Hill formula of the species the pattern is of, with its charge. */
  speciesFormula: string;
  charge: number;
  kind: 'aggregated' | 'fine';
  resolvingPower: number | null;
  /** Share of the probability the computed peaks hold (1 less what pruning left out). */
  coverage: number;
  /** The peaks listed (at least minRelative % of the largest), by m/z. */
  peaks: PatternPeak[];
  /** All computed peaks, by m/z (the list before minRelative). */
  allPeaks: PatternPeak[];
  /** m/z of the monoisotopic species (principal isotopes): the nearest number, and exact as text. */
  monoisotopicMz: number;
  monoisotopicMzExact: string;
  /** Abundance-weighted mean m/z of all computed peaks. */
  averageMz: number;
  /** Mean m/z from the isotope data directly (ICE 2013 fractions × AME2020 masses). */
  isotopeAverageMz: number;
  minRelative: number;
  notes: Note[];
}

/**
 * Computes the isotope pattern of a formula, or of an ion of it.
 *
 * @param formula - the formula of the molecule (or a charged formula, read as the species as written), or null when the ion names its own formula.
 * @param options - the ion notation ('[M+H]+'), the kind of pattern (aggregated by nominal mass, or fine), the resolving power (which makes it fine, peaks merged within m/R), the coverage of the probability, the smallest peak listed (percent of the largest), and the formula options.
 * @returns the species and its charge, the listed peaks and all peaks by m/z with their abundance and relative height, the monoisotopic and average m/z, and the notes.
 * @throws PondusError: BAD_OPTION for a coverage not above 0 and at most 1, a smallest peak outside 0–100, or a resolving power outside 1–10^8; a formula that cannot be read (the formula language's codes: UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, UNCLOSED_GROUP, AMBIGUOUS_READING, …); BAD_COUNT for a count that is not whole; the codes of {@link ionMass} for an ion (BAD_ION, ION_CONFLICT, …); PATTERN_TOO_LARGE for a pattern too wide or with too many isotopologues to compute; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * isotopePattern('Cl2').peaks.map((p) => Math.round(p.relative)) // [100, 64, 10]
 * isotopePattern('C15H15NO2', { ion: '[M+H]+', resolvingPower: 60000 }).peaks[0].mz // 242.11755…
 */
export function isotopePattern(formula: string | null, options: PatternOptions = {}): PatternResult {
  const coverage = options.coverage ?? 0.999;
  if (!(coverage > 0 && coverage <= 1)) throw fail({ code: 'BAD_OPTION', message: `the coverage is a share of the probability between 0 and 1 (0.999 for 99.9 %), not ${coverage}` });
  const minRelative = options.minRelative ?? 0.1;
  if (!(minRelative >= 0 && minRelative < 100)) throw fail({ code: 'BAD_OPTION', message: `the smallest peak listed is a percentage of the largest from 0 to 100, not ${minRelative}` });
  const R = options.resolvingPower;
  if (R !== undefined && !(R >= 1 && R <= 1e8)) throw fail({ code: 'BAD_OPTION', message: `the resolving power is a number from 1 to 10^8 (such as 60000), not ${R}` });
  const kind = R !== undefined ? 'fine' : (options.kind ?? 'aggregated');

  // the species: an ion, a charged formula as written, or the neutral molecule
  const notes: Note[] = [];
  let input: string;
  let mFormula: string;
  let ion: string | null = null;
  let speciesFormula: string;
  let charge = 0;
  let atoms: Map<string, number>;
  let mono: Decimal;
  const tree = options.ion === undefined && formula !== null ? parseFormula(formula, options) : null;
  if (tree && tree.charge === 0) {
    notes.push(...tree.notes); // how the formula was read (an abbreviation, a '.' between components)
    const counts = flattenFormula(tree);
    for (const [key, n] of counts) if (!isWhole(n)) throw fail({ code: 'BAD_COUNT', message: `an isotope pattern needs whole numbers of atoms; '${tree.input}' has ${n.toString()} ${key}` }, tree.input);
    atoms = counts as Map<string, number>;
    input = tree.input;
    mFormula = speciesFormula = hillFormula(counts);
    mono = monoisotopic(counts);
  } else {
    const r = ionMassDetail(formula, options.ion ?? null, options);
    input = r.input;
    mFormula = r.formula;
    ion = r.notation;
    speciesFormula = r.ionFormula;
    charge = r.charge;
    atoms = r.atoms as Map<string, number>;
    mono = r.mz;
    notes.push(...r.notes);
  }
  const z = Math.abs(charge) || 1;
  const electrons = Number(ELECTRON_MASS) * charge;
  const toMz = (mass: number) => (mass - electrons) / z;
  let monoNominal = 0;
  for (const [key, n] of atoms) {
    const iso = atomIsotopes(key);
    monoNominal += n * iso.massNumbers[iso.principal];
  }

  // notes on the isotope data used
  const labels: string[] = [];
  for (const key of atoms.keys()) {
    const iso = atomIsotopes(key);
    if (iso.source === 'label') labels.push(key);
    if (iso.source === 'longest-lived') notes.push({ code: 'NO_NATURAL_ISOTOPES', message: `${iso.symbol} has no natural isotopic composition; its longest-lived isotope, ${iso.massNumbers[0]}${iso.symbol}, stands in for it` });
    if (iso.source === 'natural' && iso.principal > 0) {
      notes.push({ code: 'LIGHTER_ISOTOPES', message: `${iso.symbol} has isotopes lighter than its most abundant one (${iso.massNumbers[iso.principal]}${iso.symbol}), so the pattern has peaks below the monoisotopic mass` });
    }
  }
  if (labels.length > 0) notes.push({ code: 'LABEL_PURE', message: `labelled atoms (${labels.map((k) => `[${k}]`).join(', ')}) are counted as that nuclide alone, as if fully enriched` });

  let all: PatternPeak[];
  let covered: number;
  if (kind === 'aggregated') {
    const d = aggregatedDistribution(atoms, input);
    let max = 0;
    covered = 0;
    for (let i = 0; i < d.p.length; i++) {
      covered += d.p[i];
      if (d.p[i] > max) max = d.p[i];
    }
    all = [];
    for (let i = 0; i < d.p.length; i++) {
      if (d.p[i] <= 0) continue;
      all.push({ mz: toMz(d.pm[i] / d.p[i]), abundance: d.p[i], relative: (d.p[i] / max) * 100, shift: d.offset + i - monoNominal, label: null, isotopologues: null });
    }
  } else {
    const fs = fineStructure(atoms, coverage, input);
    covered = fs.coverage;
    let sticks: Stick[] = fs.isotopologues.map((i) => ({ mz: toMz(i.mass), abundance: i.probability, label: i.label, members: 1 }));
    sticks = R !== undefined ? resolvePeaks(sticks, R) : sticks.sort((a, b) => a.mz - b.mz);
    const max = sticks.reduce((m, s) => Math.max(m, s.abundance), 0);
    const monoMz = mono.toNumber();
    all = sticks.map((s) => ({ mz: s.mz, abundance: s.abundance, relative: (s.abundance / max) * 100, shift: Math.round((s.mz - monoMz) * z), label: s.label, isotopologues: s.members }));
  }
  let sum = 0;
  let sumMz = 0;
  for (const p of all) {
    sum += p.abundance;
    sumMz += p.abundance * p.mz;
  }
  let average = 0;
  for (const [key, n] of atoms) average += n * isotopeAverage(atomIsotopes(key));
  const peaks = all.filter((p) => p.relative >= minRelative);
  notes.push({ code: 'PATTERN_AVERAGE', message: "the average m/z is the pattern's own mean, from the isotopic compositions of ICE 2013 (one representative sample of each element), not the molar mass from the standard atomic weights; the two differ in the second or third decimal (`formulaMass` gives the molar mass)", functions: ['formulaMass'] });
  const monoShown = peaks.some((p) => p.shift === 0);
  if (!monoShown) notes.push({ code: 'MONOISOTOPIC_NOT_SHOWN', message: `the monoisotopic peak (m/z ${mono.toFixed(4)}) is below ${minRelative} % of the largest peak and is not listed` });
  return {
    input,
    formula: mFormula,
    ion,
    speciesFormula,
    charge,
    kind,
    resolvingPower: R ?? null,
    coverage: covered,
    peaks,
    allPeaks: all,
    monoisotopicMz: mono.toNumber(),
    monoisotopicMzExact: mono.toFixed(),
    averageMz: sumMz / sum,
    isotopeAverageMz: toMz(average),
    minRelative,
    notes,
  };
}
