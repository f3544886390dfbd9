/**
 * Lorentz and SU(N) building blocks of Feynman rules over F_p, free of the imaginary unit.
 *
 * A vector index is carried in bispinor components V_{aȧ} = V_μ σ^μ_{aȧ} (slot value 2a+ȧ),
 * contracted with G = ½ ε^{ab} ε^{ȧḃ}, so that V·V = det V_{aȧ} (the Minkowski square).
 * A Dirac index (Weyl basis) is 0,1 for the undotted lower ψ_α and 2,3 for the dotted upper
 * χ̄^α̇; V̸ = [[0, V_{αβ̇}], [V̄^{α̇β}, 0]] with V̄^{α̇β} = ε^{α̇γ̇} ε^{βδ} V_{δγ̇}.
 * An adjoint index of SU(N) is a matrix entry X^k_l (slot value kN+l) of X = X^A T^A,
 * contracted with M = 2 δ_{kn} δ_{lm} (Σ_A X^A Y^A = 2 tr XY), with tr T^A T^B = ½ δ^{AB}.
 * Factors of i (σ^{μν} = (i/2)[γ^μ, γ^ν], f^{ABC} = −2i tr([T^A, T^B] T^C), ∂_μ → i p_μ,
 * F̃ = ∓i F on the two helicities) are counted apart by the caller.
 * Reference: Dreiner, Haber, Martin, Phys. Rept. 494 (2010) 1 (two-component spinors).
 */
import type { PrimeField } from '../finite/primeField'

/** ε with ε^{12} = +1 (the same array serves for upper and lower indices). */
export const EPS = [
  [0, 1],
  [-1, 0],
]

/** Metric G_{vw} on bispinor components (v = 2a + ȧ). */
export function vectorMetric(v: number, w: number): number {
  return (EPS[v >> 1]![w >> 1]! * EPS[v & 1]![w & 1]!) / 2
}

/** V̸ at the basis vector with component v = 1 (others 0): entry [d][e]. */
function slashBasis(v: number, d: number, e: number): number {
  const a = v >> 1
  const ad = v & 1
  if (d < 2 && e >= 2) return d === a && e - 2 === ad ? 1 : 0
  if (d >= 2 && e < 2) return EPS[d - 2]![ad]! * EPS[e]![a]!
  return 0
}

/**
 * γ with a component-type vector slot: Σ_{vw} G_{vw} V_v Γ_w = V̸. Since G⁻¹ = 2 ε⊗ε.
 * @example gammaEntry(0, 0, 3) // 2·ε⊗ε applied to the basis slash matrices
 */
export function gammaEntry(w: number, d: number, e: number): number {
  let s = 0
  for (let v = 0; v < 4; v++) {
    const inv = 2 * EPS[w >> 1]![v >> 1]! * EPS[w & 1]![v & 1]!
    if (inv !== 0) s += inv * slashBasis(v, d, e)
  }
  return s
}

/** ½[γ_v, γ_w] entry [d][e] (σ^{μν} without its i). */
export function sigmaEntry(v: number, w: number, d: number, e: number): number {
  let s = 0
  for (let m = 0; m < 4; m++) s += gammaEntry(v, d, m) * gammaEntry(w, m, e) - gammaEntry(w, d, m) * gammaEntry(v, m, e)
  return s / 2
}

/** γ_5 = diag(−1, −1, 1, 1), so that P_L = (1 − γ_5)/2 keeps the undotted ψ_α. */
export function gamma5Entry(d: number, e: number): number {
  return d !== e ? 0 : d < 2 ? -1 : 1
}

/** C = diag(ε, ε): ψ^T C χ = ψ_α ε^{αβ} χ_β for two left-handed spinors. */
export function chargeEntry(d: number, e: number): number {
  if (d < 2 !== e < 2) return 0
  return EPS[d & 1]![e & 1]!
}

/** Raise a two-component spinor: s^a = ε^{ab} s_b. */
export function raise(F: PrimeField, s: [number, number]): [number, number] {
  return [s[1], F.neg(s[0])]
}

/**
 * Dirac wave-function of a fermion leg: a column (unconjugated field) or a row (a barred field).
 * angleSpinor: the leg carries λ (species of type L), else λ̃ (type R).
 * Column L: (λ_α, 0); column R: (0, ε λ̃); row of type R (ψ̄ of a left field): (0, λ̃_α̇);
 * row of type L (χ̄ of a right field): (ε λ, 0). A transposed field is its column read as a row.
 */
export function diracWave(F: PrimeField, spinor: [number, number], angleSpinor: boolean, row: boolean): number[] {
  const raised = raise(F, spinor)
  if (angleSpinor) return row ? [raised[0], raised[1], 0, 0] : [spinor[0], spinor[1], 0, 0]
  return row ? [0, 0, spinor[0], spinor[1]] : [0, 0, raised[0], raised[1]]
}

/** Generator T^A with an adjoint slot (k,l) as a matrix [r][s]: ½(δ_{rl} δ_{ks} − δ_{kl} δ_{rs}/N). */
export function generatorEntry(F: PrimeField, n: number, a: number, r: number, s: number): number {
  const k = Math.floor(a / n)
  const l = a % n
  let v = (r === l && k === s ? 1 : 0) * n - (k === l && r === s ? 1 : 0)
  v = ((v % F.p) + F.p) % F.p
  return F.div(v, F.from(2 * n))
}

/** Adjoint metric M_{(k,l)(m,n)} = 2 δ_{kn} δ_{lm}. */
export function adjointMetric(n: number, a: number, b: number): number {
  return Math.floor(a / n) === b % n && a % n === Math.floor(b / n) ? 2 : 0
}

/**
 * f (without −2i… see above: −¼ of the two cyclic δ chains with a minus) and d (+¼ with a plus) on three adjoint slots.
 * fc_{(k1l1)(k2l2)(k3l3)} = ∓¼(δ_{k1l2}δ_{k2l3}δ_{k3l1} ∓ δ_{k2l1}δ_{k1l3}δ_{k3l2}), so that with M on every
 * slot f^{ABC} X^A Y^B Z^C = −2 tr([X,Y]Z) and d^{ABC} X^A Y^B Z^C = 2 tr({X,Y}Z).
 */
export function structureEntry(F: PrimeField, which: 'f' | 'd', n: number, a: number, b: number, c: number): number {
  const [k1, l1, k2, l2, k3, l3] = [Math.floor(a / n), a % n, Math.floor(b / n), b % n, Math.floor(c / n), c % n]
  const one = k1 === l2 && k2 === l3 && k3 === l1 ? 1 : 0
  const two = k2 === l1 && k1 === l3 && k3 === l2 ? 1 : 0
  const v = which === 'f' ? two - one : one + two
  return F.div(F.from(v), F.from(4))
}

/** Levi-Civita symbol of n indices (ε_{12…n} = +1). */
export function leviEntry(idx: number[]): number {
  for (let i = 0; i < idx.length; i++) for (let j = i + 1; j < idx.length; j++) if (idx[i] === idx[j]) return 0
  let s = 1
  for (let i = 0; i < idx.length; i++) for (let j = i + 1; j < idx.length; j++) if (idx[i]! > idx[j]!) s = -s
  return s
}
