/**
 * Salt/parent conversion: the factor between a salt form of a compound and the
 * parent (free base or free acid), and the salt mass that carries a given mass
 * of parent.
 */
import { fail, toSafe, type SafeResult } from '../errors/pondus-error.js';
import { MASS, measureAs } from '../calc/measure.js';
import { partShare } from '../composition/part-share.js';
import { Decimal } from '../exact/decimal.js';
import { toDecimal } from '../formula/amount.js';
import { formulaMass, type MassOptions, type MassResult } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { dividedBy, exact, times, type Measured } from '../sigfig/measured.js';
import { divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';

export interface SaltFactorResult {
  salt: MassResult;
  parent: MassResult;
  /** Parent units per salt formula unit. */
  perSalt: Decimal;
  /** M(salt) / (n · M(parent)): grams of salt per gram of parent. */
  factor: Decimal;
  reported: Measured;
  /** Salt mass carrying the parent mass asked about, g. */
  saltMass: Quantity | null;
  /** Parent mass carried by the salt mass asked about, g. */
  parentMass: Quantity | null;
}

/**
 * The salt/parent factor, and conversions of masses either way.
 *
 * @example
 * saltFactor('C17H19NO3·HCl·3H2O', 'C17H19NO3').factor.toFixed(4) // '1.3158'
 */
export function saltFactor(saltText: string, parentText: string, options: MassOptions & { parentMass?: string; saltMass?: string } = {}): SaltFactorResult {
  const salt = formulaMass(saltText, options);
  const parent = formulaMass(parentText, options);
  const share = partShare(salt, parentText, options);
  const perSalt = toDecimal(share.count);
  if (share.countedFrom !== 'written') throw fail({ code: 'BAD_OPTION', message: `${parent.formula} is not written as a part of ${saltText}; write the salt as parent·acid (e.g. C17H19NO3·HCl)` });
  const factor = salt.molarMass.div(parent.molarMass.times(perSalt));
  const reported = dividedBy(reportedMolarMass(salt), times(reportedMolarMass(parent), exact(perSalt)));
  let saltMass: Quantity | null = null;
  let parentMass: Quantity | null = null;
  if (options.parentMass !== undefined) saltMass = multiply(measureAs(options.parentMass, [MASS], 'the parent mass'), quantity(reported, null));
  if (options.saltMass !== undefined) parentMass = divide(measureAs(options.saltMass, [MASS], 'the salt mass'), quantity(reported, null));
  return { salt, parent, perSalt, factor, reported, saltMass, parentMass };
}

/** Non-throwing {@link saltFactor}. */
export function safeSaltFactor(salt: string, parent: string, options: MassOptions = {}): SafeResult<SaltFactorResult> {
  return toSafe(() => saltFactor(salt, parent, options));
}
