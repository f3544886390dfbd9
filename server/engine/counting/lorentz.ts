/**
 * Lorentz part of the Hilbert-series integrand, for one cycle type of one field content.
 *
 * Conventions: the Lorentz group is SU(2)_l × SU(2)_r; a weight is (m_l, m_r) = (2 j_z^l,
 * 2 j_z^r); D counts derivatives (the mass dimension of the fields is kept apart).
 * Single-particle characters with the equations of motion removed (Henning, Lu, Melia,
 * Murayama, Commun. Math. Phys. 347 (2016) 363 and JHEP 08 (2017) 016, sect. 3):
 *   scalar       χ_S  = Σ_k D^k χ_(k/2, k/2)
 *   (1/2,0) Weyl χ_L  = Σ_k D^k χ_((k+1)/2, k/2)       (0,1/2): mirror
 *   (1,0) F_L    χ_FL = Σ_k D^k χ_((k+2)/2, k/2)       (0,1) F_R: mirror
 * A cycle of length c of the cycle index contributes χ(D^c; x^c, y^c) (Adams operation).
 * The momentum factor 1/P(D; x, y) = Π_{±,±} (1 − D x^{±1} y^{±1}) removes total derivatives.
 */
import { EngineConsistencyError, EngineInputError } from '../errors'
import type { LorentzType } from '../theory/model'

/** Dynkin labels (2j_l, 2j_r) of a species at zero derivatives. */
export const BASE_SPINS: Record<LorentzType, readonly [number, number]> = {
  S: [0, 0],
  L: [1, 0],
  R: [0, 1],
  FL: [2, 0],
  FR: [0, 2],
}

/** One factor of the integrand: a species Lorentz type raised as a cycle of length `cycle`. */
export interface LorentzFactor {
  type: LorentzType
  cycle: number
}

const LIMIT = 2 ** 52

/**
 * Coefficients of D^0..D^K of ∫ dμ_{SU(2)×SU(2)} (1/P) Π_i χ_{type_i}(D^{c_i}; x^{c_i}, y^{c_i}).
 * @example lorentzSingletSeries([{type:'S',cycle:1},{type:'S',cycle:1}], 2) // [1, 0, -1]; with the (2)-cycle term [1, 0, 1] the average gives Sym²: [1, 0, 0] (only φ²)
 * Method: dense weight arrays, factors multiplied one by one; weights too far from 0 to come
 * back with the remaining factors are dropped; the Haar measure keeps
 * f(0,0) − f(2,0) − f(0,2) + f(2,2) (Weyl integration formula, Fulton & Harris §26.2).
 */
export function lorentzSingletSeries(factors: readonly LorentzFactor[], K: number): number[] {
  if (!Number.isInteger(K) || K < 0 || K > 40)
    throw new EngineInputError('lorentzSingletSeries', `Operators with more than 40 derivatives are beyond the counting engine (here ${K}); lower the maximum dimension`)
  let reachL = K
  let reachR = K
  for (const f of factors) {
    if (!(f.type in BASE_SPINS) || !Number.isInteger(f.cycle) || f.cycle < 1) {
      throw new EngineConsistencyError('lorentzSingletSeries', `bad factor ${JSON.stringify(f)}`)
    }
    reachL += f.cycle * BASE_SPINS[f.type][0]
    reachR += f.cycle * BASE_SPINS[f.type][1]
  }
  let acc = new Grid(K, reachL + 2, reachR + 2)
  let spare = new Grid(K, reachL + 2, reachR + 2)
  acc.set(0, 0, 0, 1)
  let restL = reachL - K
  let restR = reachR - K
  // multiply the factors with the largest spins first: the truncation then bites earliest
  const order = [...factors].sort((a, b) => spinOf(b) - spinOf(a))
  for (const f of order) {
    restL -= f.cycle * BASE_SPINS[f.type][0]
    restR -= f.cycle * BASE_SPINS[f.type][1]
    multiplyFactor(acc, f, restL, restR, spare)
    ;[acc, spare] = [spare, acc]
  }
  return contractWithMomentum(acc)
}

function spinOf(f: LorentzFactor): number {
  return f.cycle * (BASE_SPINS[f.type][0] + BASE_SPINS[f.type][1])
}

/** Dense array over (D-degree, m_l, m_r). */
class Grid {
  readonly nl: number
  readonly nr: number
  readonly data: Float64Array
  constructor(
    readonly K: number,
    readonly wl: number,
    readonly wr: number,
  ) {
    this.nl = 2 * wl + 1
    this.nr = 2 * wr + 1
    this.data = new Float64Array((K + 1) * this.nl * this.nr)
  }
  index(d: number, ml: number, mr: number): number {
    return (d * this.nl + ml + this.wl) * this.nr + mr + this.wr
  }
  get(d: number, ml: number, mr: number): number {
    if (d < 0 || Math.abs(ml) > this.wl || Math.abs(mr) > this.wr) return 0
    return this.data[this.index(d, ml, mr)]!
  }
  set(d: number, ml: number, mr: number, v: number): void {
    this.data[this.index(d, ml, mr)] = v
  }
}

/**
 * out = acc × χ_type(D^c; x^c, y^c), keeping weights |m_l| <= 2 + restL + (K − d) (same for m_r):
 * anything farther cannot return to the weights the Haar measure reads.
 */
function multiplyFactor(acc: Grid, f: LorentzFactor, restL: number, restR: number, out: Grid): void {
  const K = acc.K
  const c = f.cycle
  const [a0, b0] = BASE_SPINS[f.type]
  const src = acc.data
  const dst = out.data
  dst.fill(0)
  for (let d = 0; d <= K; d++) {
    for (let il = 0; il < acc.nl; il++) {
      const rowBase = (d * acc.nl + il) * acc.nr
      for (let ir = 0; ir < acc.nr; ir++) {
        const v = src[rowBase + ir]!
        if (v === 0) continue
        const ml = il - acc.wl
        const mr = ir - acc.wr
        for (let k = 0; d + c * k <= K; k++) {
          const dn = d + c * k
          const capL = 2 + restL + (K - dn)
          const capR = 2 + restR + (K - dn)
          const A = a0 + k
          const B = b0 + k
          for (let p = -A; p <= A; p += 2) {
            const nl = ml + c * p
            if (nl > capL || nl < -capL) continue
            const base = (dn * out.nl + nl + out.wl) * out.nr + out.wr
            for (let q = -B; q <= B; q += 2) {
              const nr = mr + c * q
              if (nr > capR || nr < -capR) continue
              dst[base + nr]! += v
            }
          }
        }
      }
    }
  }
  checkRange(dst)
}

function checkRange(a: Float64Array): void {
  for (let i = 0; i < a.length; i++) {
    if (a[i]! > LIMIT || a[i]! < -LIMIT) {
      throw new EngineConsistencyError('lorentzSingletSeries', `multiplicity ${a[i]} beyond 2^52: exactness lost`)
    }
  }
}

/** Terms of 1/P = Π (1 − D x^{±1} y^{±1}): [degree, m_l, m_r, sign] (also used by goldstone/lorentzIntegral.ts). */
export const MOMENTUM_TERMS: ReadonlyArray<readonly [number, number, number, number]> = (() => {
  const vecs = [
    [1, 1],
    [1, -1],
    [-1, 1],
    [-1, -1],
  ] as const
  const out: [number, number, number, number][] = []
  for (let mask = 0; mask < 16; mask++) {
    let deg = 0,
      ml = 0,
      mr = 0
    for (let i = 0; i < 4; i++) {
      if (mask & (1 << i)) {
        deg++
        ml += vecs[i]![0]
        mr += vecs[i]![1]
      }
    }
    out.push([deg, ml, mr, deg % 2 === 0 ? 1 : -1])
  }
  return out
})()

/** Haar weights of SU(2)×SU(2) on a Weyl-symmetric function: f00 − f20 − f02 + f22. */
const HAAR: ReadonlyArray<readonly [number, number, number]> = [
  [0, 0, 1],
  [2, 0, -1],
  [0, 2, -1],
  [2, 2, 1],
]

function contractWithMomentum(acc: Grid): number[] {
  const out: number[] = []
  for (let d = 0; d <= acc.K; d++) {
    let s = 0
    for (const [hl, hr, hs] of HAAR) {
      for (const [deg, ml, mr, sign] of MOMENTUM_TERMS) s += hs * sign * acc.get(d - deg, hl - ml, hr - mr)
    }
    if (!Number.isSafeInteger(s)) throw new EngineConsistencyError('lorentzSingletSeries', `non-integer or unsafe coefficient ${s} at D^${d}`)
    out.push(s)
  }
  return out
}
