/** Public API of the Lie-group engine (SU(n) irreps, characters, products, plethysms, Lorentz). */
export type { Character, Dynkin, WeightKey } from './types'
export { MAX_N, MIN_N, dynkinKey, dynkinToPartition } from './labels'
export { suDimension, suWeights, MAX_WEIGHT_DIMENSION } from './weights'
export { suCasimir, suConjugate, suCubicAnomaly, suIndex, suReality } from './irrep'
export { decomposeCharacter, reflectToDominant, singletContribution, singletCount } from './decompose'
export {
  characterAdams, characterDimension, characterPower, characterProduct, characterSum, trivialCharacter,
} from './character'
export { alternatingPower, symmetricPower, tensorProduct } from './products'
export { MAX_PLETHYSM_DEGREE, plethysm, schurFunctorCharacter, type PlethysmOptions } from './plethysm'
export { multiplyIrreps, schurFunctorIrreps } from './brauer'
export { classSize, partitionsOf, symmetricCharacter } from './symmetricGroup'
export { kostka } from './kostka'
export { decomposeProduct, productCharacter, productSingletCount } from './productGroup'
export {
  LORENTZ_IRREPS, type LorentzIrrep, lorentzConjugate, lorentzDecompose, lorentzDimension,
  lorentzIrrep, lorentzSingletCount, lorentzTensorProduct, lorentzWeights,
} from './lorentz'
