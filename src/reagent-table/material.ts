/**
 * The one amount engine of reagent tables and `react`: how a reagent is given
 * (a mass, an amount, a volume of a neat liquid with its density, a volume of a
 * solution with its molarity, a solution by mass fraction, equivalents or
 * mol %) and how it becomes moles, and back (moles → the mass to weigh and the
 * volume to take). Purity divides what must be weighed; a hydrate or salt form
 * sets the molar mass of what is weighed.
 */
import type { Note } from '../errors/issue.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import { AMOUNT, MASS, MOLARITY, PURE, VOLUME, measure, measureAs } from '../calc/measure.js';
import { readPurity } from '../preparation/purity.js';
import { exact } from '../sigfig/measured.js';
import { readNumber } from '../sigfig/read-number.js';
import { divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import { sameDims, unitOf } from '../sigfig/units.js';

/** How a reagent comes, as written: each field optional. */
export interface MaterialSpec {
  /** Assay or purity: '98 %', '99.5 %'. */
  purity?: string;
  /** Density of the neat liquid, or of the solution: '1.08 g/mL' (a bare number is read as g/mL, with a note). */
  density?: string;
  /** A solution: '1.6 M in hexanes' (molarity), '37 % w/w' (mass fraction). */
  solution?: string;
}

/** The material read: every value a measured quantity, in base units. */
export interface Material {
  purity: Quantity | null;
  density: Quantity | null;
  molarity: Quantity | null;
  massFraction: Quantity | null;
  /** The solvent of a solution, as written ('hexanes'), or null. */
  solvent: string | null;
}

/** An amount as written: a measured quantity, or equivalents of the reference. */
export type WrittenAmount = { kind: 'quantity'; quantity: Quantity } | { kind: 'equiv'; equiv: Quantity; written: 'equiv' | 'mol %'; /** The number as written: '1.20'. */ number: string };

const G_PER_ML = unitOf('g/mL');
const EQUIV = /^([0-9]*\.?[0-9]+(?:[eE][+-]?[0-9]+)?)\s*(?:equiv\.?|eq\.?|equivalents?)$/i;
const MOL_PERCENT = /^([0-9]*\.?[0-9]+(?:[eE][+-]?[0-9]+)?)\s*mol\s*%$/i;

/**
 * Reads an amount: '2.00 g', '5.0 mmol', '2.5 mL', '25.0 mL of 0.100 M', '1.5 equiv', '5 mol%'.
 * Equivalents and mol % are targets, taken as exact.
 *
 * @example
 * readAmount('1.5 equiv', 'Ac2O', []).kind // 'equiv'
 * readAmount('5 mol%', 'catalyst', []).kind // 'equiv'
 * readAmount('2.00 g', 'C7H6O3', []).kind // 'quantity'
 */
export function readAmount(text: string, what: string, notes: Note[]): WrittenAmount {
  const t = text.trim();
  if (t === '') throw fail({ code: 'BAD_AMOUNT', message: `no amount given for ${what}` }, text);
  const eq = EQUIV.exec(t);
  const mp = MOL_PERCENT.exec(t);
  if (eq || mp) {
    const n = readNumber((eq ?? mp)![1]);
    const value = mp ? n.value.div(100) : n.value;
    if (value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: `the equivalents of ${what} must be positive: '${t}'` }, text);
    if (value.gt(1e6)) throw fail({ code: 'BAD_AMOUNT', message: `${t} of ${what} is beyond any reagent table (more than a million equivalents)` }, text);
    return { kind: 'equiv', equiv: quantity(exact(value), null), written: mp ? 'mol %' : 'equiv', number: (eq ?? mp)![1] };
  }
  if (/(?:equiv\.?|eq\.?|equivalents?|mol\s*%)$/i.test(t)) {
    throw fail({ code: 'BAD_AMOUNT', message: `the equivalents of ${what} must be a positive number before equiv or mol % ('1.5 equiv', '5 mol %'); '${t}' is not` }, text);
  }
  const q = measureAs(t, [MASS, AMOUNT, VOLUME], `the amount of ${what}`, notes);
  if (q.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: `the amount of ${what} must be positive: '${t}'` }, text);
  return { kind: 'quantity', quantity: q };
}

/**
 * Reads how a reagent comes: purity, density, solution.
 *
 * @example
 * readMaterial({ solution: '1.6 M in hexanes' }, 'n-BuLi', []).solvent // 'hexanes'
 * readMaterial({ density: '1.08 g/mL' }, 'Ac2O', []).density?.value.toString() // '1080'
 */
export function readMaterial(spec: MaterialSpec, what: string, notes: Note[]): Material {
  const m: Material = { purity: null, density: null, molarity: null, massFraction: null, solvent: null };
  const where = (e: unknown, field: string): never => {
    if (e instanceof PondusError) throw new PondusError(e.issues.map((i) => ({ ...i, message: `${what}, ${field}: ${i.message}` })), e.input);
    throw e;
  };
  if (spec.purity !== undefined && spec.purity.trim() !== '') {
    try {
      const own: Note[] = [];
      m.purity = readPurity(spec.purity, own);
      for (const n of own) notes.push({ ...n, message: `${what}: ${n.message}` });
    } catch (e) {
      where(e, 'purity');
    }
  }
  if (spec.density !== undefined && spec.density.trim() !== '') {
    const t = spec.density.trim();
    try {
      let d = measure(t, `the density of ${what}`, notes);
      if (sameDims(d.dims, PURE) && !d.unit) {
        d = quantity(readNumber(t), G_PER_ML);
        notes.push({ code: 'DENSITY_UNIT', message: `${what}: the density ${t} has no unit: read as g/mL` });
      }
      if (!sameDims(d.dims, [1, 0, -1])) throw fail({ code: 'BAD_AMOUNT', message: `a density is a mass per volume (g/mL); '${t}' is not` }, t);
      if (d.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: `the density must be positive: '${t}'` }, t);
      if (d.value.gt(25000)) throw fail({ code: 'BAD_AMOUNT', message: `a density of ${t} is beyond any liquid (osmium, the densest element, is 22.6 g/mL)` }, t);
      m.density = d;
    } catch (e) {
      where(e, 'density');
    }
  }
  if (spec.solution !== undefined && spec.solution.trim() !== '') {
    const raw = spec.solution.trim();
    const at = raw.search(/\s+in\s+/i);
    const conc = at >= 0 ? raw.slice(0, at) : raw;
    if (at >= 0) m.solvent = raw.slice(at).replace(/^\s+in\s+/i, '').trim() || null;
    try {
      const q = measure(conc, `the solution of ${what}`, notes);
      if (sameDims(q.dims, MOLARITY)) {
        if (q.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: `the concentration must be positive: '${conc}'` }, conc);
        m.molarity = q;
      } else if (sameDims(q.dims, PURE) && q.unit) {
        if (q.value.lte(0) || q.value.gt(1)) throw fail({ code: 'BAD_AMOUNT', message: `a mass fraction is above 0 and at most 100 %: '${conc}'` }, conc);
        if (q.unit.symbol === '%') notes.push({ code: 'MASS_FRACTION', message: `${what}: the solution ${conc} is read as percent by mass (% w/w)` });
        else if (q.unit.symbol !== '% w/w') throw fail({ code: 'BAD_AMOUNT', message: `a solution by percent is given by mass (% w/w) here; '${conc}' is ${q.unit.name}` }, conc);
        m.massFraction = q;
      } else throw fail({ code: 'BAD_AMOUNT', message: `a solution is given by molarity ('1.6 M in hexanes') or by mass fraction ('37 % w/w'); '${conc}' is neither` }, conc);
    } catch (e) {
      where(e, 'solution');
    }
  }
  if (m.massFraction && m.purity) throw fail({ code: 'BAD_AMOUNT', message: `${what}: give a solution's strength once, as its mass fraction, not also as a purity` });
  if (m.molarity && m.purity) throw fail({ code: 'BAD_AMOUNT', message: `${what}: a solution by molarity already says how much reagent it holds; a purity would count it twice` });
  return m;
}

/** Moles of reagent from a measured quantity, with the mass and volume it stands for. */
export interface MaterialAmount {
  moles: Quantity;
  /** Mass of what is weighed (neat reagent as it comes, or the solution), when known. */
  mass: Quantity | null;
  /** Volume taken, when a liquid or solution and the data allow. */
  volume: Quantity | null;
}

/**
 * Moles of the reagent in a mass, an amount or a volume of the material as it comes.
 *
 * @example
 * const M = quantity(readNumber('102.09'), unitOf('g/mol'))
 * molesFromQuantity(measure('2.00 mL'), M, readMaterial({ density: '1.08 g/mL' }, 'Ac2O', []), 'Ac2O').moles.value.toFixed(5) // '0.02116'
 */
export function molesFromQuantity(q: Quantity, molarMass: Quantity | null, m: Material, what: string): MaterialAmount {
  const needM = () => {
    if (!molarMass) throw fail({ code: 'BAD_AMOUNT', message: `${what} has no molar mass here: give its amount in mol` });
    return molarMass;
  };
  const share = m.massFraction ?? m.purity;
  if (sameDims(q.dims, AMOUNT)) {
    return { moles: q, ...materialForMoles(q, molarMass, m) };
  }
  if (sameDims(q.dims, MASS)) {
    // a mass of a solution given by its molarity: its volume from the density, then n = c·V
    if (m.molarity) {
      if (!m.density) throw fail({ code: 'BAD_AMOUNT', message: `a mass of ${what} as a solution by molarity needs the solution's density ('density=1.016 g/mL'), or give the volume taken` });
      const volume = divide(q, m.density);
      return { moles: multiply(volume, m.molarity), mass: q, volume };
    }
    const pure = share ? multiply(q, share) : q;
    const moles = divide(pure, needM());
    return { moles, mass: q, volume: m.density ? divide(q, m.density) : m.molarity ? divide(moles, m.molarity) : null };
  }
  // a volume
  if (m.molarity) {
    const moles = multiply(q, m.molarity);
    return { moles, mass: m.density ? multiply(q, m.density) : null, volume: q };
  }
  if (m.density) {
    const mass = multiply(q, m.density);
    const pure = share ? multiply(mass, share) : mass;
    return { moles: divide(pure, needM()), mass, volume: q };
  }
  throw fail({ code: 'BAD_AMOUNT', message: `a volume of ${what} needs a density ('density=1.08 g/mL') or, for a solution, its molarity ('solution=1.6 M in hexanes')` });
}

/**
 * The mass to weigh and the volume to take for an amount of the reagent.
 * Mass = n × M ÷ purity (or ÷ mass fraction for a solution by mass); volume = mass ÷ density,
 * or n ÷ molarity for a solution.
 *
 * @example
 * const M = quantity(readNumber('102.09'), unitOf('g/mol'))
 * materialForMoles(measure('10.0 mmol'), M, readMaterial({ purity: '98 %' }, 'Ac2O', [])).mass?.value.toFixed(4) // '1.0417'
 */
export function materialForMoles(n: Quantity, molarMass: Quantity | null, m: Material): { mass: Quantity | null; volume: Quantity | null } {
  if (m.molarity) {
    const volume = divide(n, m.molarity);
    return { mass: m.density ? multiply(volume, m.density) : null, volume };
  }
  if (!molarMass) return { mass: null, volume: null };
  const share = m.massFraction ?? m.purity;
  const pureMass = multiply(n, molarMass);
  const mass = share ? divide(pureMass, share) : pureMass;
  return { mass, volume: m.density ? divide(mass, m.density) : null };
}

/**
 * True for a material that is a liquid or solution (the volume is the thing to measure).
 *
 * @example
 * isLiquid(readMaterial({ density: '1.08 g/mL' }, 'Ac2O', [])) // true
 */
export function isLiquid(m: Material): boolean {
  return m.density !== null || m.molarity !== null;
}
