export { Decimal } from './decimal.js';
export { toScaled, fromScaled, scaledToString, SCALE_DIGITS } from './scaled.js';
