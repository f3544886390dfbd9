/**
 * Rewrite any operator of a class as an exact rational combination of the kept operators,
 * modulo equations of motion and integration by parts.
 */
import { EngineConsistencyError, EngineInputError } from '../errors'
import { solveOverQ } from '../finite/solveOverQ'
import { liftReach } from '../finite/rationalLift'
import { isZero, toString as ratString, type Rational } from '../exact/rational'
import type { ClassBasis } from './classBasis'
import { combinationValues, type SamplePoint } from './evaluation'
import { parseOperatorText } from './inputSyntax'
import type { PrimeField } from '../finite/primeField'

/** A target given by its own amplitude evaluator (must use only F, the point, and legs). */
export interface AmplitudeTarget {
  /** Unsymmetrised value at a point with legs relabelled by map (see evaluation.ts). */
  evaluate(F: PrimeField, point: SamplePoint, map: number[]): number
  label?: string
}

export interface RewriteResult {
  /** Coefficient of each kept operator (same order as classBasis.kept). */
  coefficients: { operator: string; coefficient: Rational }[]
  /** True when the operator vanishes modulo EOM and IBP (all coefficients 0). */
  vanishes: boolean
  text: string
  note: string
}

function targetValues(b: ClassBasis, pi: number, target: string | AmplitudeTarget): number[] {
  const { F, points } = b.primes[pi]!
  if (typeof target === 'string') {
    const terms = parseOperatorText(b.class, target, b.gaugeStructures.length)
    return combinationValues(
      F,
      terms.map((t) => ({ lorentz: t.lorentz, gauge: b.gaugeStructures[t.gaugeIndex]!, coeff: F.fromRational(t.coeff) })),
      points,
      b.perms,
    )
  }
  return points.map((pt) => {
    let total = 0
    for (const perm of b.perms) {
      const v = target.evaluate(F, pt, perm.map)
      total = perm.sign === 1 ? F.add(total, v) : F.sub(total, v)
    }
    return total
  })
}

/**
 * Coefficients x with target = Σ x_i kept_i, exact over Q.
 * @example rewriteOperator(photonBasis, "<13>^2[24]^2") // one coefficient, e.g. 1 or −1
 * Method: solve mod each prime, lift every coefficient from all primes together by CRT and
 * rational reconstruction (Wang 1981), checked against each prime (finite/solveOverQ.ts).
 */
export function rewriteOperator(b: ClassBasis, target: string | AmplitudeTarget): RewriteResult {
  const values = b.primes.map((_, pi) => targetValues(b, pi, target))
  if (b.rank === 0 && values.some((t) => t.some((v) => v !== 0))) {
    throw new EngineConsistencyError('rewriteOperator', `class ${b.key} has rank 0 but the target does not vanish`)
  }
  const systems = b.primes.map((pd, pi) => ({ a: pd.keptRows, b: values[pi]! }))
  const out = solveOverQ(
    b.primes.map((pd) => pd.F),
    systems,
    { fn: 'rewriteOperator', about: `class ${b.key}` },
  )
  if (out.status === 'outside-span') throw new EngineInputError('rewriteOperator', `The operator "${labelOf(target)}" is not a combination of the operators of the class ${b.key}`)
  if (out.status === 'not-liftable') {
    const { each, product } = liftReach(b.primes.map((pd) => pd.F.p))
    throw new EngineInputError(
      'rewriteOperator',
      `In the class ${b.key}, a coefficient of the rewrite is not a fraction with numerator and denominator up to ${each} (product up to ${product}); an operator with a factor i, or with very large coefficients, cannot be rewritten exactly`,
    )
  }
  const coeffs = out.coefficients
  return {
    coefficients: coeffs.map((c, i) => ({ operator: b.kept[i]!.text, coefficient: c })),
    vanishes: coeffs.every(isZero),
    text:
      coeffs
        .map((c, i) => (isZero(c) ? '' : `${ratString(c)}·(${b.kept[i]!.text})`))
        .filter(Boolean)
        .join(' + ') || '0',
    note: b.note,
  }
}

function labelOf(t: string | AmplitudeTarget): string {
  return typeof t === 'string' ? t : (t.label ?? 'custom amplitude')
}
