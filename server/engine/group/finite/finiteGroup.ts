/**
 * Class functions of the finite flavour groups: products, Adams operations, the group
 * average (the conjugacy-class sum that replaces the Haar integral), reality indicators and
 * tensor-product decompositions. Exact (Eisenstein integers).
 */
import { EngineConsistencyError, EngineInputError } from '../../errors'
import { type Eis, E0, eAdd, eConj, eEqual, eMul, eScale, eText } from '../../../../shared/physics/finite/eisenstein'
import { FINITE_GROUPS, type FiniteGroupTable, type FiniteKind } from '../../../../shared/physics/finite/tables'
import { irrepIndicator } from '../../../../shared/physics/groupReps'

/** A class function: one value per conjugacy class (order of table.classes). */
export type ClassFunction = Eis[]

/** The table of a finite group kind. */
export function finiteGroup(kind: FiniteKind): FiniteGroupTable {
  const t = FINITE_GROUPS[kind]
  if (!t) throw new EngineInputError('finiteGroup', `unknown finite group "${kind}"; known: ${Object.keys(FINITE_GROUPS).join(', ')}`)
  return t
}

/**
 * Index of the irrep named `name`.
 * @example irrepIndex(finiteGroup('A4'), "1'") // 1
 */
export function irrepIndex(t: FiniteGroupTable, name: string): number {
  const i = t.irreps.findIndex((r) => r.name === name)
  if (i < 0) throw new EngineInputError('irrepIndex', `${t.label} has no irrep "${name}"; its irreps are ${t.irreps.map((r) => r.name).join(', ')}`)
  return i
}

/** Pointwise product of class functions. */
export function classProduct(a: ClassFunction, b: ClassFunction): ClassFunction {
  return a.map((x, c) => eMul(x, b[c]!))
}

/**
 * Adams operation ψ^r f(g) = f(g^r) through the power maps.
 * @example adamsClass(finiteGroup('A4'), chi of 1', 2) // chi of 1''
 */
export function adamsClass(t: FiniteGroupTable, f: ClassFunction, r: number): ClassFunction {
  if (!Number.isSafeInteger(r) || r < 1) throw new EngineInputError('adamsClass', `Adams power r must be a positive integer, got ${r}`)
  return t.classes.map((cl) => f[cl.powers[r % cl.order]!]!)
}

/**
 * Group average (1/|G|) Σ_g f(g) = (1/|G|) Σ_classes |C| f(C): the number of singlets of a
 * (virtual) character; must be an integer.
 * @example classAverage(finiteGroup('S3'), chi of 2 squared) // 1
 * Reference: James & Liebeck, Representations and Characters of Groups, Thm 14.12.
 */
export function classAverage(t: FiniteGroupTable, f: ClassFunction): number {
  let s: Eis = E0
  t.classes.forEach((cl, c) => {
    s = eAdd(s, eScale(cl.size, f[c]!))
  })
  if (s[1] !== 0 || s[0] % t.order !== 0) throw new EngineConsistencyError('classAverage', `${t.label}: class sum ${eText(s)} is not a multiple of the order ${t.order}`)
  return s[0] / t.order
}

/** Multiplicity of irrep i in the class function f: ⟨f, χ_i⟩. */
export function irrepMultiplicity(t: FiniteGroupTable, f: ClassFunction, i: number): number {
  return classAverage(t, classProduct(f, t.irreps[i]!.chi.map(eConj)))
}

/**
 * Irreps in a ⊗ b (name → multiplicity).
 * @example finiteTensorProduct('A4', '3', '3') // {"1":1,"1'":1,"1''":1,"3":2}
 */
export function finiteTensorProduct(kind: FiniteKind, a: string, b: string): Map<string, number> {
  const t = finiteGroup(kind)
  const f = classProduct(t.irreps[irrepIndex(t, a)]!.chi, t.irreps[irrepIndex(t, b)]!.chi)
  const out = new Map<string, number>()
  t.irreps.forEach((r, i) => {
    const m = irrepMultiplicity(t, f, i)
    if (m !== 0) out.set(r.name, m)
  })
  return out
}

/**
 * Frobenius–Schur indicator (1/|G|) Σ_g χ(g²): +1 real, −1 pseudoreal, 0 complex.
 * @example finiteReality('Tprime', '2') // 'pseudoreal'
 * Reference: James & Liebeck, Thm 23.16.
 */
export function finiteReality(kind: FiniteKind, name: string): 'real' | 'pseudoreal' | 'complex' {
  const t = finiteGroup(kind)
  return irrepIndicator(t, irrepIndex(t, name))
}

/**
 * Index of the complex-conjugate irrep.
 * @example finiteConjugate(finiteGroup('A4'), 1) // 2 (1' ↔ 1'')
 */
export function finiteConjugate(t: FiniteGroupTable, i: number): number {
  const bar = t.irreps[i]!.chi.map(eConj)
  const j = t.irreps.findIndex((r) => r.chi.every((x, c) => eEqual(x, bar[c]!)))
  if (j < 0) throw new EngineConsistencyError('finiteConjugate', `${t.label}: no conjugate of ${t.irreps[i]!.name}`)
  return j
}

/** Dimension χ(e) of irrep i. */
export function finiteDimension(t: FiniteGroupTable, i: number): number {
  return t.irreps[i]!.chi[0]![0]
}
