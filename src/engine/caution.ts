/** The caution every result carries: wrong or misused results can hurt people. */
export const SCREENING_CAUTION =
  'Screening calculation for qualified people, not a design-code check: verify the design to the governing local code with a licensed engineer.';
