export { flattenFormula, MAX_ATOMS, type AtomCounts } from './flatten.js';
export { hillFormula, hillOrder, chargeText } from './hill.js';
export { type Amount, amountText, toDecimal, isWhole } from './amount.js';
