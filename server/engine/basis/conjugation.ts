/**
 * Structural conjugation of candidate operators within a self-conjugate class.
 */
import { EngineConsistencyError, EngineInputError } from '../errors'
import type { ClassBasis } from './classBasisTypes'
import type { OperatorClass } from './classKey'
import type { LorentzStructure } from './lorentzStructures'
import type { SuStructure } from './gaugeStructures'
import { combinationValues } from './evaluation'

/**
 * π: leg i of the class ↦ the leg holding its conjugate (blocks matched in order).
 * @example conjugateLegMap(class "H H*") // [1, 0]
 */
export function conjugateLegMap(c: OperatorClass): number[] {
  const used = new Set<number>()
  return c.legs.map((p) => {
    const j = c.legs.findIndex((q, idx) => q.label === p.conjugate && !used.has(idx))
    if (j < 0) throw new EngineInputError('conjugateLegMap', `The class ${c.key} is not its own conjugate (${p.label} has no partner), so "(X) + h.c." cannot be formed in it; write X alone`)
    used.add(j)
    return j
  })
}

const ord = (i: number, j: number): [number, number] => (i < j ? [i, j] : [j, i])

/**
 * Conjugate of a bracket monomial: ⟨ij⟩ → [π(i)π(j)], [ij] → ⟨π(i)π(j)⟩ (overall phases
 * are conventional and irrelevant for proportionality).
 * @example conjugateLorentz({derivs:[0,0],angle:[[0,1]],square:[]}, [1,0]) // square [[0,1]]
 */
export function conjugateLorentz(l: LorentzStructure, pi: number[]): LorentzStructure {
  const derivs = l.derivs.slice()
  l.derivs.forEach((d, i) => {
    derivs[pi[i]!] = d
  })
  return {
    derivs,
    angle: l.square.map(([i, j]) => ord(pi[i]!, pi[j]!)),
    square: l.angle.map(([i, j]) => ord(pi[i]!, pi[j]!)),
  }
}

/**
 * Conjugate of an SU(N) contraction: upper slot of leg i ↦ lower slot of leg π(i).
 * @example conjugateSu(δ(H^i, H*_i), [1, 0]) // δ(H^i, H*_i) again
 */
export function conjugateSu(s: SuStructure, pi: number[]): SuStructure {
  const find = (leg: number, upper: boolean, box: number | undefined): number => s.slots.findIndex((x) => x.leg === leg && x.upper === upper && x.box === box)
  const mapSlot = (si: number): number => {
    const sl = s.slots[si]!
    const j = find(pi[sl.leg]!, !sl.upper, sl.box)
    if (j < 0) throw new EngineConsistencyError('conjugateSu', `no conjugate slot for leg ${sl.leg} in ${s.group}`)
    return j
  }
  return {
    ...s,
    deltas: s.deltas.map(([u, l]) => [mapSlot(l), mapSlot(u)] as [number, number]),
    eps: s.eps.map((b) => b.map(mapSlot)),
  }
}

/**
 * Values (at the stored points of prime pi) of the conjugate of kept operator `col`.
 * @example conjugateColumnValues(basis of "H^3 H*^3", 0, 0) // equals the column itself (Hermitian)
 */
export function conjugateColumnValues(b: ClassBasis, pi: number, col: number): number[] {
  const pd = b.primes[pi]!
  const perm = conjugateLegMap(b.class)
  const terms = b.kept[col]!.terms.map((t) => ({
    lorentz: conjugateLorentz(t.lorentz, perm),
    gauge: t.gauge.map((s) => conjugateSu(s, perm)),
    coeff: t.coeff[pi]!,
  }))
  return combinationValues(pd.F, terms, pd.points, b.perms)
}
