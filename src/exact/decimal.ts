import { Decimal as DecimalBase } from 'decimal.js';

/**
 * The Decimal constructor pondus computes with: 50 significant digits, so that
 * sums and products of tabulated values are exact and quotients carry far more
 * digits than any measurement. Rounding for display is done elsewhere, once.
 *
 * @example
 * new Decimal('1.008').times(2).plus('15.999').toString() // '18.015'
 */
export const Decimal = DecimalBase.clone({ precision: 50, rounding: DecimalBase.ROUND_HALF_EVEN, toExpNeg: -30, toExpPos: 40 });
export type Decimal = InstanceType<typeof Decimal>;
