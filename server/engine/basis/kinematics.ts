/**
 * Random on-shell, momentum-conserving massless kinematics over F_p in spinor-helicity
 * variables. Conventions: p_i^{aȧ} = λ_i^a λ̃_i^ȧ, all momenta outgoing, Σ_i p_i = 0;
 * ⟨ij⟩ = λ_i^1 λ_j^2 − λ_i^2 λ_j^1 and [ij] = λ̃_i^1 λ̃_j^2 − λ̃_i^2 λ̃_j^1, so that
 * s_ij = (p_i + p_j)² = ⟨ij⟩[ij] up to the overall sign convention (we use s_ij = ⟨ij⟩[ji]).
 */
import { EngineConsistencyError } from '../errors'
import type { PrimeField } from '../finite/primeField'
import type { SeededRandom } from '../finite/rng'

export interface KinematicPoint {
  n: number
  lam: [number, number][]
  lamt: [number, number][]
  /** angle[i][j] = ⟨ij⟩ (antisymmetric), square[i][j] = [ij]. */
  angle: number[][]
  square: number[][]
}

function bracketTable(F: PrimeField, s: [number, number][]): number[][] {
  return s.map((a) => s.map((b) => F.sub(F.mul(a[0], b[1]), F.mul(a[1], b[0]))))
}

/** Solve x_u σ_u + x_v σ_v = K (2×2 matrix K^{aȧ}) for the partner spinors of legs u, v. */
function solvePair(F: PrimeField, su: [number, number], sv: [number, number], K: number[][]): [[number, number], [number, number]] {
  // su^a xu^ȧ + sv^a xv^ȧ = K^{aȧ}; contract with ε_{ab} sv^b: ⟨su sv⟩ xu^ȧ = ⟨K, sv⟩^ȧ.
  const d = F.sub(F.mul(su[0], sv[1]), F.mul(su[1], sv[0]))
  if (d === 0) throw new EngineConsistencyError('randomKinematics', 'degenerate spinors drawn; retry with another seed')
  const xu: [number, number] = [0, 0]
  const xv: [number, number] = [0, 0]
  for (const c of [0, 1] as const) {
    const kv = F.sub(F.mul(K[0]![c]!, sv[1]), F.mul(K[1]![c]!, sv[0]))
    const uk = F.sub(F.mul(su[0], K[1]![c]!), F.mul(su[1], K[0]![c]!))
    xu[c] = F.div(kv, d)
    xv[c] = F.div(uk, d)
  }
  return [xu, xv]
}

/**
 * A random on-shell point for n massless legs with Σ λ_i λ̃_i = 0.
 * For n ≥ 4 all λ_i and λ̃_1..λ̃_{n−2} are random and λ̃_{n−1}, λ̃_n are solved for.
 * For n = 3 real-momentum kinematics is degenerate: `branch` 'angle' keeps all λ generic
 * (so every [ij] = 0), 'square' keeps all λ̃ generic (so every ⟨ij⟩ = 0).
 * @example randomKinematics(F, rng, 4).angle[0][1] // some element of F_p; Σ p_i = 0 holds
 * Method: linear solve of momentum conservation for the last two legs.
 * Reference: Elvang & Huang, Scattering Amplitudes in Gauge Theory and Gravity (CUP 2015), ch. 2.
 */
export function randomKinematics(F: PrimeField, rng: SeededRandom, n: number, branch: 'angle' | 'square' = 'angle'): KinematicPoint {
  if (!Number.isInteger(n) || n < 3) throw new EngineConsistencyError('randomKinematics', `need at least 3 legs, got ${n}`)
  const rnd = (): [number, number] => [rng.nonZero(F.p), rng.nonZero(F.p)]
  const lam: [number, number][] = []
  const lamt: [number, number][] = []
  const free = n === 3 && branch === 'square' ? lamt : lam
  const solved = free === lam ? lamt : lam
  for (let i = 0; i < n; i++) free.push(rnd())
  for (let i = 0; i < n - 2; i++) solved.push(rnd())
  const K = [
    [0, 0],
    [0, 0],
  ]
  for (let i = 0; i < n - 2; i++) {
    for (const a of [0, 1])
      for (const b of [0, 1]) {
        K[a]![b] = F.sub(K[a]![b]!, F.mul(lam[i]![a]!, lamt[i]![b]!))
      }
  }
  const Kt =
    free === lam
      ? K
      : [
          [K[0]![0]!, K[1]![0]!],
          [K[0]![1]!, K[1]![1]!],
        ]
  const [xu, xv] = solvePair(F, free[n - 2]!, free[n - 1]!, Kt)
  solved.push(xu, xv)
  return { n, lam, lamt, angle: bracketTable(F, lam), square: bracketTable(F, lamt) }
}
