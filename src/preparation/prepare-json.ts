/**
 * The JSON rows of `prepare`: a solution to make up, a form to weigh in place of another, and a
 * concentrated reagent to measure by volume. Amounts as given are echoed as written (trimmed);
 * instructions keep working precision, results their figures (sigfig/instruction.ts).
 */
import { notesJson, type NoteJson } from '../errors/note-json.js';
import { jsonNumber, numberText } from '../exact/json-number.js';
import { jsonString, notesLine } from '../mass/mass-json.js';
import { displayResult, instructionJson, massUnitFor, resultJson, volumeUnitFor, type AmountJson, type Instruction } from '../sigfig/instruction.js';
import type { RoundingMode } from '../sigfig/round.js';
import { BENCH_CAUTION, CONCENTRATED_CAUTION } from './caution.js';
import type { ConcentratedOptions, ConcentratedResult } from './concentrated.js';
import type { PurityBasis, SolutionOptions, SolutionResult } from './solution.js';
import type { SubstituteResult } from './substitute.js';

/** The JSON row of a solution to make up. */
export interface SolutionJson {
  input: string;
  formula: string;
  molarMass: number;
  target: string;
  targetHill: string;
  concentration: string | null;
  volume: string | null;
  purity: string | null;
  purityBasis: PurityBasis | null;
  moles: AmountJson | null;
  mass: AmountJson | null;
  weighed: string | null;
  made: AmountJson | null;
  notes: NoteJson[];
  caution: string;
}

/**
 * The JSON row of a solution to make up (`pondus prepare --json`).
 *
 * @param r - a result of `prepareSolution`.
 * @param given - the options it was computed with: their concentration, volume and weighed mass are echoed as written.
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the reagent, the target, the amounts as given, the moles and mass to weigh (instructions), the concentration made (a result), the notes and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not a solution result, `given` not an options object or `rounding` not a rounding mode.
 * @example
 * const given = { concentration: '0.100 M', volume: '250.0 mL' }
 * solutionJson(prepareSolution('NaCl', given), given).mass.display // '1.461 g'
 */
export function solutionJson(r: SolutionResult, given: Partial<SolutionOptions>, rounding: RoundingMode = 'half-even'): SolutionJson {
  return {
    input: r.reagent.input,
    formula: r.reagent.formula,
    molarMass: r.reagent.molarMass.toNumber(),
    target: r.target.written,
    targetHill: r.target.formula,
    concentration: given.concentration?.trim() ?? null,
    volume: given.volume?.trim() ?? null,
    purity: r.purity ? displayResult(r.purity, '%', rounding).text : null,
    purityBasis: r.purityBasis,
    moles: r.moles ? instructionJson(r.moles, 'mol', rounding) : null,
    mass: r.mass ? instructionJson(r.mass, massUnitFor(r.mass.quantity), rounding) : null,
    weighed: given.weighed?.trim() ?? null,
    made: r.made ? resultJson(r.made, r.unit, rounding) : null,
    notes: notesJson(r.notes),
    caution: BENCH_CAUTION,
  };
}

/**
 * The same text as JSON.stringify(solutionJson(r, given, rounding)), written straight to one JSON
 * line: the batch hot path, without the row object. With `line`, the row starts with the input's
 * line number, as the CLI's JSON writer gives every row (JSON.stringify({ line, ...solutionJson(…) })).
 *
 * @param r - a result of `prepareSolution`.
 * @param given - the options it was computed with: their concentration, volume and weighed mass are echoed as written.
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @param line - the input's line number to put first in the row; left out by default.
 * @returns one line of JSON text, without a newline.
 * @example
 * const given = { concentration: '0.100 M', volume: '250.0 mL' }
 * solutionJsonLine(prepareSolution('NaCl', given), given, 'half-even', 3) // '{"line":3,"input":"NaCl","formula":"ClNa","molarMass":58.43976928,…'
 */
export function solutionJsonLine(r: SolutionResult, given: Partial<SolutionOptions>, rounding: RoundingMode = 'half-even', line?: number): string {
  const echo = echoesOf(given);
  const d = r.reagent;
  return `${line === undefined ? '{"input":' : `{"line":${line},"input":`}${jsonString(d.input)},"formula":${jsonString(d.formula)},"molarMass":${jsonNumber(d.molarMassNumber(), d.molarMassText())},"target":${jsonString(r.target.written)},"targetHill":${jsonString(r.target.formula)},"concentration":${echo.concentration},"volume":${echo.volume},"purity":${r.purity ? jsonString(displayResult(r.purity, '%', rounding).text) : 'null'},"purityBasis":${r.purityBasis === null ? 'null' : jsonString(r.purityBasis)},"moles":${r.moles ? instructionText(r.moles, 'mol', rounding) : 'null'},"mass":${r.mass ? instructionText(r.mass, massUnitFor(r.mass.quantity), rounding) : 'null'},"weighed":${echo.weighed},"made":${r.made ? JSON.stringify(resultJson(r.made, r.unit, rounding)) : 'null'},"notes":${notesLine(r.notes)},"caution":${CAUTION_TEXT}}`;
}

const CAUTION_TEXT = JSON.stringify(BENCH_CAUTION);

/** The amounts as given, as the row echoes them (a batch gives the same options to every row: kept by the options object). */
const ECHOES = new WeakMap<object, { of: Partial<SolutionOptions>; concentration: string; volume: string; weighed: string }>();
function echoesOf(given: Partial<SolutionOptions>): { concentration: string; volume: string; weighed: string } {
  const kept = ECHOES.get(given);
  if (kept !== undefined && kept.of.concentration === given.concentration && kept.of.volume === given.volume && kept.of.weighed === given.weighed) return kept;
  const text = (s: string | undefined) => (s === undefined ? 'null' : jsonString(s.trim()));
  const now = { of: { concentration: given.concentration, volume: given.volume, weighed: given.weighed }, concentration: text(given.concentration), volume: text(given.volume), weighed: text(given.weighed) };
  ECHOES.set(given, now);
  return now;
}

/** The JSON text of an instruction (JSON.stringify(instructionJson(…))); a batch's amount in mol is one instruction for every row, kept by it. */
function instructionText(ins: Instruction, unit: string, rounding: RoundingMode): string {
  const kept = AMOUNT_TEXTS.get(ins);
  if (kept !== undefined && kept.unit === unit && kept.rounding === rounding && kept.quantity === ins.quantity && kept.value === ins.quantity.value && kept.textbookSigFigs === ins.textbookSigFigs) return kept.text;
  const a = instructionJson(ins, unit, rounding);
  const text = `{"kind":"instruction","value":${numberText(a.value)},"unit":${jsonString(a.unit)},"display":${jsonString(a.display)},"sigFigs":${a.sigFigs === null ? 'null' : numberText(a.sigFigs)},"textbookSigFigs":${a.textbookSigFigs == null ? 'null' : numberText(a.textbookSigFigs)},"figure":${jsonString(a.figure)},"displayUnit":${jsonString(a.displayUnit)}}`;
  AMOUNT_TEXTS.set(ins, { unit, rounding, quantity: ins.quantity, value: ins.quantity.value, textbookSigFigs: ins.textbookSigFigs, text });
  return text;
}
const AMOUNT_TEXTS = new WeakMap<Instruction, { unit: string; rounding: RoundingMode; quantity: Instruction['quantity']; value: Instruction['quantity']['value']; textbookSigFigs: number | null; text: string }>();

/** The JSON row of a form weighed in place of another. */
export interface SubstituteJson {
  input: string;
  formula: string;
  instead: string;
  asked: string;
  purity: string | null;
  moles: AmountJson;
  mass: AmountJson;
  notes: NoteJson[];
  caution: string;
}

/**
 * The JSON row of a form weighed in place of another (`pondus prepare FORM --replace OTHER=AMOUNT --json`).
 *
 * @param r - a result of `substituteForm`.
 * @param asked - the amount the recipe asks for, as written ('10.00 g').
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the form in hand, the form replaced, the amount asked, the assay, the moles and mass to weigh (instructions), the notes and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not a substitution result, `asked` not a string or `rounding` not a rounding mode.
 * @example
 * substituteJson(substituteForm('CuSO4·5H2O', 'CuSO4', '10.00 g'), '10.00 g').mass.display // '15.64 g'
 */
export function substituteJson(r: SubstituteResult, asked: string, rounding: RoundingMode = 'half-even'): SubstituteJson {
  return {
    input: r.use.input,
    formula: r.use.formula,
    instead: r.instead.formula,
    asked,
    purity: r.purity ? displayResult(r.purity, '%', rounding).text : null,
    moles: instructionJson(r.moles, 'mol', rounding),
    mass: instructionJson(r.mass, massUnitFor(r.mass.quantity), rounding),
    notes: notesJson(r.notes),
    caution: BENCH_CAUTION,
  };
}

/** The JSON row of a concentrated reagent. */
export interface ConcentratedJson {
  input: string;
  formula: string;
  molarMass: number;
  form: 'concentrated';
  fraction: string;
  density: string;
  densitySource: 'given' | 'table';
  molarity: AmountJson & { textbookSigFigs: number };
  massConcentration: AmountJson;
  concentration: string | null;
  volume: string | null;
  take: AmountJson | null;
  factor: number | null;
  notes: NoteJson[];
  caution: string;
}

/**
 * The JSON row of a concentrated reagent (`pondus prepare REAGENT --fraction … --json`).
 *
 * @param r - a result of `concentratedReagent`.
 * @param given - the options it was computed with: the fraction, density, concentration and volume are echoed as written (the density from the table of grades when none was given).
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the reagent, its fraction and density, its molarity and mass concentration (nominal, at working precision), the amounts as given, the volume to take (an instruction), the dilution factor, the notes and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not a concentrated-reagent result, `given` not an options object or `rounding` not a rounding mode.
 * @example
 * const given = { fraction: '37 %', concentration: '1.00 M', volume: '500.0 mL' }
 * concentratedJson(concentratedReagent('HCl', given), given).take.display // '41.40 mL'
 */
export function concentratedJson(r: ConcentratedResult, given: Partial<ConcentratedOptions>, rounding: RoundingMode = 'half-even'): ConcentratedJson {
  return {
    input: r.reagent.input,
    formula: r.reagent.formula,
    molarMass: r.reagent.molarMass.toNumber(),
    form: 'concentrated',
    fraction: (given.fraction ?? '').trim(),
    density: given.density?.trim() ?? `${r.grade!.density} g/mL`,
    densitySource: r.densitySource,
    molarity: { ...resultJson(r.molarity, 'M', rounding), textbookSigFigs: r.textbookSigFigs },
    massConcentration: resultJson(r.massConcentration, 'g/L', rounding),
    concentration: given.concentration?.trim() ?? null,
    volume: given.volume?.trim() ?? null,
    take: r.take ? instructionJson(r.take, volumeUnitFor(r.take.quantity, r.volume!.unit), rounding) : null,
    factor: r.factor ? r.factor.toNumber() : null,
    notes: notesJson(r.notes),
    caution: CONCENTRATED_CAUTION,
  };
}
