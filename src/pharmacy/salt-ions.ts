/**
 * Splits a salt into the ions it gives in solution, from its atom counts:
 * a cations + b anions (from {@link CATIONS} and {@link ANIONS}) with the
 * charges balancing, water of crystallisation set aside. The ions can also be
 * given, as `K^+,Cl^-` or `2K^+,HPO4^2-`; a salt that matches no pair, or more
 * than one, is refused with the readings named.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { toDecimal } from '../formula/amount.js';
import type { AtomCounts } from '../formula/flatten.js';
import { formulaMassDetail, type MassOptions, type MassDetail } from '../mass/formula-mass.js';
import { hydrateWater } from '../assay/hydrate-note.js';
import { ANIONS, CATIONS, type IonEntry } from './ions.js';

export interface SaltIon {
  /** The ion's formula with its charge: 'K^+', 'HPO4^2-'. */
  ion: string;
  name: string;
  charge: number;
  /** Ions of this kind per formula unit of the salt. */
  count: number;
}

export interface SaltIons {
  ions: SaltIon[];
  /** Particles per formula unit when fully dissociated. */
  particles: number;
  /** Total positive charge per formula unit (equivalents per mole of salt). */
  equivalentsPerMole: number;
  waterOfCrystallisation: number;
}

const chargeText = (z: number) => `^${Math.abs(z) === 1 ? '' : Math.abs(z)}${z > 0 ? '+' : '-'}`;

function countsOf(formula: string): AtomCounts {
  return formulaMassDetail(formula).atoms;
}

const ION_COUNTS = new Map<string, AtomCounts>();
function ionCounts(e: IonEntry): AtomCounts {
  let c = ION_COUNTS.get(e.formula);
  if (!c) ION_COUNTS.set(e.formula, (c = countsOf(e.formula)));
  return c;
}

function sameCounts(target: Map<string, number>, parts: [AtomCounts, number][]): boolean {
  const sum = new Map<string, number>();
  for (const [c, k] of parts) for (const [key, n] of c) sum.set(key, (sum.get(key) ?? 0) + toDecimal(n).toNumber() * k);
  if (sum.size !== target.size) return false;
  for (const [key, n] of target) if (sum.get(key) !== n) return false;
  return true;
}

/**
 * The ions of a salt from its formula (or the ions given), with a note naming the reading.
 *
 * @param salt - the salt (from formulaMassDetail).
 * @param given - the ions as written ('2K^+,HPO4^2-'), or undefined to split the salt automatically.
 * @param notes - where the note of the reading is added.
 * @param options - atomic-weight options for the ions given.
 * @returns the ions with their charges and counts, the equivalents per mole and the particles per formula unit.
 * @throws PondusError: BAD_CHARGE for a charged salt, an ion without a charge or ions that do not balance; BAD_OPTION for a fractional count or a salt that does not split into known ions; AMBIGUOUS_CHARGE when it splits more than one way; BAD_COUNT; PART_NOT_IN_FORMULA when the ions given do not add up to the salt; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * saltIons(formulaMassDetail('CaCl2·2H2O'), undefined, []).equivalentsPerMole // 2
 */
export function saltIons(salt: MassDetail, given: string | undefined, notes: Note[], options: MassOptions = {}): SaltIons {
  if (salt.charge !== 0) throw fail({ code: 'BAD_CHARGE', message: `${salt.input} carries a charge; write the neutral salt, e.g. Na2SO4` }, salt.input);
  const water = hydrateWater(salt);
  const target = new Map<string, number>();
  for (const [k, n] of salt.atoms) {
    const d = toDecimal(n);
    if (!d.isInteger()) throw fail({ code: 'BAD_OPTION', message: `${salt.input} has a fractional count; give its ions with \`ions\``, options: ['ions'] }, salt.input);
    target.set(k, d.toNumber());
  }
  if (water > 0) {
    target.set('H', (target.get('H') ?? 0) - 2 * water);
    target.set('O', (target.get('O') ?? 0) - water);
    for (const k of ['H', 'O']) if (target.get(k) === 0) target.delete(k);
  }
  if (given !== undefined) return givenIons(salt, given, target, water, notes, options);
  const found: SaltIons[] = [];
  for (const c of CATIONS) {
    for (const a of ANIONS) {
      const zc = c.charge;
      const za = -a.charge;
      for (let nc = 1; nc <= 4; nc++) {
        if ((nc * zc) % za !== 0) continue;
        const na = (nc * zc) / za;
        if (na > 6) continue;
        if (sameCounts(target, [[ionCounts(c), nc], [ionCounts(a), na]])) {
          found.push({
            ions: [
              { ion: `${c.formula}${chargeText(zc)}`, name: c.name, charge: zc, count: nc },
              { ion: `${a.formula}${chargeText(-za)}`, name: a.name, charge: -za, count: na },
            ],
            particles: nc + na,
            equivalentsPerMole: nc * zc,
            waterOfCrystallisation: water,
          });
        }
      }
    }
  }
  if (found.length === 0) {
    throw fail({ code: 'BAD_OPTION', message: `${salt.input} does not split into a cation and an anion pondus knows; give its ions with \`ions\`: each ion with its charge, a count before it when more than one, separated by commas`, options: ['ions'] }, salt.input);
  }
  if (found.length > 1) {
    throw fail({ code: 'AMBIGUOUS_CHARGE', message: `${salt.input} splits into ions more than one way: ${found.map(describe).join(' or ')}; give the one you mean with \`ions\``, options: ['ions'] }, salt.input);
  }
  notes.push({ code: 'IONS_READ', message: `${salt.input} read as ${describe(found[0])}${water ? ` (its ${water} H2O of crystallisation counted in the molar mass, not as particles)` : ''}` });
  return found[0];
}

function describe(s: SaltIons): string {
  return s.ions.map((i) => `${i.count === 1 ? '' : i.count}${i.ion}`).join(' + ');
}

function givenIons(salt: MassDetail, given: string, target: Map<string, number>, water: number, notes: Note[], options: MassOptions): SaltIons {
  const ions: SaltIon[] = [];
  const parts: [AtomCounts, number][] = [];
  for (const piece of given.split(',').map((s) => s.trim()).filter((s) => s !== '')) {
    const m = /^(\d*)\s*(.+)$/.exec(piece)!;
    const count = m[1] === '' ? 1 : Number(m[1]);
    const ion = formulaMassDetail(m[2], options);
    if (ion.charge === 0) throw fail({ code: 'BAD_CHARGE', message: `the ion '${m[2]}' has no charge: write it as K^+, HPO4^2-, …` }, given);
    if (count < 1) throw fail({ code: 'BAD_COUNT', message: `the count of '${m[2]}' must be at least 1` }, given);
    ions.push({ ion: m[2], name: ion.formula, charge: ion.charge, count });
    parts.push([ion.atoms, count]);
  }
  if (ions.length === 0) throw fail({ code: 'BAD_OPTION', message: '`ions` is empty', options: ['ions'] }, given);
  const net = ions.reduce((s, i) => s + i.charge * i.count, 0);
  if (net !== 0) throw fail({ code: 'BAD_CHARGE', message: `the ions given carry a net charge of ${net}; a salt's ions balance` }, given);
  if (!sameCounts(target, parts)) throw fail({ code: 'PART_NOT_IN_FORMULA', message: `the ions given do not add up to ${salt.input}${water ? ' less its water of crystallisation' : ''}` }, given);
  const s: SaltIons = {
    ions,
    particles: ions.reduce((n, i) => n + i.count, 0),
    equivalentsPerMole: ions.filter((i) => i.charge > 0).reduce((n, i) => n + i.charge * i.count, 0),
    waterOfCrystallisation: water,
  };
  notes.push({ code: 'IONS_GIVEN', message: `${salt.input} taken as ${describe(s)}, as given` });
  return s;
}
