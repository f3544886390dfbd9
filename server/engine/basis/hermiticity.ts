/**
 * Hermiticity of kept operators. An operator of a class C has its conjugate in the
 * conjugate class C̄; when C ≠ C̄ it is not Hermitian and carries 2 real parameters.
 * In a self-conjugate class the conjugate candidate is built structurally (⟨ij⟩ ↔ [π(i)π(j)],
 * fundamental ↔ antifundamental slots, π = leg ↦ conjugate leg) and expressed in the kept
 * basis; an operator is called Hermitian (up to a phase) when its conjugate is proportional
 * to itself.
 */
import type { ClassBasis } from './classBasis'
import { conjugateColumnValues } from './conjugation'

/**
 * Per kept operator: Hermitian up to a phase?
 * @example hermiticityOf(classBasis(smeft, "L^2 H^2")) // [false]
 */
export function hermiticityOf(b: ClassBasis): boolean[] {
  if (!b.selfConjugate) return b.kept.map(() => false)
  return b.kept.map((col, i) => {
    if (col.source === 'hermitian') return true
    const pd = b.primes[0]!
    const vals = conjugateColumnValues(b, 0, i)
    // Proportional to column i: vals = c · keptRows[·][i] for one c.
    let c: number | null = null
    for (let r = 0; r < vals.length; r++) {
      const a = pd.keptRows[r]![i]!
      const v = vals[r]!
      if (a === 0) {
        if (v !== 0) return false
        continue
      }
      const q = pd.F.div(v, a)
      if (c === null) c = q
      else if (c !== q) return false
    }
    return c !== null && c !== 0
  })
}
