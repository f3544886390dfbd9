/**
 * Parity of the kept operators of a class.
 *
 * Convention: in spinor-helicity variables P swaps λ ↔ λ̃ and sends every leg to its
 * parity partner (parityPartners.ts). On a bracket monomial of a class C mapped to itself,
 * with the leg involution π:
 *   ⟨ij⟩ ↦ [π(i)π(j)],  [ij] ↦ ⟨π(i)π(j)⟩  (orientation kept: [ji] = −[ij]),
 * derivatives move with their leg, SU(N) slots of leg i ↦ the same slots of leg π(i); no
 * other factor. This is the action of ψ_D → η γ⁰ ψ_D with η = 1 on a Dirac pair (ψ_L, ψ_R)
 * and P² = 1 on every field: intrinsic phases cancel in a class mapped to itself as soon as
 * it conserves the fermion number of each Dirac pair; in a class that violates it by an odd
 * number of ψ_L ψ_R pairs, the Majorana-compatible choice η = ±i would flip every eigenvalue
 * (e.g. ψᵀCγ^μγ₅ψ ∂_μa b is P-even for η = 1: a polar vector). Per-bracket phases
 * (⟨ij⟩ ↦ ±[ij]) cancel: a class mapped to itself has as many angle as square brackets.
 *
 * Classes: P(C) = C gives an involution M on the kept operators; each kept operator that is
 * an eigenvector of M gets 'even' (+1) or 'odd' (−1), and the class counts P-even / P-odd
 * real parameters as f·(r ± tr M)/2 (f = 1 for self-conjugate classes, 2 otherwise).
 * Kept columns c ± P(c) (parityColumns.ts) are eigenvectors by construction; the others
 * (user-kept, or preferParity false) are imaged and solved for at the sample points.
 * P(C) = C̄ ≠ C: operators are paired with the conjugates of their images, rank even and
 * rank odd real parameters (O + P(O)† and i(O − P(O)†) combinations), operators null.
 * P(C) ∉ {C, C̄}: the pair of classes carries 2·realParameters; the class whose orbit
 * key (min of key and conjugate key) sorts first is credited with the P-even combinations
 * O + P(O), its image with the P-odd ones O − P(O); operators null.
 */
import { EngineConsistencyError } from '../errors'
import type { PrimeField } from '../finite/primeField'
import { solve } from '../finite/matrix'
import { agreedValue } from '../finite/agreement'
import type { Species } from '../theory/model'
import { conjugateClass, type OperatorClass } from './classKey'
import type { LorentzStructure } from './lorentzStructures'
import type { SuStructure } from './gaugeStructures'
import { combinationValues, type SamplePoint } from './evaluation'
import type { LegPermutation } from './symmetry'
import { parityImage, parityLegMap } from './parityPartners'

export type ParityValue = 'even' | 'odd' | null

export interface ClassParity {
  /** Key of the image class P(C); null where P is not defined. */
  imageKey: string | null
  /** Why P is undefined (null image), e.g. a chiral fermion without partner. */
  reason?: string
  /** How P acts: on the class itself, onto the conjugate class, onto another class. */
  kind: 'self' | 'conjugate' | 'pair' | 'undefined'
  /** Parity of each kept operator (null unless kind 'self' and an eigenvector). */
  operators: ParityValue[]
  /** P-even / P-odd real parameters for one flavor (null where P is undefined). */
  pEven: number | null
  pOdd: number | null
  /** For kind 'pair': whether this class carries the P-even or the P-odd combinations. */
  credit?: 'even' | 'odd'
}

/** A term of a kept column: lorentz × gauge with a coefficient per prime. */
export interface ParityTerm {
  coeff: number[]
  lorentz: LorentzStructure
  gauge: SuStructure[]
}

/**
 * Parity image of one bracket monomial: the mapped structure (pairs ordered i < j) and
 * the sign from the bracket orientations.
 * @example parityLorentz({derivs:[0,0,0,0],angle:[[0,3]],square:[[1,2]]}, [2,3,0,1])
 *   // { lorentz: {angle:[[0,3]], square:[[1,2]]}, sign: 1 } (⟨14⟩[23] ↦ [32]⟨41⟩ = ⟨14⟩[23])
 */
export function parityLorentz(l: LorentzStructure, pi: number[]): { lorentz: LorentzStructure; sign: number } {
  let sign = 1
  const map = ([i, j]: [number, number]): [number, number] => {
    const a = pi[i]!
    const b = pi[j]!
    if (a > b) sign = -sign
    return a < b ? [a, b] : [b, a]
  }
  const derivs = l.derivs.slice()
  l.derivs.forEach((d, i) => {
    derivs[pi[i]!] = d
  })
  return { lorentz: { derivs, angle: l.square.map(map), square: l.angle.map(map) }, sign }
}

/**
 * Parity image of an SU(N) contraction: each slot of leg i ↦ the slot of the same kind
 * (upper/lower) of leg π(i); ε blocks keep their order.
 * @example paritySu(δ(e1^i, e2_i), [2,3,0,1]) // δ(e3^i, e4_i)
 */
export function paritySu(s: SuStructure, pi: number[]): SuStructure {
  const mapSlot = (si: number): number => {
    const sl = s.slots[si]!
    const j = s.slots.findIndex((x) => x.leg === pi[sl.leg] && x.upper === sl.upper && x.box === sl.box)
    if (j < 0) throw new EngineConsistencyError('paritySu', `no parity slot for leg ${sl.leg} in ${s.group}`)
    return j
  }
  return { ...s, deltas: s.deltas.map(([u, l]) => [mapSlot(u), mapSlot(l)] as [number, number]), eps: s.eps.map((b) => b.map(mapSlot)) }
}

/** Values at the points of the parity image of a combination of terms (prime index pi). */
function imageValues(F: PrimeField, pIdx: number, terms: ParityTerm[], pi: number[], points: SamplePoint[], perms: LegPermutation[]): number[] {
  const img = terms.map((t) => {
    const { lorentz, sign } = parityLorentz(t.lorentz, pi)
    return { lorentz, gauge: t.gauge.map((s) => paritySu(s, pi)), coeff: F.mul(t.coeff[pIdx]!, F.from(sign)) }
  })
  return combinationValues(F, img, points, perms)
}

export interface ParityInput {
  cls: OperatorClass
  selfConjugate: boolean
  rank: number
  /** Kept columns; parityEigen when the eigenvalue is known by construction (parityColumns.ts). */
  kept: { terms: ParityTerm[]; parityEigen?: 1 | -1 }[]
  primes: { F: PrimeField; points: SamplePoint[]; keptRows: number[][] }[]
  perms: LegPermutation[]
}

/**
 * Parity of a class basis (conventions in the file header).
 * @example classParity(photonParticles, basis of "F_L^2 F_R^2") // { kind: 'self', operators: ['even'], pEven: 1, pOdd: 0 }
 * Method: structural image of each kept operator, expressed in the kept basis at the
 * sample points over two primes; the trace of the involution counts the eigenvalues.
 * Reference: Elvang & Huang, Scattering Amplitudes (CUP 2015), §2 (λ ↔ λ̃ under parity).
 */
export function classParity(particles: Species[], b: ParityInput): ClassParity {
  const { image, reason } = parityImage(particles, b.cls)
  const n = b.rank
  const none: ParityValue[] = b.kept.map(() => null)
  if (image === null) return { imageKey: null, reason, kind: 'undefined', operators: none, pEven: null, pOdd: null }
  const real = b.selfConjugate ? n : 2 * n
  const conj = conjugateClass(particles, b.cls)
  if (image.key === conj.key && image.key !== b.cls.key) return { imageKey: image.key, kind: 'conjugate', operators: none, pEven: n, pOdd: n }
  if (image.key !== b.cls.key) {
    const orbit = (c: OperatorClass): string => [c.key, conjugateClass(particles, c).key].sort()[0]!
    const first = orbit(b.cls) < orbit(image)
    return { imageKey: image.key, kind: 'pair', operators: none, pEven: first ? real : 0, pOdd: first ? 0 : real, credit: first ? 'even' : 'odd' }
  }
  const pi = parityLegMap(particles, b.cls)
  const mats = b.primes.map((pd, pIdx) =>
    b.kept.map((col, i) => {
      if (col.parityEigen) return b.kept.map((_, j) => (j !== i ? 0 : col.parityEigen === 1 ? 1 : pd.F.neg(1)))
      const vals = imageValues(pd.F, pIdx, col.terms, pi, pd.points, b.perms)
      try {
        return solve(pd.F, pd.keptRows, vals)
      } catch {
        throw new EngineConsistencyError('classParity', `class ${b.cls.key}: the parity image of a kept operator is not in the span of the class`)
      }
    }),
  )
  const fields = b.primes.map((pd) => pd.F)
  const ctx = { fn: 'classParity', about: `class ${b.cls.key}` }
  const trace = agreedValue(
    fields,
    mats.map((cols, k) => involutionTrace(fields[k]!, cols, b.cls.key)),
    ctx,
    'parity trace',
  )
  const f = b.selfConjugate ? 1 : 2
  const labels = mats.map((cols, k) => cols.map((col, i) => operatorParity(fields[k]!, col, i)))
  agreedValue(
    fields,
    labels.map((l) => l.join()),
    ctx,
    'parity of each kept operator',
  )
  const operators = labels[0]!
  return { imageKey: image.key, kind: 'self', operators, pEven: (f * (n + trace)) / 2, pOdd: (f * (n - trace)) / 2 }
}

/** Parity of kept operator i from its image (column col of M): definite only when P maps it to ±itself. */
function operatorParity(F: PrimeField, col: number[], i: number): ParityValue {
  if (col.some((x, j) => j !== i && x !== 0)) return null
  return col[i] === 1 ? 'even' : col[i] === F.neg(1) ? 'odd' : null
}

/** Trace of M (columns = images of kept operators) as an integer, after checking M² = 1. */
function involutionTrace(F: PrimeField, cols: number[][], key: string): number {
  const n = cols.length
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let s = 0
      for (let k = 0; k < n; k++) s = F.add(s, F.mul(cols[k]![j]!, cols[i]![k]!))
      if (s !== (i === j ? 1 : 0)) throw new EngineConsistencyError('classParity', `class ${key}: the parity map squares to ${s} ≠ ${i === j ? 1 : 0} at (${j}, ${i})`)
    }
  }
  const t = cols.reduce((s, c, i) => F.add(s, c[i]!), 0)
  return t <= n ? t : t - F.p
}
