/**
 * Lorentz part of the CP-twisted Hilbert series: ∫ over the parity coset of SU(2)_l × SU(2)_r.
 * Parity swaps the two factors; for g = (g_l, g_r) every trace on that coset depends only on
 * u = g_r g_l, which is Haar distributed on one SU(2), so the integral is an SU(2) integral in u
 * (characters are Laurent polynomials in y, the eigenvalues y^{±1} of u):
 * - a pair of conjugate species (a,b) ↔ (b,a) in a cycle of length c of (σg)² contributes
 *   Σ_k D^{2ck} χ_{a+k}(u^c) χ_{b+k}(u^c)  (each level k of the EOM-reduced tower, D → D² per swap);
 * - a real scalar (self-mapped) in a cycle of length c of σg contributes
 *   Σ_k D^{ck} χ_k(u^c) for odd c and Σ_k D^{ck} χ_k(u^{c/2})² for even c;
 * - the momentum factor is det(1 − D σg|vector) = (1 − Dy)(1 − D/y)(1 − D²) (parity has
 *   eigenvalues y, 1/y, 1, −1 on the vector);
 * - the Haar measure keeps f(y^0) − f(y^2).
 * Labels are 2j (Dynkin labels of SU(2)). Derivation: trace of an automorphism on invariants
 * as an integral over the non-identity coset (Weyl integration for disconnected groups), the
 * parity-twisted form of Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016, sect. 3.
 */
import { EngineConsistencyError, EngineInputError } from '../errors'

/** A pair of conjugate species in a cycle of (σg)², or a real scalar in a cycle of σg. */
export interface TwistedLorentzFactor {
  kind: 'pair' | 'self'
  /** 2j_l, 2j_r of the species at zero derivatives (for 'self' only [0, 0] occurs). */
  spins: readonly [number, number]
  cycle: number
}

/** Laurent polynomials in y per D-degree: grid[d].get(e) = coefficient of D^d y^e. */
type Grid = Map<number, number>[]

function add(m: Map<number, number>, e: number, v: number): void {
  const s = (m.get(e) ?? 0) + v
  if (!Number.isSafeInteger(s)) throw new EngineConsistencyError('cpLorentzSeries', `coefficient ${s} beyond 2^53`)
  if (s === 0) m.delete(e)
  else m.set(e, s)
}

/** χ_n(u^c) as exponent → coefficient: y^{c m}, m = −n, −n + 2, …, n. */
function character(n: number, c: number): Map<number, number> {
  const out = new Map<number, number>()
  for (let m = -n; m <= n; m += 2) add(out, c * m, 1)
  return out
}

function times(a: Map<number, number>, b: Map<number, number>): Map<number, number> {
  const out = new Map<number, number>()
  for (const [ea, va] of a) for (const [eb, vb] of b) add(out, ea + eb, va * vb)
  return out
}

function factorSeries(f: TwistedLorentzFactor, K: number): Grid {
  const g: Grid = Array.from({ length: K + 1 }, () => new Map())
  const c = f.cycle
  for (let k = 0; ; k++) {
    const deg = f.kind === 'pair' ? 2 * c * k : c * k
    if (deg > K) break
    const poly = f.kind === 'pair' ? times(character(f.spins[0] + k, c), character(f.spins[1] + k, c)) : c % 2 === 1 ? character(k, c) : times(character(k, c / 2), character(k, c / 2))
    for (const [e, v] of poly) add(g[deg]!, e, v)
  }
  return g
}

function multiply(a: Grid, b: Grid, K: number): Grid {
  const out: Grid = Array.from({ length: K + 1 }, () => new Map())
  for (let i = 0; i <= K; i++) {
    for (let j = 0; i + j <= K; j++) {
      if (a[i]!.size === 0 || b[j]!.size === 0) continue
      for (const [e, v] of times(a[i]!, b[j]!)) add(out[i + j]!, e, v)
    }
  }
  return out
}

/** (1 − Dy)(1 − D/y)(1 − D²): D^0: 1; D^1: −y − 1/y; D^2: 1 − 1 = 0 (y^0); D^3: y + 1/y; D^4: −1. */
function momentum(K: number): Grid {
  const g: Grid = Array.from({ length: K + 1 }, () => new Map())
  const terms: [number, number, number][] = [
    [0, 0, 1],
    [1, 1, -1],
    [1, -1, -1],
    [3, 1, 1],
    [3, -1, 1],
    [4, 0, -1],
  ]
  for (const [d, e, v] of terms) if (d <= K) add(g[d]!, e, v)
  return g
}

/**
 * Coefficients of D^0..D^K of the parity-twisted Lorentz integral of the given factors.
 * @example cpLorentzSeries([{ kind: 'pair', spins: [1, 0], cycle: 1 }, { kind: 'pair', spins: [0, 0], cycle: 1 }], 1) // [0, -1]: ψ ψ* H H* D
 */
export function cpLorentzSeries(factors: readonly TwistedLorentzFactor[], K: number): number[] {
  if (!Number.isInteger(K) || K < 0 || K > 40) throw new EngineInputError('cpLorentzSeries', `derivative order K must be 0..40, got ${K}`)
  let acc = momentum(K)
  for (const f of factors) {
    if (!Number.isInteger(f.cycle) || f.cycle < 1) throw new EngineInputError('cpLorentzSeries', `bad factor ${JSON.stringify(f)}`)
    acc = multiply(acc, factorSeries(f, K), K)
  }
  return acc.map((m) => (m.get(0) ?? 0) - (m.get(2) ?? 0))
}
