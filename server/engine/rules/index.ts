/** Counting rules: exact orders of operators and reshuffling between rules. */
export { resolveRule, massRatioOrder, massRatioDimension, MASS_RATIO_OFFSET, HEAVY_MASS_WEIGHTS, HEAVY_VELOCITY_WEIGHTS, type RuleContext, type RuleSpecies, type ResolvedRule } from './defaultWeights'
export { orderOf, orderOfOperator, formatOrder, asResolved, type BlockCounts, type RuleOperator } from './orderOf'
export { reshuffle, groupByOrder, type OrderChange } from './reshuffle'
export { blocksFromClassKey } from './classKeyBlocks'
