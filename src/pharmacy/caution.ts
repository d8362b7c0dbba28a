/** The caution printed with doses, salt masses to weigh and compounding amounts. */
export const PHARMACY_CAUTION =
  "a dose, a mass to weigh or an amount to mix must be verified by the pharmacist against the prescription, the product labelling, your pharmacy's procedures and local regulations; pondus computes, it does not replace that check";

/** The caution printed with a potency-adjusted mass to weigh (compounding or QC). */
export const POTENCY_CAUTION =
  "a potency-adjusted mass to weigh must be checked against the certificate of analysis (its basis, water content and date) and verified by the pharmacist or a second analyst, following your procedures and local regulations; pondus computes, it does not replace that check";
