/**
 * The classical solution of the lowest-order chiral Lagrangian L₂ = (F²/4)⟨u_μ u^μ + χ_+⟩ with
 * external legs, and the building blocks evaluated on it, as perturbiner expansions (graded.ts).
 *
 * Conventions (Bijnens, Colangelo, Ecker, Ann. Phys. 280 (2000) 100; F = 1): U = u², u = e^{iφ}
 * with φ traceless, u_μ = i[u†(∂_μ − i r_μ)u − u(∂_μ − i l_μ)u†],
 * Γ_μ = ½[u†(∂_μ − i r_μ)u + u(∂_μ − i l_μ)u†], ∇_μX = ∂_μX + [Γ_μ, X],
 * χ_± = u†χu† ± uχ†u, f_±μν = u F_Lμν u† ± u† F_Rμν u, F_Rμν = ∂_μr_ν − ∂_νr_μ − i[r_μ, r_ν].
 * Equation of motion: E = ∇_μu^μ − (i/2)(χ_− − ⟨χ_−⟩/N) = 0; its part linear in φ_S is
 * 2 k_S² φ_S, so each subset's field follows from the smaller ones: φ_S = −E_S|_{φ_S=0}/(2k_S²).
 * Goldstone legs carry φ_i = T_i (k_i² = 0); a source leg's φ_i is its linear response.
 * Every building block vanishes on the empty subset, so the full-set field (k = 0) never enters.
 * For a Goldstone leg j the complement of {j} is on shell (the LSZ pole); its field is set to
 * zero: it only meets the two-point part of an operator, which vanishes as (k_j²)² for the
 * operators of order p⁴ and higher, and a Lorentz-scalar X linear in an on-shell Goldstone field
 * vanishes, so EOM-proportional terms ⟨E X⟩ still drop out (amputated amplitudes).
 * Evaluated on this solution, ∫d⁴x O is the tree-level matrix element of O at first order, which
 * vanishes for total derivatives and for terms proportional to E: equal values ⇔ equal operators
 * modulo IBP and EOM (for enough random configurations).
 */
import { EngineConsistencyError } from '../../errors'
import type { PrimeField } from '../../finite/primeField'
import { GradedSpace, type GMat, type GScalar } from './graded'
import { dot, METRIC, type Config } from './kinematics'

/** The antisymmetric index pairs (μ < ν) in order; pairIndex[μ][ν] = position (or −1 − position for μ > ν). */
export const PAIRS: readonly (readonly [number, number])[] = [
  [0, 1],
  [0, 2],
  [0, 3],
  [1, 2],
  [1, 3],
  [2, 3],
]

export class ClassicalSolution {
  readonly space: GradedSpace
  readonly i: number
  /** i·k_{S,μ} per μ. */
  readonly derivative: Float64Array[]
  readonly phi: GMat
  u!: GMat
  ud!: GMat
  uMu!: GMat[]
  gamma!: GMat[]
  chiPlus!: GMat
  chiMinus!: GMat
  fPlus!: GMat[]
  fMinus!: GMat[]
  /** Source field strengths F_Lμν, F_Rμν in PAIRS order. */
  strengthL!: GMat[]
  strengthR!: GMat[]
  /** Sources as graded fields. */
  readonly l: GMat[]
  readonly r: GMat[]
  readonly chi: GMat
  readonly chiBar: GMat
  private readonly kSquared: number[]

  /** With `givenField`, the blocks are built on that φ instead of the solution (for tests of the EOM). */
  constructor(
    readonly F: PrimeField,
    readonly config: Config,
    givenField?: GMat,
  ) {
    const n = config.legs.length
    this.space = new GradedSpace(F, n, config.N)
    this.i = F.sqrtMinusOne()
    const sp = this.space
    const moms = Array.from({ length: sp.size }, (_, S) => {
      const k = [0, 0, 0, 0]
      config.legs.forEach((leg, j) => {
        if (S & (1 << j)) for (let m = 0; m < 4; m++) k[m] = F.add(k[m]!, leg.k[m]!)
      })
      return k
    })
    this.kSquared = moms.map((k) => dot(F, k, k))
    this.derivative = [0, 1, 2, 3].map((m) => Float64Array.from(moms, (k) => F.mul(this.i, k[m]!)))
    this.chi = sp.zero()
    this.chiBar = sp.zero()
    this.l = [0, 1, 2, 3].map(() => sp.zero())
    this.r = [0, 1, 2, 3].map(() => sp.zero())
    config.legs.forEach((leg, j) => {
      const o = (1 << j) * sp.nn
      if (leg.chi) {
        this.chi.set(leg.chi, o)
        this.chiBar.set(leg.chiBar!, o)
      }
      if (leg.tl) {
        for (let m = 0; m < 4; m++) {
          this.l[m]!.set(
            leg.tl!.map((x) => F.mul(x, leg.el![m]!)),
            o,
          )
          this.r[m]!.set(
            leg.tr!.map((x) => F.mul(x, leg.er![m]!)),
            o,
          )
        }
      }
    })
    this.phi = givenField ?? sp.zero()
    if (!givenField) this.solve()
    this.buildBlocks(n)
  }

  private exp(X: GMat, maxSize: number): GMat {
    const sp = this.space
    let term = sp.identity()
    let sum = sp.identity()
    for (let k = 1; k <= maxSize; k++) {
      term = sp.scale(this.F.inv(k), sp.mul(term, X, maxSize))
      sum = sp.add(sum, term)
    }
    return sum
  }

  /** u, u†, u_μ, Γ_μ, χ_± on subsets of at most maxSize legs. */
  private blocks(maxSize: number): void {
    const { F, space: sp } = this
    const iPhi = sp.scale(this.i, this.phi)
    this.u = this.exp(iPhi, maxSize)
    this.ud = this.exp(sp.scale(F.neg(1), iPhi), maxSize)
    const mul = (a: GMat, b: GMat) => sp.mul(a, b, maxSize)
    const minusI = F.neg(this.i)
    this.uMu = []
    this.gamma = []
    for (let m = 0; m < 4; m++) {
      const du = sp.weight(this.u, this.derivative[m]!)
      const dud = sp.weight(this.ud, this.derivative[m]!)
      const A = sp.add(mul(this.ud, du), sp.scale(minusI, mul(mul(this.ud, this.r[m]!), this.u)))
      const B = sp.add(mul(this.u, dud), sp.scale(minusI, mul(mul(this.u, this.l[m]!), this.ud)))
      this.uMu.push(sp.scale(this.i, sp.sub(A, B)))
      this.gamma.push(sp.scale(F.inv(2), sp.add(A, B)))
    }
    const a = mul(mul(this.ud, this.chi), this.ud)
    const b = mul(mul(this.u, this.chiBar), this.u)
    this.chiPlus = sp.add(a, b)
    this.chiMinus = sp.sub(a, b)
  }

  /** E = ∇_μ u^μ − (i/2)(χ_− − ⟨χ_−⟩/N), on subsets of at most maxSize legs. */
  equationOfMotion(maxSize: number): GMat {
    const { F, space: sp } = this
    let div = sp.zero()
    for (let m = 0; m < 4; m++) {
      const term = sp.add(sp.weight(this.uMu[m]!, this.derivative[m]!), sp.commutator(this.gamma[m]!, this.uMu[m]!, maxSize))
      div = METRIC[m] === 1 ? sp.add(div, term) : sp.sub(div, term)
    }
    const tr = sp.trace(this.chiMinus)
    const traceless = sp.sub(this.chiMinus, sp.scalarTimesIdentity(tr.map((t) => F.div(t, this.config.N)) as GScalar))
    return sp.sub(div, sp.scale(F.mul(this.i, F.inv(2)), traceless))
  }

  private solve(): void {
    const { F, space: sp, config } = this
    const n = config.legs.length
    for (let level = 1; level < n; level++) {
      this.blocks(level)
      const E = this.equationOfMotion(level)
      for (const S of sp.masksBySize[level]!) {
        const o = S * sp.nn
        const leg = level === 1 ? config.legs[Math.log2(S)]! : undefined
        if (leg?.kind === 'pion') {
          this.phi.set(leg.T!, o)
          continue
        }
        const missing = sp.size - 1 - S
        if (level === n - 1 && config.legs[Math.log2(missing)]!.kind === 'pion') continue
        const k2 = this.kSquared[S]!
        if (k2 === 0) throw new EngineConsistencyError('ClassicalSolution', 'a propagator 1/k² is singular at this configuration')
        const c = F.neg(F.inv(F.mul(2, k2)))
        for (let q = 0; q < sp.nn; q++) this.phi[o + q] = F.mul(c, E[o + q]!)
      }
    }
  }

  private buildBlocks(n: number): void {
    const sp = this.space
    this.blocks(n)
    const strength = (a: GMat[], m: number, v: number) => {
      const d = sp.sub(sp.weight(a[v]!, this.derivative[m]!), sp.weight(a[m]!, this.derivative[v]!))
      return sp.sub(d, sp.scale(this.i, sp.commutator(a[m]!, a[v]!)))
    }
    this.fPlus = []
    this.fMinus = []
    this.strengthL = PAIRS.map(([m, v]) => strength(this.l, m, v))
    this.strengthR = PAIRS.map(([m, v]) => strength(this.r, m, v))
    for (let q = 0; q < PAIRS.length; q++) {
      const L = sp.mul(sp.mul(this.u, this.strengthL[q]!), this.ud)
      const R = sp.mul(sp.mul(this.ud, this.strengthR[q]!), this.u)
      this.fPlus.push(sp.add(L, R))
      this.fMinus.push(sp.sub(L, R))
    }
  }
}
