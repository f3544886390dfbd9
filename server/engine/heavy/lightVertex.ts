/**
 * The tree-level contact vertex of a heavy–light operator over F_p (p ≡ 1 mod 4, so that
 * i = √−1 exists). Kinematics: the heavy legs carry spatial ∂-eigenvalues q and zero energy
 * (the heavy field's leading-order EOM iD_tψ = 0); each light leg carries a complex null
 * ∂-eigenvalue k = λλ̃ (k_{αα̇} = k⁰ + k·σ), so the light fields' massless EOM holds (k² = 0;
 * Dirac legs solve the massless Dirac equation, u = (k⁰a, σ·k a), ū = (k⁰c, −c σ·k) in the
 * Dirac representation); light energies sum to zero and all ∂-eigenvalues sum to zero
 * (integration by parts). Gauge fields are absent: operators differing by field strengths are
 * identified. Identical light legs are symmetrised (bosons).
 */
import type { PrimeField, SeededRandom } from '../finite'
import { levi } from './algebra'
import type { LightContent } from './lightContent'
import type { LightCombo, LightStructure } from './lightStructure'

export interface LightPoint {
  u0: number[]
  u1: number[]
  /** Spatial ∂-eigenvalues of the heavy legs (x, y, z). */
  q: number[][]
  /** Light legs: ∂-eigenvalues (t, x, y, z), Dirac spinors (4-vectors), colour vectors per group. */
  k: number[][]
  spinor: Array<number[] | null>
  /** colour[leg][group] (heavy legs first). */
  colour: number[][][]
}

function pauli(F: PrimeField): number[][][] {
  const i = F.sqrtMinusOne()
  return [
    [
      [1, 0],
      [0, 1],
    ],
    [
      [0, 1],
      [1, 0],
    ],
    [
      [0, F.neg(i)],
      [i, 0],
    ],
    [
      [1, 0],
      [0, F.p - 1],
    ],
  ]
}

function nullVector(F: PrimeField, l: number[], lt: number[]): number[] {
  const half = F.inv(2)
  const i = F.sqrtMinusOne()
  const [a, b] = l as [number, number]
  const [c, d] = lt as [number, number]
  return [F.mul(half, F.add(F.mul(a, c), F.mul(b, d))), F.mul(half, F.add(F.mul(a, d), F.mul(b, c))), F.div(F.sub(F.mul(b, c), F.mul(a, d)), F.mul(2, i)), F.mul(half, F.sub(F.mul(a, c), F.mul(b, d)))]
}

function diracSpinor(F: PrimeField, rng: SeededRandom, k: number[], bar: boolean): number[] {
  const s = pauli(F)
  const a = [rng.nonZero(F.p), rng.nonZero(F.p)]
  // (σ·k) a as a column (for u) or a row (for ū)
  const sk = [0, 1].map((r) => [0, 1].map((c) => [1, 2, 3].reduce((t, j) => F.add(t, F.mul(k[j]!, s[j]![r]![c]!)), 0)))
  const lower = [0, 1].map((r) => [0, 1].reduce((t, c) => F.add(t, bar ? F.mul(a[c]!, sk[c]![r]!) : F.mul(sk[r]![c]!, a[c]!)), 0))
  return [F.mul(k[0]!, a[0]!), F.mul(k[0]!, a[1]!), bar ? F.neg(lower[0]!) : lower[0]!, bar ? F.neg(lower[1]!) : lower[1]!]
}

/** A random point for a content; `groups` are the colour dimensions N of its SU groups. */
export function randomLightPoint(F: PrimeField, rng: SeededRandom, content: LightContent, groupNs: readonly number[]): LightPoint {
  const rand = (n: number) => Array.from({ length: n }, () => rng.nonZero(F.p))
  const nL = content.legs.length
  const k: number[][] = []
  let energy = 0
  for (let j = 0; j < nL; j++) {
    const l = rand(2)
    let lt = rand(2)
    if (j === nL - 1) {
      // fix λ̃₂ so that this leg's energy cancels the others': λ1λ̃1 + λ2λ̃2 = −2E
      const target = F.sub(F.neg(F.mul(2, energy)), F.mul(l[0]!, lt[0]!))
      lt = [lt[0]!, F.div(target, l[1]!)]
    }
    const v = nullVector(F, l, lt)
    energy = F.add(energy, v[0]!)
    k.push(v)
  }
  const q0 = rand(3)
  const q1 = [1, 2, 3].map((j, x) => F.neg(k.reduce((t, v) => F.add(t, v[j]!), q0[x]!)))
  const spinor = content.legs.map((l, j) => (l.field!.kind === 'dirac' ? diracSpinor(F, rng, k[j]!, l.conj) : null))
  const colour = Array.from({ length: nL + 2 }, () => groupNs.map((n) => rand(n)))
  return { u0: rand(2), u1: rand(2), q: [q0, q1], k, spinor, colour }
}

/** Per point: heavy bilinears H[a] = u0ᵀσ_a u1 and Dirac bilinears L[τ][b] = ū γ⁰ (τ⊗σ_b) u. */
export interface LightTables {
  H: number[]
  L: number[][] | null
}

export function lightTables(F: PrimeField, pt: LightPoint, content: LightContent): LightTables {
  const s = pauli(F)
  const bil = (x: number[], m: number[][], y: number[]) => [0, 1].reduce((t, r) => F.add(t, F.mul(x[r]!, F.add(F.mul(m[r]![0]!, y[0]!), F.mul(m[r]![1]!, y[1]!)))), 0)
  const H = s.map((m) => bil(pt.u0, m, pt.u1))
  const bar = content.legs.findIndex((l) => l.field!.kind === 'dirac' && l.conj)
  const un = content.legs.findIndex((l) => l.field!.kind === 'dirac' && !l.conj)
  if (bar < 0) return { H, L: null }
  const v = pt.spinor[bar]!
  const u = pt.spinor[un]!
  // v γ⁰ (τ⊗σ) u with γ⁰ = τ₃⊗1: blocks (v_up, v_dn) · τ₃τ · (u_up, u_dn)
  const tau = s // τ matrices have the same entries as the Pauli matrices
  const L = tau.map((t) =>
    s.map((m) => {
      let total = 0
      for (let r = 0; r < 2; r++)
        for (let c = 0; c < 2; c++) {
          const g = F.mul(r === 0 ? 1 : F.p - 1, t[r]![c]!) // (τ₃τ)_{rc}
          if (g === 0) continue
          const block = bil(v.slice(2 * r, 2 * r + 2), m, u.slice(2 * c, 2 * c + 2))
          total = F.add(total, F.mul(g, block))
        }
      return total
    }),
  )
  return { H, L }
}

function colourFactor(F: PrimeField, s: LightStructure, pt: LightPoint, content: LightContent, legOf: (i: number) => number): number {
  let f = 1
  content.colours[s.colour]!.groups.forEach((g, gi) => {
    for (const p of g.pairs) {
      const a = pt.colour[legOf(p.a)]![gi]!
      const b = pt.colour[legOf(p.b)]![gi]!
      const v = p.eps ? F.sub(F.mul(a[0]!, b[1]!), F.mul(a[1]!, b[0]!)) : a.reduce((t, x, j) => F.add(t, F.mul(x, b[j]!)), 0)
      f = F.mul(f, v)
    }
  })
  return f
}

/** Vertex of one structure with the light legs read through `legOf` (a permutation of identical legs). */
function structureValue(F: PrimeField, s: LightStructure, pt: LightPoint, tb: LightTables, content: LightContent, legOf: (i: number) => number): number {
  const mom = (leg: number, x: number) => (leg < 2 ? pt.q[leg]![x - 1]! : pt.k[legOf(leg) - 2]![x]!)
  let base = colourFactor(F, s, pt, content, legOf)
  s.time.forEach((n, leg) => {
    for (let j = 0; j < n; j++) base = F.mul(base, mom(leg, 0))
  })
  if (base === 0) return 0
  const n = s.slots.length
  let total = 0
  const idx = new Array<number>(n).fill(1)
  for (let code = 0; code < 3 ** n; code++) {
    let c = code
    for (let j = 0; j < n; j++) {
      idx[j] = (c % 3) + 1
      c = Math.floor(c / 3)
    }
    if (s.pairs.some(([a, b]) => idx[a] !== idx[b])) continue
    const w = s.eps ? levi(idx[s.eps[0]]!, idx[s.eps[1]]!, idx[s.eps[2]]!) : 1
    if (w === 0) continue
    let hs = 0
    let ds = 0
    let term = 1
    s.slots.forEach((x, j) => {
      if (x.kind === 'hs') hs = idx[j]!
      else if (x.kind === 'ds') ds = idx[j]!
      else term = F.mul(term, mom(x.leg, idx[j]!))
    })
    term = F.mul(term, tb.H[s.heavySpin ? hs : 0]!)
    if (tb.L && s.tau !== null) term = F.mul(term, tb.L[s.tau]![s.diracSpin ? ds : 0]!)
    total = w > 0 ? F.add(total, term) : F.sub(total, term)
  }
  return F.mul(total, base)
}

/** Permutations of light legs among identical legs (same field, same conjugation). */
export function identicalPermutations(content: LightContent): number[][] {
  const legs = content.legs.map((_, i) => i + 2)
  const classes = new Map<string, number[]>()
  content.legs.forEach((l, i) => {
    const key = `${l.field!.name}|${l.conj}`
    classes.set(key, [...(classes.get(key) ?? []), i + 2])
  })
  let perms: number[][] = [[0, 1, ...legs]]
  for (const members of classes.values()) {
    if (members.length < 2) continue
    const orders = permutations(members)
    perms = perms.flatMap((p) =>
      orders.map((o) => {
        const q = p.slice()
        members.forEach((m, j) => {
          q[m] = o[j]!
        })
        return q
      }),
    )
  }
  return perms
}

function permutations(a: number[]): number[][] {
  if (a.length <= 1) return [a]
  return a.flatMap((x, i) => permutations([...a.slice(0, i), ...a.slice(i + 1)]).map((p) => [x, ...p]))
}

/** Vertex of a combination, symmetrised over identical light legs. */
export function lightComboValue(F: PrimeField, c: LightCombo, pt: LightPoint, tb: LightTables, content: LightContent, perms: readonly number[][]): number {
  let total = 0
  for (const perm of perms) {
    const legOf = (i: number) => perm[i]!
    for (const { coef, s } of c) total = F.add(total, F.mul(F.from(coef), structureValue(F, s, pt, tb, content, legOf)))
  }
  return total
}
