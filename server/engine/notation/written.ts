/**
 * Printed operators where the board and the basis take typed operators: the fingerprint of a
 * typed operator (its symmetrised amplitude at a class's sample points) and the terms of an
 * operator to keep (its exact rewrite in the class's default kept operators, so that a kept
 * printed operator has bracket terms like every other column). A factor i of the amplitude
 * (timesI) is dropped in both: the direction is the same.
 */
import { EngineInputError } from '../errors'
import type { Theory } from '../../../shared/schemas/theory'
import { classBasis, type ClassBasis, type Column } from '../basis/classBasis'
import type { OperatorClass } from '../basis/classKey'
import { rewriteOperator } from '../basis/rewrite'
import { PrimeSet } from '../finite/primeSet'
import { isZero } from '../exact/rational'
import { notationTarget, type NotationTarget } from './target'

/** True when a text is meant as printed notation rather than the bracket syntax. */
export { looksPrinted } from '../basis/printedText'

/**
 * Symmetrised values of a printed operator at a class basis's points, per prime.
 * @example notationValues(smeft, b, "(H^\\dagger H)^3")[0].length // number of sample points
 */
export function notationValues(theory: Theory, b: ClassBasis, text: string, aliases?: Record<string, string>): { values: number[][]; timesI: boolean } {
  const target: NotationTarget = notationTarget(theory, b.class, text, aliases)
  const values = b.primes.map(({ F, points }) =>
    points.map((pt) => {
      let total = 0
      for (const perm of b.perms) {
        const v = target.evaluate(F, pt, perm.map)
        total = perm.sign === 1 ? F.add(total, v) : F.sub(total, v)
      }
      return total
    }),
  )
  return { values, timesI: target.timesI }
}

/**
 * The column terms of a printed operator to keep in a class: Σ c_i (terms of default kept i).
 * Throws EngineInputError when it vanishes in the class (nothing to keep).
 */
export function notationColumnTerms(theory: Theory, cls: OperatorClass, text: string): Column['terms'] {
  const b = classBasis(theory, cls)
  const r = rewriteOperator(b, notationTarget(theory, cls, text))
  if (r.vanishes) throw new EngineInputError('keepOperator', `"${text}" vanishes in the class ${cls.key} (modulo EOM and IBP); there is nothing to keep`)
  const primes = PrimeSet.working()
  return r.coefficients.flatMap(({ coefficient }, i) => {
    if (isZero(coefficient)) return []
    const c = primes.image(coefficient)
    return b.kept[i]!.terms.map((t) => ({ ...t, coeff: t.coeff.map((x, pi) => primes.fields[pi]!.mul(x, c[pi]!)) }))
  })
}
