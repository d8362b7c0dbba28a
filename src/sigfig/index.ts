export { exact, times, dividedBy, plus, minus, sumMeasured, sigFigsOf, msd, lsdForSigFigs, type Measured } from './measured.js';
export { readNumber, type ReadNumber, MAX_EXPONENT } from './read-number.js';
export { roundToSigFigs, roundToPosition, displayMeasured, type Display, type RoundingMode } from './round.js';
