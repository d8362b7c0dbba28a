/**
 * Warnings where a person would waste material or get hurt: a mass too small
 * to weigh well, a dilution too large for one step, a result over 100 %.
 * Each is a {@link Note} with a stable code, so it reaches JSON too.
 */
import { Decimal } from '../exact/decimal.js';
import type { Note } from '../errors/issue.js';
import type { Quantity } from '../sigfig/quantity.js';

/**
 * Smallest mass, in g, worth weighing directly: 10 mg. On an analytical balance
 * reading to 0.1 mg, a smaller mass is weighed to no better than 1 % (common
 * practice; balance minimum weights are typically some tens of milligrams).
 */
export const MIN_WEIGHABLE_G = new Decimal('0.010');

/** Smallest volume, in L, worth transferring in one step: 100 µL (common practice). */
export const MIN_TRANSFER_L = new Decimal('0.0001');

/** Largest dilution factor worth doing in one step: 100 (common practice). */
export const MAX_ONE_STEP_FACTOR = new Decimal(100);

/**
 * A warning when a mass to weigh is below {@link MIN_WEIGHABLE_G}, or null.
 *
 * @example
 * smallMassWarning(measure('0.0000158 g'), '1.580 × 10⁻⁵ g')?.code // 'MASS_TOO_SMALL'
 */
export function smallMassWarning(mass: Quantity, shown: string, remedy = 'make a stock solution and dilute it, or prepare a larger volume'): Note | null {
  if (mass.value.gte(MIN_WEIGHABLE_G) || mass.value.lte(0)) return null;
  return {
    code: 'MASS_TOO_SMALL',
    message: `${shown} is too small to weigh reliably: below 10 mg an analytical balance reading to 0.1 mg gives 1 % or worse (common practice); ${remedy}`,
  };
}

function factorText(f: Decimal): string {
  return f.toSignificantDigits(4).toFixed();
}

/**
 * A warning when a one-step dilution needs a transfer below 100 µL or a factor above 100, or null.
 *
 * @example
 * dilutionWarning(measure('0.0500 mL'), new Decimal(1000), '50.00 µL')?.code // 'SERIAL_DILUTION'
 */
export function dilutionWarning(stockVolume: Quantity, factor: Decimal, shown: string): Note | null {
  const small = stockVolume.value.lt(MIN_TRANSFER_L);
  const large = factor.gt(MAX_ONE_STEP_FACTOR);
  if (!small && !large) return null;
  const why = [large ? `a 1:${factorText(factor)} dilution in one step` : null, small ? `a transfer of ${shown}` : null].filter(Boolean).join(' and ');
  let plan = 'make up a larger final volume';
  if (large) {
    // steps of at most 1:100: 1:100 … then what is left
    const steps = Math.ceil(Math.log(factor.toNumber()) / Math.log(100) - 1e-9);
    const last = factor.div(MAX_ONE_STEP_FACTOR.pow(steps - 1));
    const parts = [...new Array<string>(steps - 1).fill('1:100'), `1:${factorText(last)}`];
    plan = `dilute in steps instead (serial dilution), for example ${parts.join(', then ')} (\`dilutionSeries\` plans the steps)`;
  }
  return {
    code: 'SERIAL_DILUTION',
    message: `${why}: transfers below 100 µL and one-step factors above 100 magnify the volumetric error (common practice); ${plan}`,
    ...(large ? { functions: ['dilutionSeries' as const] } : {}),
  };
}

/**
 * A warning when a percentage result is over 100 %, or null.
 *
 * @example
 * over100Warning(new Decimal('123.7'), 'the analyte', 'check the masses')?.code // 'RESULT_OVER_100'
 */
export function over100Warning(percent: Decimal, what: string, check: string): Note | null {
  if (percent.lte(100)) return null;
  return { code: 'RESULT_OVER_100', message: `${what} is ${percent.toSignificantDigits(4).toFixed()} %, more than 100 %: ${check}` };
}

/** Elements whose compounds a lab weighs out as standards and that are toxic in any form, with the hazard to name. */
const TOXIC_METALS: readonly [symbol: string, name: string, hazard: string, pattern: RegExp][] = [
  ['Pb', 'lead', 'a cumulative poison and a reproductive toxicant', /Pb(?![a-z])/],
  ['Hg', 'mercury', 'a cumulative poison, absorbed through the skin', /Hg(?![a-z])/],
  ['Cd', 'cadmium', 'a carcinogen, IARC Group 1', /Cd(?![a-z])/],
  ['Tl', 'thallium', 'a cumulative poison, absorbed through the skin', /Tl(?![a-z])/],
  ['As', 'arsenic', 'a carcinogen, IARC Group 1', /As(?![a-z])/],
];

/** Hill formulas of the chromium(VI) salts and oxide a lab weighs out (dichromates, chromates, CrO3). */
const CHROMIUM_VI = new Set(['Cr2K2O7', 'Cr2Na2O7', 'Cr2H8N2O7', 'CrK2O4', 'CrNa2O4', 'CrO3']);
/** Hill formulas of the hydroxides that take up water and carbon dioxide from the air. */
const HYGROSCOPIC_BASES = new Set(['HNaO', 'HKO']);

/**
 * A note on handling the reagent, where the usual caution is not enough: sodium and potassium
 * hydroxide (a solution made by weighing them is only approximate), hydrofluoric acid (plastic
 * ware, calcium gluconate at hand) and chromium(VI) compounds (toxic and carcinogenic: IARC
 * Group 1, from memory). Null for anything else.
 *
 * @example
 * reagentHandlingNote('HNaO')?.code // 'REAGENT_HANDLING'
 * reagentHandlingNote('FH')?.message.includes('calcium gluconate') // true
 * reagentHandlingNote('N2O6Pb')?.message.startsWith('a lead compound') // true
 * reagentHandlingNote('ClNa') // null
 */
export function reagentHandlingNote(hill: string): Note | null {
  if (HYGROSCOPIC_BASES.has(hill)) {
    return { code: 'REAGENT_HANDLING', message: `${hill === 'HNaO' ? 'NaOH' : 'KOH'} takes up water and carbon dioxide from the air, so a solution made by weighing it is only approximate: standardise it (against potassium hydrogen phthalate, for example) before using it as a titrant; it is corrosive: wear eye protection (common practice)` };
  }
  if (hill === 'FH') {
    return {
      code: 'REAGENT_HANDLING',
      message:
        'hydrofluoric acid: it etches glass, so measure, dilute and store it in plastic ware (polypropylene, PTFE), not a glass flask or pipette; it passes through skin and a burn from it may not hurt until hours later, and even a small burn can be life-threatening: have calcium gluconate gel at hand before opening the bottle, wear HF-rated gloves, a face shield and an apron, work in a fume hood, and get medical help after any contact (from memory); follow its SDS and your lab\'s HF procedure',
    };
  }
  const toxic = TOXIC_METALS.find(([, , , pattern]) => pattern.test(hill));
  if (toxic) {
    return { code: 'REAGENT_HANDLING', message: `a ${toxic[1]} compound: toxic (${toxic[2]}, from memory); weigh it with gloves, avoid raising dust, keep its solutions labelled, and collect all waste, rinses included, as hazardous; follow its SDS` };
  }
  if (CHROMIUM_VI.has(hill)) {
    return { code: 'REAGENT_HANDLING', message: 'a chromium(VI) compound: toxic and a carcinogen (IARC Group 1, from memory); weigh it in a fume hood or ventilated enclosure with gloves, and collect the waste as hazardous; follow its SDS' };
  }
  return null;
}

/**
 * The vessel a concentrated reagent is diluted in: a plastic one for hydrofluoric acid, which
 * etches glass (from memory), the usual volumetric flask for anything else.
 *
 * @example
 * flaskFor('FH') // 'plastic (polypropylene or PTFE) volumetric flask'
 * flaskFor('ClH') // 'flask'
 */
export function flaskFor(hill: string): string {
  return hill === 'FH' ? 'plastic (polypropylene or PTFE) volumetric flask' : 'flask';
}
