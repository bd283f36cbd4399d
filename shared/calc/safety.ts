// Shown beside suspension, brake and chassis figures: they describe a car, they do not certify it.
export const ENGINEERING_CAUTION =
  'Estimates for presentation, not engineering approval; defer to local regulations, ' +
  'inspection and licensed professionals.';
