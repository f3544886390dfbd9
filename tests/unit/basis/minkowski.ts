/**
 * Test helper, independent of the spinor-bracket machinery: photon field strengths as 4×4
 * Minkowski tensors over F_p (p ≡ 1 mod 4 so that i exists), from momenta and polarisation
 * vectors, with metric diag(1,−1,−1,−1) and ε^{0123} = +1.
 * Bispinor ↔ vector: x^{aȧ} = x^0 + x^k σ^k (Pauli), so x^0 = (x11+x22)/2, x^3 = (x11−x22)/2,
 * x^1 = (x12+x21)/2, x^2 = (x21−x12)/(2i).  (Dreiner, Haber & Martin, Phys. Rep. 494 (2010) 1.)
 */
import type { PrimeField } from '../../../server/engine/finite/primeField'
import type { KinematicPoint } from '../../../server/engine/basis/kinematics'

export type Vec = number[]
export type Tensor = number[][]

export function toMinkowski(F: PrimeField, b: number[][]): Vec {
  const i = F.sqrtMinusOne()
  const half = F.inv(2)
  return [F.mul(half, F.add(b[0]![0]!, b[1]![1]!)), F.mul(half, F.add(b[0]![1]!, b[1]![0]!)), F.div(F.mul(half, F.sub(b[1]![0]!, b[0]![1]!)), i), F.mul(half, F.sub(b[0]![0]!, b[1]![1]!))]
}

const outer = (F: PrimeField, a: number[], b: number[]): number[][] => a.map((x) => b.map((y) => F.mul(x, y)))

/** F^{μν} = p^μ ε^ν − ε^μ p^ν for leg i of helicity −1 (λλ̃_ref) or +1 (λ_ref λ̃). */
export function fieldStrength(F: PrimeField, k: KinematicPoint, leg: number, helicity: -1 | 1, ref: [number, number]): Tensor {
  const lam = k.lam[leg]!
  const lamt = k.lamt[leg]!
  const p = toMinkowski(F, outer(F, lam, lamt))
  const eps =
    helicity < 0
      ? toMinkowski(F, outer(F, lam, ref)).map((x) => F.div(x, F.sub(F.mul(lamt[0], ref[1]), F.mul(lamt[1], ref[0]))))
      : toMinkowski(F, outer(F, ref, lamt)).map((x) => F.div(x, F.sub(F.mul(ref[0], lam[1]), F.mul(ref[1], lam[0]))))
  return p.map((pm, m) => eps.map((en, n) => F.sub(F.mul(pm, en), F.mul(eps[m]!, p[n]!))))
}

const G = [1, -1, -1, -1]

/** Lower both indices. */
function lower(F: PrimeField, t: Tensor): Tensor {
  return t.map((row, m) => row.map((x, n) => (G[m]! * G[n]! === 1 ? x : F.neg(x))))
}

/** F_a^{μν} F_b{}_{μν}. */
export function contract(F: PrimeField, a: Tensor, b: Tensor): number {
  const bl = lower(F, b)
  let s = 0
  for (let m = 0; m < 4; m++) for (let n = 0; n < 4; n++) s = F.add(s, F.mul(a[m]![n]!, bl[m]![n]!))
  return s
}

function levi(idx: number[]): number {
  let s = 1
  for (let i = 0; i < 4; i++)
    for (let j = i + 1; j < 4; j++) {
      if (idx[i] === idx[j]) return 0
      if (idx[i]! > idx[j]!) s = -s
    }
  return s
}

/** F̃^{μν} = ½ ε^{μνρσ} F_{ρσ}. */
export function dual(F: PrimeField, t: Tensor): Tensor {
  const tl = lower(F, t)
  const half = F.inv(2)
  return [0, 1, 2, 3].map((m) =>
    [0, 1, 2, 3].map((n) => {
      let s = 0
      for (let r = 0; r < 4; r++)
        for (let q = 0; q < 4; q++) {
          const e = levi([m, n, r, q])
          if (e !== 0) s = e > 0 ? F.add(s, tl[r]![q]!) : F.sub(s, tl[r]![q]!)
        }
      return F.mul(half, s)
    }),
  )
}

/** F_a^{μ}{}_{ν} F_b^{ν}{}_{ρ} F_c^{ρ}{}_{σ} F_d^{σ}{}_{μ} (trace of mixed-index matrices). */
export function chain(F: PrimeField, ts: Tensor[]): number {
  const mixed = ts.map((t) => t.map((row) => row.map((x, n) => (G[n] === 1 ? x : F.neg(x)))))
  let m = mixed[0]!
  for (const next of mixed.slice(1)) m = m.map((row) => next[0]!.map((_, c) => row.reduce((s, x, k) => F.add(s, F.mul(x, next[k]![c]!)), 0)))
  return m.reduce((s, row, i) => F.add(s, row[i]!), 0)
}

export function permutations4(): number[][] {
  const out: number[][] = []
  const rec = (cur: number[]): void => {
    if (cur.length === 4) {
      out.push(cur)
      return
    }
    for (let i = 0; i < 4; i++) if (!cur.includes(i)) rec([...cur, i])
  }
  rec([])
  return out
}
