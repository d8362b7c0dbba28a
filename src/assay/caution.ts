/** The caution printed with assay results and specification verdicts someone will release or reject a batch by. */
export const QC_CAUTION =
  "a computed result and verdict do not release or reject a batch: follow the monograph or specification, your laboratory's procedures and second-person review, and local regulations";
