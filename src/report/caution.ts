/**
 * The plain caution every report, page and summary carries: a wrong answer
 * here can end in a vehicle that trusts its navigation too much.
 */
export const CAUTION =
  'Design estimates from linearised models, not a safety case. Validate in the field and defer to the ' +
  'applicable standards, local regulations and licensed practice.';
