/** The caution printed with doses, salt masses to weigh and compounding amounts. */
export const PHARMACY_CAUTION =
  "a dose, a mass to weigh or an amount to mix must be verified by the pharmacist against the prescription, the product labelling, your pharmacy's procedures and local regulations; pondus computes, it does not replace that check";
