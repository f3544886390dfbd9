/**
 * Facts of an irrep of any non-abelian group kind of the theory file that the schema checks on
 * the client and the server: dimension and reality (Frobenius–Schur indicator). Pure and
 * unchecked, like ./suIrrep.ts: callers pass labels of the right length or a known irrep name
 * (the engine's group/representation.ts validates first and delegates here).
 */
import { weylDimension, irrepReality } from './suIrrep'
import { RootSystem } from './lie/rootSystem'
import { type Eis, E0, eAdd, eScale } from './finite/eisenstein'
import { FINITE_GROUPS, type FiniteGroupTable, type FiniteKind } from './finite/tables'

export type RepValue = readonly number[] | string
export type Reality = 'real' | 'pseudoreal' | 'complex'
export type SimpleKind = 'SU' | 'SO' | 'Sp' | 'G2' | 'F4' | 'E6' | 'E7' | 'E8'

const isFinite = (kind: string): kind is FiniteKind => kind in FINITE_GROUPS

/**
 * Root system of a simple group kind (unchecked n): SU(n) = A_{n−1}, SO(2k+1) = B_k,
 * Sp(2k) = C_k, SO(2k) = D_k, and the exceptional ones by name.
 * @example simpleRootSystem('SO', 10).type // 'D'
 */
export function simpleRootSystem(kind: SimpleKind, n?: number): RootSystem {
  if (kind === 'G2' || kind === 'F4' || kind === 'E6' || kind === 'E7' || kind === 'E8') return RootSystem.of(kind[0] as 'G' | 'F' | 'E', Number(kind[1]))
  if (kind === 'SU') return RootSystem.of('A', n! - 1)
  if (kind === 'Sp') return RootSystem.of('C', n! / 2)
  return n! % 2 === 1 ? RootSystem.of('B', (n! - 1) / 2) : RootSystem.of('D', n! / 2)
}

/**
 * Weyl dimension formula dim V_λ = Π_{α>0} (λ + ρ, α^∨)/(ρ, α^∨), exact.
 * @example weylDimensionOf(RootSystem.of('E', 6), [1, 0, 0, 0, 0, 0]) // 27n
 * Reference: Humphreys, Introduction to Lie Algebras, §24.3; Slansky, Phys. Rep. 79 (1981) 1, eq. (4.7).
 */
export function weylDimensionOf(rs: RootSystem, labels: readonly number[]): bigint {
  let num = 1n
  let den = 1n
  for (const a of rs.positive) {
    // (λ, α^∨) = Σ_i c_i (d_i / d_α) λ_i with α = Σ c_i α_i; the factor 1/d_α cancels in the ratio.
    let top = 0
    let bottom = 0
    a.coeffs.forEach((c, i) => {
      top += c * rs.half[i]! * (labels[i]! + 1)
      bottom += c * rs.half[i]!
    })
    num *= BigInt(top)
    den *= BigInt(bottom)
  }
  return num / den
}

/**
 * Highest weight −w0(λ) of the conjugate irrep.
 * @example conjugateLabels(RootSystem.of('E', 6), [1, 0, 0, 0, 0, 0]) // [0,0,0,0,0,1] (27 → 27̄)
 * Reference: Slansky, Phys. Rep. 79 (1981) 1, §4 (the lowest weight is w0 λ).
 */
export function conjugateLabels(rs: RootSystem, labels: readonly number[]): number[] {
  return rs.antidominantOf(labels).map((x) => 0 - x)
}

/**
 * Reality of an irrep: 'complex' unless self-conjugate; then the Frobenius–Schur indicator
 * (−1)^{⟨λ, 2ρ^∨⟩}: 'real' (+1) or 'pseudoreal' (−1).
 * Reference: Bourbaki, Lie Groups and Lie Algebras, ch. VIII §7.5 Prop. 12; Slansky, Table 11.
 */
export function labelsReality(rs: RootSystem, labels: readonly number[]): Reality {
  const conj = conjugateLabels(rs, labels)
  if (conj.some((x, i) => x !== labels[i])) return 'complex'
  // ⟨λ, α^∨⟩ = Σ_i c_i (d_i / d_α) λ_i summed over the positive roots α = Σ c_i α_i.
  let twice = 0
  for (const a of rs.positive) {
    let s = 0
    a.coeffs.forEach((c, i) => {
      s += c * rs.half[i]! * labels[i]!
    })
    twice += s / a.half
  }
  return Math.round(twice) % 2 === 0 ? 'real' : 'pseudoreal'
}

/**
 * Frobenius–Schur indicator (1/|G|) Σ_g χ(g²) of irrep i of a finite group: +1 real,
 * −1 pseudoreal, 0 complex. Throws when the class sum is not a multiple of |G| (a wrong table).
 * Reference: James & Liebeck, Representations and Characters of Groups, Thm 23.16.
 */
export function irrepIndicator(t: FiniteGroupTable, i: number): Reality {
  const chi = t.irreps[i]!.chi
  let s: Eis = E0
  t.classes.forEach((cl) => {
    s = eAdd(s, eScale(cl.size, chi[cl.powers[2 % cl.order]!]!))
  })
  if (s[1] !== 0 || s[0] % t.order !== 0) throw new Error(`irrepIndicator: ${t.label}: class sum is not a multiple of the order ${t.order}`)
  const nu = s[0] / t.order
  return nu === 1 ? 'real' : nu === -1 ? 'pseudoreal' : 'complex'
}

/**
 * Dimension of a representation (exact).
 * @example repDimensionOf('SO', 10, [0, 0, 0, 0, 1]) // 16n
 */
export function repDimensionOf(kind: string, n: number | undefined, rep: RepValue): bigint {
  if (isFinite(kind)) {
    const t = FINITE_GROUPS[kind]
    return BigInt(t.irreps.find((r) => r.name === rep)!.chi[0]![0])
  }
  const labels = rep as readonly number[]
  if (kind === 'SU') return weylDimension(n!, labels)
  return weylDimensionOf(simpleRootSystem(kind as SimpleKind, n), labels)
}

/**
 * Reality (Frobenius–Schur indicator) of a representation.
 * @example repRealityOf('Tprime', undefined, '2') // 'pseudoreal'
 */
export function repRealityOf(kind: string, n: number | undefined, rep: RepValue): Reality {
  if (isFinite(kind)) {
    const t = FINITE_GROUPS[kind]
    return irrepIndicator(
      t,
      t.irreps.findIndex((r) => r.name === rep),
    )
  }
  const labels = rep as readonly number[]
  if (kind === 'SU') return irrepReality(n!, labels)
  return labelsReality(simpleRootSystem(kind as SimpleKind, n), labels)
}
