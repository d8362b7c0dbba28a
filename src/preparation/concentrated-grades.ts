/**
 * Common commercial grades of concentrated acids and bases, with their
 * nominal density at 20 °C. Typed from memory of the table of concentrated
 * acids and bases in the CRC Handbook of Chemistry and Physics (and the
 * matching figures on suppliers' labels); they are nominal values: the label
 * or certificate of the bottle in hand decides.
 */

export interface ConcentratedGrade {
  /** Hill formula of the solute the fraction counts. */
  formula: string;
  name: string;
  /** Nominal mass fraction, % w/w. */
  percent: string;
  /** Nominal density, g/mL. */
  density: string;
  /** Nominal molarity, M, as the handbook table lists it (for checks). */
  molarity: string;
  source: string;
}

const SOURCE = 'nominal, typed from memory of the CRC Handbook of Chemistry and Physics table of concentrated acids and bases';

/** The table of common grades. */
export const CONCENTRATED_GRADES: readonly ConcentratedGrade[] = Object.freeze([
  { formula: 'ClH', name: 'hydrochloric acid', percent: '37', density: '1.19', molarity: '12.1', source: SOURCE },
  { formula: 'H2O4S', name: 'sulfuric acid', percent: '96', density: '1.84', molarity: '18.0', source: SOURCE },
  { formula: 'H2O4S', name: 'sulfuric acid', percent: '98', density: '1.84', molarity: '18.4', source: SOURCE },
  { formula: 'HNO3', name: 'nitric acid', percent: '70', density: '1.42', molarity: '15.8', source: SOURCE },
  { formula: 'H3N', name: 'ammonia solution (as NH3)', percent: '28', density: '0.90', molarity: '14.8', source: SOURCE },
  { formula: 'H3O4P', name: 'phosphoric acid', percent: '85', density: '1.69', molarity: '14.7', source: SOURCE },
  { formula: 'C2H4O2', name: 'acetic acid (glacial)', percent: '99.7', density: '1.05', molarity: '17.4', source: SOURCE },
  { formula: 'ClHO4', name: 'perchloric acid', percent: '70', density: '1.67', molarity: '11.6', source: SOURCE },
]);
