/**
 * Rewrite any operator of a class as an exact rational combination of the kept operators,
 * modulo equations of motion and integration by parts.
 */
import { EngineConsistencyError, EngineInputError } from '../errors'
import { solve } from '../finite/matrix'
import { reconstructRational, crt } from '../finite/rationalReconstruction'
import { equals as ratEquals, isZero, toString as ratString, type Rational } from '../exact/rational'
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
    return combinationValues(F, terms.map((t) => ({ lorentz: t.lorentz, gauge: b.gaugeStructures[t.gaugeIndex]!, coeff: F.fromRational(t.coeff) })), points, b.perms)
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
 * Method: solve mod two primes, rational reconstruction (Wang 1981) of each, require
 * agreement; if the single-prime reconstructions disagree, reconstruct from the CRT image
 * and check it against both primes.
 */
export function rewriteOperator(b: ClassBasis, target: string | AmplitudeTarget): RewriteResult {
  const sols = b.primes.map((pd, pi) => {
    const t = targetValues(b, pi, target)
    if (b.rank === 0) {
      if (t.some((v) => v !== 0)) throw new EngineConsistencyError('rewriteOperator', `class ${b.key} has rank 0 but the target does not vanish`)
      return []
    }
    try {
      return solve(pd.F, pd.keptRows, t)
    } catch (e) {
      if (e instanceof EngineInputError) throw new EngineInputError('rewriteOperator', `operator "${labelOf(target)}" is not in the span of class ${b.key}`)
      throw e
    }
  })
  const coeffs = sols[0]!.map((_, i) => reconstructPair(b, sols.map((s) => s[i]!)))
  return {
    coefficients: coeffs.map((c, i) => ({ operator: b.kept[i]!.text, coefficient: c })),
    vanishes: coeffs.every(isZero),
    text: coeffs.map((c, i) => (isZero(c) ? '' : `${ratString(c)}·(${b.kept[i]!.text})`)).filter(Boolean).join(' + ') || '0',
    note: b.note,
  }
}

function labelOf(t: string | AmplitudeTarget): string {
  return typeof t === 'string' ? t : t.label ?? 'custom amplitude'
}

function reconstructPair(b: ClassBasis, residues: number[]): Rational {
  const ps = b.primes.map((pd) => BigInt(pd.F.p))
  try {
    const qs = residues.map((r, i) => reconstructRational(BigInt(r), ps[i]!))
    if (qs.every((q) => ratEquals(q, qs[0]!))) return qs[0]!
  } catch { /* fall through to CRT */ }
  const { residue, modulus } = crt(residues.map(BigInt), ps)
  let q: Rational
  try {
    q = reconstructRational(residue, modulus)
  } catch {
    throw new EngineInputError('rewriteOperator', `class ${b.key}: a coefficient is not a small rational (residues ${residues.join(', ')} mod ${ps.join(', ')}); an amplitude with a factor i or huge coefficients cannot be reconstructed`)
  }
  b.primes.forEach((pd, i) => {
    if (pd.F.fromRational(q) !== residues[i]) throw new EngineConsistencyError('rewriteOperator', `reconstructed ${ratString(q)} does not match mod ${pd.F.p}`)
  })
  return q
}
