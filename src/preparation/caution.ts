/** The caution printed with results someone will weigh, pipette or dose by. */
export const BENCH_CAUTION =
  'check the reagent label (formula, hydrate form, assay) and its SDS, and follow your lab\'s procedures and local regulations; pondus computes, it does not replace a second check';

/** The caution for salt/parent conversions used for doses. */
export const DOSE_CAUTION =
  'a dose or a salt mass must be verified by the pharmacist; dosing decisions follow licensed practice, the product labelling and local regulations; a salt/parent factor does not account for bioavailability or formulation';

/** The caution for volumes of concentrated acids and bases. */
export const CONCENTRATED_CAUTION =
  'concentrated acids and bases are corrosive and some give off heat or fumes when diluted: wear eye and hand protection, work in a fume hood, add acid to water, and follow the SDS, your lab\'s procedures and local regulations; pondus computes, it does not replace a second check';
