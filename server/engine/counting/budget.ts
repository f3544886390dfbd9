/**
 * Work estimate of a Hilbert-series count, from the input alone, before any integral is
 * done: the cycle-index sum of a field content visits Π_s p(n_s) cycle-type combinations
 * (p = partition number, n_s = multiplicity of species s), and each visit multiplies one
 * cached integral per group that acts on the content. A theory whose estimate exceeds the
 * budget is refused with the numbers, instead of a fixed cap on fields or groups.
 */
import { EngineInputError } from '../errors'
import type { TheoryModel } from '../theory/model'
import type { FieldContent } from './classes'
import { partitionsOf } from '../group/symmetricGroup'
import { speciesRepKeys } from './contentCount'

/** Largest estimated number of (cycle-type combination × group) terms of one count. */
export const COUNT_WORK_BUDGET = 2e8

const partitionCounts: number[] = []

/** Number of partitions p(n). @example partitionNumber(6) // 11 */
export function partitionNumber(n: number): number {
  return (partitionCounts[n] ??= partitionsOf(n).length)
}

export interface WorkEstimate {
  contents: number
  /** Σ over contents of Π_s p(n_s) × (1 + number of groups acting on the content). */
  terms: number
}

/**
 * Estimated work of counting the given contents.
 * @example estimateCountWork(smeftModel, contents).terms // about 1.6e5 for SMEFT up to dimension 8
 */
export function estimateCountWork(model: TheoryModel, contents: readonly FieldContent[]): WorkEstimate {
  let terms = 0
  for (const c of contents) {
    let visits = 1
    const acting = new Set<number>()
    c.counts.forEach((n, s) => {
      if (n === 0) return
      visits *= partitionNumber(n)
      speciesRepKeys(model, model.species[s]!).forEach((key, g) => {
        if (key !== null) acting.add(g)
      })
    })
    terms += visits * (1 + acting.size)
  }
  return { contents: contents.length, terms }
}

/**
 * Throw an EngineInputError naming the estimate when it exceeds COUNT_WORK_BUDGET.
 * @example checkCountBudget(model, contents, 16) // passes for SMEFT with 6 flavors
 */
export function checkCountBudget(model: TheoryModel, contents: readonly FieldContent[], maxDim: number, budget = COUNT_WORK_BUDGET): WorkEstimate {
  const w = estimateCountWork(model, contents)
  if (w.terms > budget) {
    throw new EngineInputError(
      'countOperators',
      `theory "${model.name}" up to dimension ${maxDim} needs an estimated ${w.terms.toExponential(2)} cycle-index terms over ${w.contents} field contents, ` +
        `above the budget of ${budget.toExponential(1)}; lower the maximum dimension, or declare fewer fields or groups`,
    )
  }
  return w
}
