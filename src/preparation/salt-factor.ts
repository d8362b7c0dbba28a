/**
 * Salt/parent conversion: the factor between a salt form of a compound and the
 * parent (free base or free acid), and the salt mass that carries a given mass
 * of parent.
 */
import { formulaNotes } from '../mass/formula-notes.js';
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { displayInstruction, fewFiguresNote, inputFigures, instruction, massUnitFor, type Instruction } from '../sigfig/instruction.js';
import { smallMassWarning } from './warnings.js';
import { MASS, measureAs } from '../calc/measure.js';
import { partShare } from '../composition/part-share.js';
import { Decimal } from '../exact/decimal.js';
import { toDecimal } from '../formula/amount.js';
import { speciesText } from './species.js';
import { formulaMassDetail, type MassOptions, type MassDetail } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { dividedBy, exact, times, type Measured } from '../sigfig/measured.js';
import { divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';

/** How the salt is made from the parent. */
export type SaltForm =
  /** parent·acid (a basic drug's hydrochloride), written so: C17H19NO3·HCl·3H2O */
  | 'addition'
  /** a metal salt of an acidic drug: the parent less its acidic H plus the metal (C14H13NaO3), with any water */
  | 'metal';

export interface MetalSaltReading {
  metal: string;
  /** Metal atoms per salt formula unit. */
  metalCount: number;
  /** Charge of the metal ion. */
  charge: number;
  /** Acidic hydrogens each parent gives up. */
  hydrogensReplaced: number;
  /** Water per salt formula unit (0 for the anhydrous salt). */
  water: string;
}

export interface SaltFactorResult {
  salt: MassDetail;
  parent: MassDetail;
  form: SaltForm;
  /** For a metal salt: how it was read. */
  metalSalt: MetalSaltReading | null;
  /** Parent units per salt formula unit. */
  perSalt: Decimal;
  /** M(salt) / (n · M(parent)): grams of salt per gram of parent. */
  factor: Decimal;
  reported: Measured;
  /** The dose of parent asked about. */
  dose: Quantity | null;
  /** Salt mass carrying the dose of parent, g (an instruction, at working precision). */
  saltMass: Instruction | null;
  /** The salt mass given. */
  saltGiven: Quantity | null;
  /** Parent mass carried by the salt mass given, g (a result). */
  parentMass: Quantity | null;
  notes: Note[];
}

export interface SaltOptions extends MassOptions {
  /** A mass of parent (a dose): the salt mass that carries it is an instruction. */
  parentMass?: string;
  /** A mass of salt: the parent mass it carries is a result. */
  saltMass?: string;
}

/**
 * The salt/parent factor, and conversions of masses either way: the salt mass
 * for a dose of parent (an instruction), the parent carried by a salt mass (a
 * result).
 *
 * @param saltText - the salt's formula: a basic drug's salt as parent·acid (C17H19NO3·HCl·3H2O), an acidic drug's metal salt as one formula (C14H13NaO3).
 * @param parentText - the parent's formula.
 * @param options - a mass of parent (a dose: the salt mass is an instruction) or of salt (the parent it carries is a result), and the mass options.
 * @returns the salt/parent factor, the form of the salt (addition or metal), the salt mass for a dose and the parent mass in a salt mass when asked, and the notes.
 * @throws PondusError: a formula that cannot be read (the formula language's codes: UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, UNCLOSED_GROUP, AMBIGUOUS_READING, …); BAD_OPTION for a salt that is neither parent·acid nor a metal salt of the parent; AMBIGUOUS_READING for a metal salt that can be read more than one way; BAD_AMOUNT for a dose or salt mass that is not positive; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * saltFactor('C17H19NO3·HCl·3H2O', 'C17H19NO3').factor.toFixed(4) // '1.3172'
 * saltFactor('C14H13NaO3', 'C14H14O3').form // 'metal' (naproxen sodium)
 */
export function saltFactor(saltText: string, parentText: string, options: SaltOptions = {}): SaltFactorResult {
  const notes: Note[] = [];
  const salt = formulaMassDetail(saltText, options);
  const parent = formulaMassDetail(parentText, options);
  let perSalt: Decimal;
  let form: SaltForm = 'addition';
  let metalSalt: MetalSaltReading | null = null;
  const share = writtenShare(salt, parentText, options);
  if (share) perSalt = share;
  else {
    const readings = metalSaltReadings(salt, parent);
    if (readings.length === 0) {
      throw fail({
        code: 'BAD_OPTION',
        message: `${saltText.trim()} is neither written as ${parentText.trim()}·acid nor a metal salt of it (${speciesText(parent)} less its acidic H, plus Na, K, Li, Ca or Mg, with any water): check the two formulas`,
        hint: 'write a basic drug\'s salt as parent·acid (C17H19NO3·HCl·3H2O), an acidic drug\'s as one formula (C14H13NaO3, (C33H34FN2O5)2Ca·3H2O)',
      });
    }
    if (readings.length > 1) {
      throw fail({ code: 'AMBIGUOUS_READING', message: `${saltText.trim()} could be read as a salt of ${speciesText(parent)} in more than one way: ${readings.map(describeReading).join('; or ')}` });
    }
    metalSalt = readings[0];
    form = 'metal';
    perSalt = new Decimal(metalSalt.metalCount * metalSalt.charge).div(metalSalt.hydrogensReplaced);
    notes.push({ code: 'METAL_SALT', message: `${saltText.trim()} is read as the ${describeReading(metalSalt)} of ${speciesText(parent)}: ${perSalt.toFixed()} × (${speciesText(parent)} − ${metalSalt.hydrogensReplaced === 1 ? '' : metalSalt.hydrogensReplaced}H) + ${metalSalt.metalCount === 1 ? '' : metalSalt.metalCount}${metalSalt.metal}${metalSalt.water !== '0' ? ` + ${metalSalt.water} H2O` : ''} per formula unit of salt` });
  }
  const factor = salt.molarMass.div(parent.molarMass.times(perSalt));
  const reported = dividedBy(reportedMolarMass(salt), times(reportedMolarMass(parent), exact(perSalt)));
  let dose: Quantity | null = null;
  let saltMass: Instruction | null = null;
  let saltGiven: Quantity | null = null;
  let parentMass: Quantity | null = null;
  if (options.parentMass !== undefined) {
    dose = measureAs(options.parentMass, [MASS], 'the dose', notes);
    if (dose.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the dose must be positive' });
    const m = multiply(dose, quantity(reported, null));
    m.unit = dose.unit;
    saltMass = instruction(m, [inputFigures('the dose', options.parentMass, dose)]);
    const few = fewFiguresNote(saltMass, 'the salt mass', `the dose given is ${options.parentMass.trim()} of parent`);
    if (few) notes.push(few);
    const small = smallMassWarning(m, `the salt mass, ${displayInstruction(saltMass, massUnitFor(m)).text},`, 'if it is to be weighed, weigh a larger amount and take an aliquot of a solution or trituration');
    if (small) notes.push(small);
  }
  if (options.saltMass !== undefined) {
    saltGiven = measureAs(options.saltMass, [MASS], 'the salt mass', notes);
    if (saltGiven.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the salt mass must be positive' });
    parentMass = divide(saltGiven, quantity(reported, null));
    parentMass.unit = saltGiven.unit;
  }
  notes.unshift(...formulaNotes(salt, true), ...formulaNotes(parent, true));
  return { salt, parent, form, metalSalt, perSalt, factor, reported, dose, saltMass, saltGiven, parentMass, notes };
}

/** Metals of the common salts of acidic drugs, with the charge of their ion. */
const SALT_METALS: readonly [string, number][] = [
  ['Na', 1],
  ['K', 1],
  ['Li', 1],
  ['Ca', 2],
  ['Mg', 2],
];

const METAL_NAMES: Record<string, string> = { Na: 'sodium', K: 'potassium', Li: 'lithium', Ca: 'calcium', Mg: 'magnesium' };

function describeReading(r: MetalSaltReading): string {
  const count = r.metalCount > 1 && r.charge === 1 ? (r.metalCount === 2 ? 'di' : r.metalCount === 3 ? 'tri' : `${r.metalCount}-`) : '';
  const water = r.water === '0' ? '' : ` ${r.water === '1' ? 'mono' : ''}hydrate (${r.water} H2O)`;
  return `${count}${METAL_NAMES[r.metal]} salt${water}`;
}

/** The parent count when the parent is written as a part of the salt (parent·acid), else null. */
function writtenShare(salt: MassDetail, parentText: string, options: MassOptions): Decimal | null {
  try {
    const share = partShare(salt, parentText, options);
    return share.countedFrom === 'written' ? toDecimal(share.count) : null;
  } catch {
    return null;
  }
}

/**
 * The readings of `salt` as a metal salt of `parent`: k parents each less h
 * acidic hydrogens, plus m metal ions of charge z (k·h = m·z), plus water.
 */
function metalSaltReadings(salt: MassDetail, parent: MassDetail): MetalSaltReading[] {
  const out: MetalSaltReading[] = [];
  const count = (m: MassDetail, el: string) => (m.atoms.has(el) ? toDecimal(m.atoms.get(el)!) : new Decimal(0));
  for (const [metal, z] of SALT_METALS) {
    const m = count(salt, metal);
    if (m.isZero() || !m.isInteger() || !count(parent, metal).isZero()) continue;
    const others = SALT_METALS.filter(([x]) => x !== metal && !count(salt, x).isZero() && count(parent, x).isZero());
    if (others.length) continue;
    for (let h = 1; h <= 3; h++) {
      const kDec = m.times(z).div(h);
      if (!kDec.isInteger() || count(parent, 'H').lt(h)) continue;
      // what is left after k·(parent − hH) and m metal atoms must be water alone
      const left = new Map<string, Decimal>();
      for (const [el, n] of salt.atoms) left.set(el, toDecimal(n));
      left.set(metal, left.get(metal)!.minus(m));
      let fits = true;
      for (const [el, n] of parent.atoms) {
        const need = toDecimal(n).minus(el === 'H' ? h : 0).times(kDec);
        const have = left.get(el) ?? new Decimal(0);
        if (have.lt(need)) fits = false;
        left.set(el, have.minus(need));
      }
      if (!fits) continue;
      const rest = [...left].filter(([, n]) => !n.isZero());
      const o = left.get('O') ?? new Decimal(0);
      const hLeft = left.get('H') ?? new Decimal(0);
      const onlyWater = rest.every(([el]) => el === 'H' || el === 'O') && hLeft.eq(o.times(2));
      if (!onlyWater) continue;
      out.push({ metal, metalCount: m.toNumber(), charge: z, hydrogensReplaced: h, water: o.toFixed() });
    }
  }
  return out;
}
