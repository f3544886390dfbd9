/**
 * Public API of the Hilbert-series counting engine (operators per mass dimension and class,
 * modulo EOM and IBP; Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016).
 */
export { countOperators, MAX_COUNT_DIMENSION, type CountOptions, type CountResult, type DimensionCount } from './countOperators'
export { enumerateClasses, enumerateFieldContents, type FieldContent, type OperatorClass } from './classes'
export { CountContext, countFieldContent, type ContentResult } from './contentCount'
export { lorentzSingletSeries, BASE_SPINS, type LorentzFactor } from './lorentz'
export { cycleTypes, type CycleType } from './cycleTypes'
export { GroupIntegrator } from './groupFactor'
