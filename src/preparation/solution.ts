/**
 * Making up a solution from a solid: the mass to weigh for a target molar or
 * mass concentration and volume, allowing for the reagent's assay (purity) and
 * its hydrate form, or for a concentration stated for one part of it (Cu from
 * CuSO4·5H2O, Cl⁻ from CaCl2·2H2O).
 */
import { formulaNotes } from '../mass/formula-notes.js';
import type { Note } from '../errors/issue.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import { MASS, MASS_CONCENTRATION, MOLARITY, PURE, VOLUME, measureAs } from '../calc/measure.js';
import { Decimal } from '../exact/decimal.js';
import { displayInstruction, fewFiguresNote, inputFigures, instruction, massUnitFor, type InputFigures, type Instruction } from '../sigfig/instruction.js';
import { readPurity } from './purity.js';
import { CONCENTRATED_GRADES } from './concentrated-grades.js';
import { reagentHandlingNote, smallMassWarning } from './warnings.js';
import { partShare } from '../composition/part-share.js';
import { toDecimal } from '../formula/amount.js';
import { isMetal } from '../formula/written-order.js';
import { solubilityWarning } from './solubility.js';
import { partsPerAsMassPerVolume } from './parts-per.js';
import { formulaMassDetail, type MassOptions, type MassDetail } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { exact, type Measured } from '../sigfig/measured.js';
import { divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import { sameDims, unitOf } from '../sigfig/units.js';

export interface SolutionOptions extends MassOptions {
  /** Target concentration: '0.100 M', '5.00 g/L', '1000 ppm' (read as mg/L), '2.0 %' (read as g/100 mL). Optional when `weighed` is given. */
  concentration?: string;
  /** Final volume: '250.0 mL'. */
  volume: string;
  /** Assay of the reagent: '98.5 %'. */
  purity?: string;
  /**
   * What the assay is of: 'reagent' (the reagent itself, as weighed) or 'part'
   * (the content of the `as` species per mass of reagent, a potency "as base").
   * Needed when the assay is no more than the part's share of the formula, where
   * both readings are possible.
   */
  purityBasis?: PurityBasis;
  /** The species the concentration refers to, when not the reagent itself: 'Cu', 'Cl', 'CuSO4'. */
  as?: string;
  /** The mass actually weighed: '1.4587 g'. Gives the concentration actually made (a result). */
  weighed?: string;
}

export type PurityBasis = 'reagent' | 'part';

export interface SolutionResult {
  reagent: MassDetail;
  /** What the concentration counts, and how many of it one formula unit of reagent holds. */
  /** The species the concentration is of: its Hill formula, as written (normalised), units per formula unit of reagent, molar mass. */
  target: { formula: string; written: string; perReagent: string; molarMass: Quantity };
  /** The target concentration (null when only the mass weighed was given). */
  concentration: Quantity | null;
  volume: Quantity;
  purity: Quantity | null;
  /** What the assay was read as being of (null without an assay). */
  purityBasis: PurityBasis | null;
  /** Amount of the target species the solution holds, mol (an instruction). */
  targetMoles: Instruction | null;
  /** Amount of reagent, mol (an instruction; null when the assay is a potency of the part). */
  moles: Instruction | null;
  /** Mass of pure reagent, g (or of the part, for a potency): an instruction. */
  pureMass: Instruction | null;
  /** Mass to weigh out, g (allowing for purity): an instruction. */
  mass: Instruction | null;
  /** The mass actually weighed. */
  weighed: Quantity | null;
  /** The concentration actually made from the mass weighed (a result), in the target's kind. */
  made: Quantity | null;
  /** The unit the target was written in (mg/L for ppm, g/L for %). */
  unit: string;
  notes: Note[];
}

const G_PER_MOL = unitOf('g/mol');

/** Assays of pharmacopoeial materials run up to 102.0 % (common practice): a potency can exceed the share by that much. */
const POTENCY_SLACK = new Decimal('1.02');

function readConcentration(text: string, notes: Note[]): { conc: Quantity; unit: string } {
  let conc = measureAs(text, [MOLARITY, MASS_CONCENTRATION, PURE], 'the concentration', notes);
  let unit = conc.unit?.symbol ?? (sameDims(conc.dims, MOLARITY) ? 'M' : 'g/L');
  if (sameDims(conc.dims, PURE)) {
    const t = text.trim();
    let parts: { conc: Quantity; unit: string } | null;
    const ratio = /^[0-9]+(?:\.[0-9]*)?\s*:\s*[0-9]+(?:\.[0-9]*)?$/.test(t);
    if (ratio) {
      conc = multiply(conc, quantity(exact(1000), unitOf('g/L')));
      notes.push({ code: 'RATIO_AS_W_V', message: `the ratio strength ${t} is read as w/v: 1 g of solute in ${t.split(':')[1].trim()} mL of solution (the pharmacopoeial reading for a solid in a liquid)` });
      unit = 'mg/mL';
    } else if (/%\s*(w\/w|v\/v)$/i.test(t) || /(mg\/kg|mg\/g|µg\/g|µg\/mg|ug\/g)$/.test(t)) {
      throw fail({ code: 'INCOMPATIBLE_UNITS', message: `'${t}' is a fraction by ${/v\/v$/i.test(t) ? 'volume' : 'mass'}: a solution made up to a volume needs a concentration per volume (% w/v, g/L, mg/mL, mg/dL, M), or the density of the solution; for a solid or semisolid let down by mass, use \`diluteByMass\``, functions: ['diluteByMass'] }, text);
    } else if ((parts = partsPerAsMassPerVolume(conc, t, notes))) {
      conc = parts.conc;
      unit = parts.unit;
    } else if (/%$/.test(t)) {
      conc = multiply(conc, quantity(exact(1000), unitOf('g/L')));
      notes.push({ code: 'PERCENT_AS_W_V', message: '% is read as % w/v (grams per 100 mL)' });
      unit = 'g/L';
    } else {
      throw fail({ code: 'BAD_AMOUNT', message: `the concentration needs a unit (M, mM, g/L, mg/mL, ppm, %): '${text}'` });
    }
  }
  if (conc.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the concentration must be positive' });
  return { conc, unit };
}

/**
 * The target concentration; a name written after it ('1000 ppm Ni') gets the hint of `as`, which
 * says what the concentration is of: with that very name when the reagent holds it, in general
 * words otherwise (the hint never names a species the reagent does not hold).
 */
function readTarget(text: string, notes: Note[], reagent: MassDetail): { conc: Quantity; unit: string } {
  try {
    return readConcentration(text, notes);
  } catch (e) {
    if (e instanceof PondusError && e.issues.some((i) => i.code === 'UNKNOWN_UNIT' && i.hint?.includes('the name after it'))) {
      const held = new Set(reagent.contributions.map((c) => c.symbol));
      // the unknown word is the issue's own field; it is the whole name written after the amount when the span covers just it
      const more = (hint: string, name: unknown, length: number | undefined) =>
        typeof name === 'string' && name.length === length && held.has(name)
          ? `${hint}; for a concentration of ${name} itself, which the reagent holds, give \`as: ${name}\``
          : `${hint}; for a concentration of an element or ion the reagent holds, name it with \`as\``;
      throw new PondusError(
        e.issues.map((i) => (i.code === 'UNKNOWN_UNIT' && i.hint ? { ...i, hint: more(i.hint, 'unit' in i ? i.unit : undefined, i.length), options: [...(i.options ?? []), 'as'] } : i)),
        e.input,
      );
    }
    throw e;
  }
}

/**
 * Reagents that come as a concentrated solution (or a gas): a mass of the solute is not
 * something anyone can weigh out, so the instruction must be a volume of the concentrated reagent.
 */
function refuseConcentrated(reagent: MassDetail): void {
  // glacial acetic acid (99.7 %) is a liquid that can be weighed or measured: not refused
  if (reagent.formula === 'C2H4O2') return;
  const g = FIRST_GRADE.get(reagent.formula);
  if (g === undefined && !GAS_SOLUTIONS.has(reagent.formula)) return;
  throw fail({
    code: 'CONCENTRATED_REAGENT',
    message: `${reagent.input} comes as a concentrated solution${g ? ` (${g.percent} %, d ${g.density} g/mL)` : ''}: it is measured by volume, not weighed; give its mass fraction and density for the volume to take`,
    hint: `\`concentratedReagent\` ${reagent.input} \`fraction: '${g ? g.percent : '…'} %'\` \`density: '${g ? g.density : '…'} g/mL'\` \`concentration: …\` \`volume: …\` (from the label of the bottle)`,
    options: ['fraction', 'density', 'concentration', 'volume'],
    functions: ['concentratedReagent'],
  });
}

/** The first grade in the table of each concentrated reagent, by formula. */
const FIRST_GRADE = new Map<string, (typeof CONCENTRATED_GRADES)[number]>();
for (const g of CONCENTRATED_GRADES) if (!FIRST_GRADE.has(g.formula)) FIRST_GRADE.set(g.formula, g);

/** Gases sold only as aqueous solutions, besides the grades in the table. */
const GAS_SOLUTIONS = new Set(['BrH', 'HI', 'FH', 'H5NO']);

/** A reagent read: its detailed mass and its molar mass with the tabulated precision. */
interface ReagentMass {
  detail: MassDetail;
  molarMass: Measured;
  /** The molar mass as a quantity in g/mol. */
  molarMassQ: Quantity;
}

/**
 * The reagents read lately: a batch weighs the same reagents line after line, and reading one
 * depends only on its text and the reading options. Bounded: short texts only, emptied when full.
 */
const REAGENTS = new Map<string, ReagentMass>();
const MAX_REAGENTS_REMEMBERED = 2048;

function reagentMass(text: string, options: MassOptions): ReagentMass {
  const { abbreviations, maxLength, weights } = options;
  const plain = (abbreviations === undefined || typeof abbreviations === 'boolean' || abbreviations === 'none') && (maxLength === undefined || typeof maxLength === 'number') && (weights === undefined || typeof weights === 'string');
  const key = plain && text.length <= 200 ? `${String(abbreviations)}|${String(maxLength)}|${String(weights)}|${text}` : null;
  let read = key === null ? undefined : REAGENTS.get(key);
  if (read === undefined) {
    const detail = formulaMassDetail(text, options);
    const molarMass = reportedMolarMass(detail);
    read = { detail, molarMass, molarMassQ: quantity(molarMass, G_PER_MOL) };
    if (key !== null) {
      if (REAGENTS.size >= MAX_REAGENTS_REMEMBERED) REAGENTS.clear();
      REAGENTS.set(key, read);
    }
  }
  return read;
}

/** The units in which a concentration is usually of an element (a metal standard for AAS or ICP: 1000 ppm Pb). */
const TRACE_UNITS = /(ppm|ppb|mg\/L|µg\/L|ug\/L|µg\/mL|ug\/mL|ng\/mL)\s*$/;

/**
 * A concentration such as 1000 ppm of a metal salt is often meant of the metal (an element
 * standard) rather than of the salt: the reading taken is named, with the mass for each metal
 * the salt holds, so the other reading is one option away.
 */
function ofTheElementNote(reagentText: string, reagent: MassDetail, target: { conc: Quantity; unit: string }, options: SolutionOptions, mass: Instruction): Note | null {
  if (sameDims(target.conc.dims, MOLARITY) || !TRACE_UNITS.test(options.concentration!.trim())) return null;
  const symbols = [...new Set(reagent.contributions.map((c) => c.symbol))];
  if (symbols.length < 2) return null;
  const metals = symbols.filter(isMetal).slice(0, 3);
  if (metals.length === 0) return null;
  const written = options.concentration!.trim();
  // every mass in the note in the unit of the mass to weigh, so they compare at a glance
  const unit = massUnitFor(mass.quantity);
  const shown = displayInstruction(mass, unit).text;
  const each = metals.map((m) => {
    const r = prepareSolution(reagentText, { ...options, as: m, weighed: undefined });
    return `${written} of ${m}, give \`as: ${m}\` (weigh ${r.mass ? displayInstruction(r.mass, unit).text : '…'})`;
  });
  return {
    code: 'CONCENTRATION_OF_REAGENT',
    message: `${written} is read as the concentration of ${reagent.input.trim()} itself (weigh ${shown}); for a standard of ${each.join('; for ')}`,
    options: ['as'],
  };
}

/** 1 mol/L in base units, for a concentration in M. */
const ONE_MOLAR = quantity(exact(1), unitOf('M'));

const pct = (d: Decimal) => `${d.times(100).toSignificantDigits(4).toFixed()} %`;

/**
 * The mass of a reagent to weigh for a solution (an instruction, at working
 * precision), and from the mass actually weighed, the concentration made (a
 * result, with the figures of the measurements).
 *
 * @param reagentText - the formula of the reagent weighed, e.g. 'CuSO4·5H2O'.
 * @param options - the target concentration and the volume made up to, the purity (assay) and what it is of (purityBasis), the part the concentration is of (as), the mass actually weighed, and the mass options.
 * @returns the mass to weigh (an instruction at working precision) when a target is given, the concentration made from the mass weighed (a result) when one is given, the inputs' figures and the notes.
 * @throws PondusError: a formula that cannot be read (the formula language's codes: UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, UNCLOSED_GROUP, AMBIGUOUS_READING, …); CONCENTRATED_REAGENT for a reagent that comes as a concentrated solution or a gas; BAD_OPTION for neither a target nor a mass weighed, a purity basis without a purity, or an assay of the part without the part; PART_NOT_IN_FORMULA for a part the reagent does not contain; AMBIGUOUS_PURITY for an assay that could be of the reagent or of the part; INCOMPATIBLE_UNITS for a concentration by mass or volume fraction; BAD_AMOUNT for a concentration without a unit, a concentration, volume or mass weighed that is not positive, a purity not above 0 and at most 100 %, or a content of the part above what the pure reagent holds; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * displayInstruction(prepareSolution('CuSO4·5H2O', { concentration: '0.100 M', volume: '250.0 mL' }).mass, 'g').text // '6.242 g'
 */
export function prepareSolution(reagentText: string, options: SolutionOptions): SolutionResult {
  return solve(reagentText, options, new SolutionReadings(options));
}

/**
 * {@link prepareSolution} for a batch of reagents made up with the same options: what depends on
 * the options alone (the target, the volume, the assay and the mass weighed as read, their
 * figures, and for a target in M of the reagent itself, the amount in mol) is read once, on the
 * first reagent, and every reagent gets the same result, notes and errors as prepareSolution gives
 * it. The options are read as they are when the plan is made.
 *
 * @param options - as for {@link prepareSolution}.
 * @returns a function of the reagent's formula that gives what prepareSolution gives (and throws what it throws).
 * @example
 * const make = solutionPlan({ concentration: '0.100 M', volume: '250.0 mL' })
 * displayInstruction(make('NaCl').mass, 'g').text // '1.461 g'
 * displayInstruction(make('CuSO4·5H2O').mass, 'g').text // '6.242 g'
 */
export function solutionPlan(options: SolutionOptions): (reagentText: string) => SolutionResult {
  const fixed: SolutionOptions = { ...options };
  const readings = new SolutionReadings(fixed);
  return (reagentText) => solve(reagentText, fixed, readings);
}

/** A reading of an option and the notes reading it made (copied into each result that uses it). */
interface Read<T> {
  value: T;
  notes: Note[];
}

const withNotes = <T>(notes: Note[], r: Read<T>): T => {
  for (const n of r.notes) notes.push({ ...n });
  return r.value;
};

/**
 * What a solution's options say whatever the reagent: each reading is made on first use and kept
 * once made. A reading that fails is not kept: the next reagent reads it again and meets the same
 * error, after its own errors, in the order a single call gives them.
 */
class SolutionReadings {
  private targetRead?: Read<{ conc: Quantity; unit: string }>;
  private volumeRead?: Read<Quantity>;
  private purityRead?: Read<Quantity>;
  private weighedRead?: Read<Quantity>;
  private inputsRead?: InputFigures[];
  private molarRead?: { tm: Quantity; targetMoles: Instruction; n: Quantity; moles: Instruction; perLitre: Decimal };
  private fewOutcome?: string;

  constructor(private readonly options: SolutionOptions) {}

  /** The target concentration; a reading that fails is read again with the reagent, whose error names what it holds. */
  target(notes: Note[], reagent: MassDetail): { conc: Quantity; unit: string } {
    if (this.targetRead === undefined) {
      const own: Note[] = [];
      const value = readTarget(this.options.concentration!, own, reagent);
      this.targetRead = { value, notes: own };
    }
    return withNotes(notes, this.targetRead);
  }

  volume(notes: Note[]): Quantity {
    if (this.volumeRead === undefined) {
      const own: Note[] = [];
      const value = measureAs(this.options.volume, [VOLUME], 'the volume', own);
      if (value.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the volume must be positive' });
      this.volumeRead = { value, notes: own };
    }
    return withNotes(notes, this.volumeRead);
  }

  purity(notes: Note[]): Quantity {
    if (this.purityRead === undefined) {
      const own: Note[] = [];
      const value = readPurity(this.options.purity!, own);
      this.purityRead = { value, notes: own };
    }
    return withNotes(notes, this.purityRead);
  }

  weighed(notes: Note[]): Quantity {
    if (this.weighedRead === undefined) {
      const own: Note[] = [];
      const value = measureAs(this.options.weighed!, [MASS], 'the mass weighed', own);
      if (value.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the mass weighed must be positive' });
      this.weighedRead = { value, notes: own };
    }
    return withNotes(notes, this.weighedRead);
  }

  /** The inputs' figures (the same target, volume and assay for every reagent). */
  inputs(conc: Quantity | null, volume: Quantity, purity: Quantity | null): InputFigures[] {
    if (this.inputsRead === undefined) {
      const inputs: InputFigures[] = [];
      if (conc && this.options.concentration !== undefined) inputs.push(inputFigures('the target', this.options.concentration, conc));
      inputs.push(inputFigures('the volume', this.options.volume, volume));
      if (purity && this.options.purity !== undefined) inputs.push(inputFigures('the assay', this.options.purity, purity));
      this.inputsRead = inputs;
    }
    return this.inputsRead;
  }

  /** For a target in M of the reagent itself: the amount in mol (of the target and of reagent, the same) and per litre. */
  molar(conc: Quantity, volume: Quantity, inputs: InputFigures[], perReagent: Quantity): { tm: Quantity; targetMoles: Instruction; n: Quantity; moles: Instruction; perLitre: Decimal } {
    if (this.molarRead === undefined) {
      const tm = multiply(conc, volume);
      const n = divide(tm, perReagent);
      this.molarRead = { tm, targetMoles: instruction(tm, inputs), n, moles: instruction(n, inputs), perLitre: tm.value.div(perReagent.value).div(volume.value).div(ONE_MOLAR.value) };
    }
    return this.molarRead;
  }

  /** The outcome the note on a target with few figures names. */
  outcome(): string {
    return (this.fewOutcome ??= `the solution made is ${this.options.concentration!.trim()}`);
  }
}

/** One formula unit of the reagent per formula unit: the target is the reagent itself. */
const ONE_PER_REAGENT = quantity(exact(1), null);

function solve(reagentText: string, options: SolutionOptions, o: SolutionReadings): SolutionResult {
  const notes: Note[] = [];
  const read = reagentMass(reagentText, options);
  const reagent = read.detail;
  refuseConcentrated(reagent);
  const handling = reagentHandlingNote(reagent.formula);
  if (options.concentration === undefined && options.weighed === undefined) throw fail({ code: 'BAD_OPTION', message: 'give the target concentration, or the mass weighed (or both)' });
  const target = options.concentration !== undefined ? o.target(notes, reagent) : null;
  const conc = target?.conc ?? null;
  const volume = o.volume(notes);

  const reagentM = read.molarMassQ;
  let asMass: MassDetail | null = null;
  let targetM = reagentM;
  let perReagent = ONE_PER_REAGENT;
  let targetFormula = reagent.formula;
  let targetName = reagent.input;
  if (options.as !== undefined) {
    const share = partShare(reagent, options.as, options);
    const part = reagentMass(options.as, options);
    const t = part.detail;
    asMass = t;
    targetM = part.molarMassQ;
    perReagent = quantity(exact(toDecimal(share.count)), null);
    targetFormula = t.formula;
    targetName = options.as.trim();
    notes.push(...share.notes);
  }
  // mass fraction of the target species in the pure reagent (wanted only with an assay)
  const shareOf = () => perReagent.value.times(targetM.value).div(reagentM.value);

  let purity: Quantity | null = null;
  let basis: PurityBasis | null = null;
  if (options.purityBasis !== undefined && options.purity === undefined) throw fail({ code: 'BAD_OPTION', message: 'a purity basis needs the purity (assay) it describes' });
  if (options.purityBasis === 'part' && options.as === undefined) throw fail({ code: 'BAD_OPTION', message: "an assay of the part needs the part: give `as` (e.g. `as: C17H19NO3` for a potency 'as base')", options: ['as'] });
  if (options.purity !== undefined) {
    purity = o.purity(notes);
    basis = options.purityBasis ?? 'reagent';
    const share = shareOf();
    if (options.as !== undefined && options.purityBasis === undefined && purity.value.lte(share.times(POTENCY_SLACK))) {
      // both readings possible: refuse, with both
      const asReagent = prepareSolution(reagentText, { ...options, purityBasis: 'reagent', weighed: undefined });
      const asPart = prepareSolution(reagentText, { ...options, purityBasis: 'part', weighed: undefined });
      const m = (r: SolutionResult) => (r.mass ? ` (weigh ${displayInstruction(r.mass, massUnitFor(r.mass.quantity)).text})` : '');
      throw fail({
        code: 'AMBIGUOUS_PURITY',
        message: `the assay ${options.purity.trim()} could be of ${reagent.input} itself${m(asReagent)} or of the ${targetName} it holds, a potency 'as ${targetName}'${m(asPart)}; pure ${reagent.input} holds ${pct(share)} ${targetName}, so both readings are possible`,
        hint: "say which: `purityBasis: reagent` (the assay of the reagent as weighed) or `purityBasis: part` (the content of the `as` species, as on a label 'potency as base')",
        options: ['purityBasis', 'as'],
      });
    }
    if (basis === 'part' && purity.value.gt(share.times(POTENCY_SLACK))) {
      throw fail({ code: 'BAD_AMOUNT', message: `a content of ${options.purity.trim()} ${targetName} is more than pure ${reagent.input} holds (${pct(share)}): check the assay and its basis` });
    }
    if (basis === 'reagent' && options.as !== undefined && options.purityBasis === undefined) {
      notes.push({ code: 'PURITY_OF_REAGENT', message: `the assay ${options.purity.trim()} is read as the purity of ${reagent.input} itself: pure ${reagent.input} holds only ${pct(share)} ${targetName}, so it cannot be a content of ${targetName}` });
    }
    if (basis === 'part') notes.push({ code: 'PURITY_OF_PART', message: `the assay ${options.purity.trim()} is read as the content of ${targetName} per mass of ${reagent.input} as weighed (a potency 'as ${targetName}'); the formula's own ${targetName} share is not applied again` });
  }

  const inputs = o.inputs(conc, volume, purity);

  let targetMoles: Instruction | null = null;
  let moles: Instruction | null = null;
  let pureMass: Instruction | null = null;
  let mass: Instruction | null = null;
  if (conc) {
    // amount of the target species, then of reagent
    let tm: Quantity;
    let perLitre: (() => Decimal) | Decimal;
    if (options.as === undefined && sameDims(conc.dims, MOLARITY)) {
      // the reagent itself in M: the amount is the options' alone
      const m = o.molar(conc, volume, inputs, perReagent);
      tm = m.tm;
      targetMoles = m.targetMoles;
      moles = m.moles;
      perLitre = m.perLitre;
      const pm = multiply(m.n, reagentM);
      pureMass = instruction(pm, inputs);
      mass = instruction(purity ? divide(pm, purity) : pm, inputs);
    } else {
      const t = sameDims(conc.dims, MOLARITY) ? multiply(conc, volume) : divide(multiply(conc, volume), targetM);
      tm = t;
      targetMoles = instruction(tm, inputs);
      if (basis === 'part') {
        const partMass = multiply(tm, targetM);
        pureMass = instruction(partMass, inputs);
        mass = instruction(divide(partMass, purity!), inputs);
      } else {
        const n = divide(tm, perReagent);
        moles = instruction(n, inputs);
        const pm = multiply(n, reagentM);
        pureMass = instruction(pm, inputs);
        mass = instruction(purity ? divide(pm, purity) : pm, inputs);
      }
      perLitre = () => t.value.div(perReagent.value).div(volume.value).div(ONE_MOLAR.value);
    }
    const insoluble = solubilityWarning(reagent, perLitre, options);
    if (insoluble) notes.push(insoluble);
    const few = fewFiguresNote(mass, 'the mass to weigh', o.outcome());
    if (few) notes.push(few);
    const shown = displayInstruction(mass, massUnitFor(mass.quantity)).text;
    const small = smallMassWarning(mass.quantity, `the mass to weigh, ${shown},`);
    if (small) notes.push(small);
  }

  let weighed: Quantity | null = null;
  let made: Quantity | null = null;
  if (options.weighed !== undefined) {
    weighed = o.weighed(notes);
    let nTarget: Quantity;
    if (basis === 'part') nTarget = divide(multiply(weighed, purity!), targetM);
    else {
      const pure = purity ? multiply(weighed, purity) : weighed;
      nTarget = multiply(divide(pure, reagentM), perReagent);
    }
    const molar = !conc || sameDims(conc.dims, MOLARITY);
    made = molar ? divide(nTarget, volume) : divide(multiply(nTarget, targetM), volume);
    notes.push({ code: 'MADE_FROM_WEIGHED', message: `the concentration made is computed from the mass weighed, ${options.weighed.trim()}, and the volume, ${options.volume.trim()}: a result, with the figures of those measurements` });
  }
  const unit = target?.unit ?? 'M';
  if (target && options.as === undefined && mass) {
    const elementReading = ofTheElementNote(reagentText, reagent, target, options, mass);
    if (elementReading) notes.push(elementReading);
  }
  const readingNotes = formulaNotes(reagent, options.as !== undefined);
  if (asMass) readingNotes.push(...formulaNotes(asMass, true));
  if (readingNotes.length) notes.unshift(...readingNotes);
  if (handling) notes.push(handling);
  return { reagent, target: { formula: targetFormula, written: writtenName(targetName), perReagent: perReagent === ONE_PER_REAGENT ? '1' : toDecimal(perReagent.value).toFixed(), molarMass: targetM }, concentration: conc, volume, purity, purityBasis: basis, targetMoles, moles, pureMass, mass, weighed, made, unit, notes };
}

/** A name as the result writes it: trimmed, each run of spaces one space. */
const writtenName = (name: string) => (/^\S+$/.test(name) ? name : name.trim().replace(/\s+/g, ' '));
