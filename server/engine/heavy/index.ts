/** Heavy-particle (non-relativistic) frame: operator enumeration, rewrites, published basis. */
export { enumerateHeavy, enumerateHeavyTheory, rewriteHeavy, verifyConventional, type HeavyEnumeration, type HeavyOperator, type HeavyOrder, type HeavyInput, type HeavyOptions } from './enumerate'
export { CONVENTIONAL_OPERATORS, LEADING_OPERATOR, type ConventionalOperator, type CoefficientRelation } from './conventional'
export { combo, parseStructure, expandCombo, type Combo, type Structure } from './structure'
export { orderSpace } from './orderSpace'
export { enumerateFourFermion, FOUR_FERMION_NOTE, type FourFermionOrder } from './fourFermion'
export { fourFermionSpace, symmetricFourCandidates, FourSpace, type FourSpaceOptions, type FourCandidate } from './fourSpace'
export { conventionalFour, cOddMixing, type FourConventional } from './fourConventional'
export { parseFour, fourCombo, expandArrows, type FourCombo, type FourStructure } from './fourStructure'
