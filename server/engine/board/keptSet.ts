/**
 * The kept set of one class on the basis board: its rank (coverage), whether it is redundant
 * and which operator makes it so, and the rewrite of an operator onto it. Pure functions of the
 * operators' fingerprints (see fingerprints.ts); heavy-frame classes have no fingerprints and
 * are judged by the number of kept operators alone.
 */
import { coverageRank, expressIn, type Fingerprint } from './fingerprints'
import { EngineInputError } from '../errors'
import { toString as ratString, isZero } from '../exact/rational'

export interface ClassOperator {
  id: number
  column: 'kept' | 'set_aside'
  latex: string
  text: string
  fingerprint: Fingerprint | null
}

export interface Coverage {
  classKey: string
  rank: number
  required: number
  complete: boolean
}

/** An exact rewrite, or the statement that the stored fingerprints cannot give one exactly. */
export type Rewrite = { exact: true; vanishes: boolean; terms: { operatorId: number; latex: string; coefficient: string }[] } | { exact: false; vanishes: false; terms: []; message: string }

const NOT_EXACT =
  'A combination of the kept operators whose coefficients are beyond what the stored fingerprints determine ' + '(a numerator or denominator too large): the rewrite cannot be given exactly.'

const hasPrint = (o: ClassOperator): o is ClassOperator & { fingerprint: Fingerprint } => o.fingerprint !== null

/**
 * Rank of the kept operators: of their fingerprints, or their number when one has none.
 * @example keptRank([a, b, a + b]) // 2
 */
export function keptRank(kept: ClassOperator[]): number {
  return kept.every(hasPrint) ? coverageRank(kept.map((o) => o.fingerprint!)) : kept.length
}

/** Coverage of a class from all of its operators (both columns). */
export function coverageOf(classKey: string, ops: ClassOperator[], required: number): Coverage {
  const rank = keptRank(ops.filter((o) => o.column === 'kept'))
  return { classKey, rank, required, complete: rank === required }
}

/**
 * The first kept operator (index into `kept`, in the order given) that makes the kept set
 * redundant — a combination of those before it, or one more than the class needs — else null.
 * Binary search on prefixes: a prefix's rank falls short of its length from that index on.
 * @example firstRedundant([a, b, a + b], 3) // 2
 */
export function firstRedundant(kept: ClassOperator[], required: number): number | null {
  if (!kept.every(hasPrint)) return kept.length > required ? required : null
  const prints = kept.map((o) => o.fingerprint!)
  const full = (n: number) => coverageRank(prints.slice(0, n)) === n
  if (full(prints.length)) return null
  let lo = 0 // the first lo operators are independent
  let hi = prints.length // the first hi are not
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1
    if (full(mid)) lo = mid
    else hi = mid
  }
  return hi - 1
}

/**
 * The operator `targetId` written in terms of the kept operators of its class other than
 * itself: null when it is independent of them (or a fingerprint is missing), marked not exact
 * when its coefficients are beyond what the stored fingerprints determine.
 */
export function rewriteOnto(ops: ClassOperator[], targetId: number): Rewrite | null {
  const target = ops.find((o) => o.id === targetId)
  const kept = ops.filter((o) => o.column === 'kept' && o.id !== targetId)
  if (!target?.fingerprint || !kept.every(hasPrint)) return null
  let combination: ReturnType<typeof expressIn>
  try {
    combination = expressIn(
      kept.map((o) => o.fingerprint!),
      target.fingerprint,
    )
  } catch (error) {
    if (!(error instanceof EngineInputError)) throw error
    return { exact: false, vanishes: false, terms: [], message: NOT_EXACT }
  }
  if (!combination) return null
  const terms = combination.coefficients
    .map((c, i) => ({ c, op: kept[i]! }))
    .filter(({ c }) => !isZero(c))
    .map(({ c, op }) => ({ operatorId: op.id, latex: op.latex, coefficient: ratString(c) }))
  return { exact: true, vanishes: terms.length === 0, terms }
}
