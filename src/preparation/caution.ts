/** The caution printed with results someone will weigh, pipette or dose by. */
export const BENCH_CAUTION =
  'check the reagent label (formula, hydrate form, assay) and its SDS, and follow your lab\'s procedures and local regulations; pondus computes, it does not replace a second check';

/** The caution for salt/parent conversions used for doses. */
export const DOSE_CAUTION =
  'dosing decisions follow licensed practice, the product labelling and local regulations; a salt/parent factor does not account for bioavailability or formulation';
