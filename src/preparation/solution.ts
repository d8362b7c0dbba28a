/**
 * Making up a solution from a solid: the mass to weigh for a target molar or
 * mass concentration and volume, allowing for the reagent's assay (purity) and
 * its hydrate form, or for a concentration stated for one part of it (Cu from
 * CuSO4·5H2O, Cl⁻ from CaCl2·2H2O).
 */
import type { Note } from '../errors/issue.js';
import { fail, toSafe, type SafeResult } from '../errors/pondus-error.js';
import { MASS_CONCENTRATION, MOLARITY, PURE, VOLUME, measureAs } from '../calc/measure.js';
import { partShare } from '../composition/part-share.js';
import { toDecimal } from '../formula/amount.js';
import { formulaMass, type MassOptions, type MassResult } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { exact } from '../sigfig/measured.js';
import { divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import { sameDims, unitOf } from '../sigfig/units.js';

export interface SolutionOptions extends MassOptions {
  /** Target concentration: '0.100 M', '5.00 g/L', '1000 ppm' (read as mg/L), '2.0 %' (read as g/100 mL). */
  concentration: string;
  /** Final volume: '250.0 mL'. */
  volume: string;
  /** Assay of the reagent: '98.5 %'. */
  purity?: string;
  /** The species the concentration refers to, when not the reagent itself: 'Cu', 'Cl', 'CuSO4'. */
  as?: string;
}

export interface SolutionResult {
  reagent: MassResult;
  /** What the concentration counts, and how many of it one formula unit of reagent holds. */
  target: { formula: string; perReagent: string; molarMass: Quantity };
  concentration: Quantity;
  volume: Quantity;
  purity: Quantity | null;
  /** Amount of reagent, mol. */
  moles: Quantity;
  /** Mass of pure reagent, g. */
  pureMass: Quantity;
  /** Mass to weigh out, g (allowing for purity). */
  mass: Quantity;
  notes: Note[];
}

const G_PER_MOL = unitOf('g/mol');

/**
 * The mass of a reagent to weigh for a solution.
 *
 * @example
 * prepareSolution('CuSO4·5H2O', { concentration: '0.100 M', volume: '250.0 mL' }).mass // 6.24 g
 */
export function prepareSolution(reagentText: string, options: SolutionOptions): SolutionResult {
  const notes: Note[] = [];
  const reagent = formulaMass(reagentText, options);
  let conc = measureAs(options.concentration, [MOLARITY, MASS_CONCENTRATION, PURE], 'the concentration', notes);
  if (sameDims(conc.dims, PURE)) {
    const text = options.concentration.trim();
    if (/ppm$/.test(text)) {
      conc = multiply(conc, quantity(exact(1000), unitOf('g/L'))); // 1 ppm ≈ 1 mg/L for dilute aqueous solutions
      notes.push({ code: 'PPM_AS_MG_PER_L', message: 'ppm is read as mg/L, which holds for dilute aqueous solutions (density 1.00 g/mL)' });
    } else if (/%$/.test(text)) {
      conc = multiply(conc, quantity(exact(1000), unitOf('g/L')));
      notes.push({ code: 'PERCENT_AS_W_V', message: '% is read as % w/v (grams per 100 mL)' });
    } else {
      throw fail({ code: 'BAD_AMOUNT', message: `the concentration needs a unit (M, mM, g/L, mg/mL, ppm, %): '${options.concentration}'` });
    }
  }
  if (conc.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the concentration must be positive' });
  const volume = measureAs(options.volume, [VOLUME], 'the volume', notes);
  if (volume.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the volume must be positive' });

  const reagentM = quantity(reportedMolarMass(reagent), G_PER_MOL);
  let targetM = reagentM;
  let perReagent = quantity(exact(1), null);
  let targetFormula = reagent.formula;
  if (options.as !== undefined) {
    const share = partShare(reagent, options.as, options);
    const target = formulaMass(options.as, options);
    targetM = quantity(reportedMolarMass(target), G_PER_MOL);
    perReagent = quantity(exact(toDecimal(share.count)), null);
    targetFormula = target.formula;
    notes.push(...share.notes);
  }
  // amount of the target species, then of reagent
  const targetMoles = sameDims(conc.dims, MOLARITY) ? multiply(conc, volume) : divide(multiply(conc, volume), targetM);
  const moles = divide(targetMoles, perReagent);
  const pureMass = multiply(moles, reagentM);
  let purity: Quantity | null = null;
  let mass = pureMass;
  if (options.purity !== undefined) {
    purity = measureAs(options.purity, [PURE], 'the purity', notes);
    if (purity.value.lte(0) || purity.value.gt(1)) throw fail({ code: 'BAD_AMOUNT', message: `the purity must be above 0 and at most 100 %: '${options.purity}'` });
    mass = divide(pureMass, purity);
  }
  return { reagent, target: { formula: targetFormula, perReagent: toDecimal(perReagent.value).toFixed(), molarMass: targetM }, concentration: conc, volume, purity, moles, pureMass, mass, notes };
}

/** Non-throwing {@link prepareSolution}. */
export function safePrepareSolution(reagent: string, options: SolutionOptions): SafeResult<SolutionResult> {
  return toSafe(() => prepareSolution(reagent, options));
}
