/** The caution every running/decoupling result carries (wording fixed by the product owner). */
export const RUNNING_CAUTION = 'estimates and leading-order formulas; check against the literature for precision work'
