/**
 * The numerical flow of the inverse couplings y (x_a = 1/α_a per simple group, the matrix
 * X = α⁻¹ of the U(1)s by pairs k ≤ l) from exact β coefficients, and the conversions between
 * y and the couplings a physicist reads: α per group and the kinetic mixing ε per pair of U(1)s.
 *
 * Kinetic mixing convention: with canonically normalised field strengths,
 * L ⊃ −¼ F_k F_k − ¼ F_l F_l − (ε_kl/2) F_k F_l and covariant derivative Σ_k g_k Q_k A_k; then
 * X_kk = 4π/g_k² = 1/α_k and X_kl = ε_kl/√(α_k α_l).
 */
import { rationalToNumber } from '../../scales/decimal'
import type { OdeSystem } from '../odeSystem'
import type { GaugeBetaCoefficients } from './betaCoefficients'

export interface SlotLayout {
  /** Group names in theory order (the diagonal slots). */
  groups: string[]
  /** Per diagonal slot: its U(1) position, or −1 for a simple group. */
  abelianAt: number[]
  /** U(1) names, and the slot index of the pair (k, l) (k ≤ l, symmetric). */
  abelian: string[]
  pairSlot: number[][]
  size: number
}

/** How the slots of a set of coefficients sit in the state vector. @example slotLayout(smCoefficients).abelian // ['Y'] */
export function slotLayout(c: GaugeBetaCoefficients): SlotLayout {
  const diagonal = c.slots.filter((s) => s.groups.length === 1 || s.groups[0] === s.groups[1])
  const abelian = diagonal.filter((s) => s.abelian).map((s) => s.groups[0])
  const pairSlot = abelian.map(() => new Array<number>(abelian.length).fill(-1))
  c.slots.forEach((s, i) => {
    if (!s.abelian) return
    const k = abelian.indexOf(s.groups[0])
    const l = abelian.indexOf(s.groups[1]!)
    pairSlot[k]![l] = i
    pairSlot[l]![k] = i
  })
  const groups = diagonal.map((s) => s.groups[0])
  return { groups, abelianAt: diagonal.map((s) => (s.abelian ? abelian.indexOf(s.groups[0]) : -1)), abelian, pairSlot, size: c.slots.length }
}

/**
 * Inverse of a symmetric positive-definite n×n matrix (row-major), or null when it is not
 * positive definite. Method: Cholesky factorisation (common practice).
 */
export function inverseSpd(a: Float64Array, n: number): Float64Array | null {
  const l = new Float64Array(n * n)
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let s = a[i * n + j]!
      for (let k = 0; k < j; k++) s -= l[i * n + k]! * l[j * n + k]!
      if (i === j) {
        if (!(s > 0)) return null
        l[i * n + i] = Math.sqrt(s)
      } else l[i * n + j] = s / l[j * n + j]!
    }
  }
  const inv = new Float64Array(n * n)
  for (let col = 0; col < n; col++) {
    const z = new Float64Array(n)
    for (let i = 0; i < n; i++) {
      let s = i === col ? 1 : 0
      for (let k = 0; k < i; k++) s -= l[i * n + k]! * z[k]!
      z[i] = s / l[i * n + i]!
    }
    for (let i = n - 1; i >= 0; i--) {
      let s = z[i]!
      for (let k = i + 1; k < n; k++) s -= l[k * n + i]! * inv[k * n + col]!
      inv[i * n + col] = s / l[i * n + i]!
    }
  }
  return inv
}

/** The U(1) block X of the state, n×n row-major. */
function abelianBlock(layout: SlotLayout, y: Float64Array): Float64Array {
  const n = layout.abelian.length
  const x = new Float64Array(n * n)
  for (let k = 0; k < n; k++) for (let l = 0; l < n; l++) x[k * n + l] = y[layout.pairSlot[k]![l]!]!
  return x
}

/**
 * The couplings α_c of every slot at state y (α_a = 1/x_a; α_kl = (X⁻¹)_kl), or null when the
 * U(1) block has left the positive-definite range (a Landau pole of a combination of U(1)s).
 */
export function slotAlphas(layout: SlotLayout, y: Float64Array): Float64Array | null {
  const alpha = new Float64Array(layout.size)
  const n = layout.abelian.length
  const a = n > 0 ? inverseSpd(abelianBlock(layout, y), n) : new Float64Array(0)
  if (!a) return null
  layout.abelianAt.forEach((k, i) => {
    if (k < 0) alpha[i] = 1 / y[i]!
  })
  for (let k = 0; k < n; k++) for (let l = k; l < n; l++) alpha[layout.pairSlot[k]![l]!] = a[k * n + l]!
  return alpha
}

/**
 * dy/d ln μ = −(1/2π)[b + (1/4π) B α(y)] (two loops) or −b/2π (one loop), with the exact
 * coefficients turned into doubles once.
 * @example gaugeFlow(qedCoefficients, 1) // writes −(4/3)/2π for one Dirac fermion of charge 1
 * Method: see betaCoefficients.ts for the convention; α(y) from slotAlphas.
 * Reference: Machacek & Vaughn, Nucl. Phys. B 222 (1983) 83.
 */
export function gaugeFlow(c: GaugeBetaCoefficients, loops: 1 | 2): OdeSystem {
  const layout = slotLayout(c)
  const b = c.oneLoop.map(rationalToNumber)
  const B = c.twoLoop.map((row) => row.map(rationalToNumber))
  const twoPi = 2 * Math.PI
  const fourPi = 4 * Math.PI
  return (y, out) => {
    const alpha = loops === 2 ? slotAlphas(layout, y) : null
    for (let i = 0; i < layout.size; i++) {
      let s = b[i]!
      if (alpha) {
        const row = B[i]!
        let t = 0
        for (let j = 0; j < layout.size; j++) t += row[j]! * alpha[j]!
        s += t / fourPi
      } else if (loops === 2) s = Number.NaN
      out[i] = -s / twoPi
    }
  }
}

/**
 * Margins of perturbativity per group (theory order): 1/α − 1/(4π), positive while g < 4π.
 * For a U(1), α is the diagonal entry of the coupling matrix (the strength felt by a unit
 * charge of that group alone, mixing included); the margin is −1 beyond a Landau pole.
 */
export function perturbativeMargins(layout: SlotLayout): (y: Float64Array) => number[] {
  const limit = 1 / (4 * Math.PI)
  return (y) => {
    const alpha = slotAlphas(layout, y)
    return layout.groups.map((_, i) => {
      if (!alpha) return -1
      const k = layout.abelianAt[i]!
      const a = k < 0 ? alpha[i]! : alpha[layout.pairSlot[k]![k]!]!
      return a > 0 ? 1 / a - limit : -1
    })
  }
}
