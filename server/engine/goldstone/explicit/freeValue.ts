/**
 * The leading ("free-limit") value of an operator at a configuration with as many legs as it has
 * letters: every letter takes exactly one leg through its part linear in the fields,
 *   u_μ → −2∂_μφ + r_μ − l_μ,  χ_± → χ ± χ†,  f_±μν → F_Lμν ± F_Rμν,  ∇_μ → ∂_μ,
 * with φ of a source leg its linear response 2k²φ = −i k·(r − l) + (i/2)(χ_− − ⟨χ_−⟩/N).
 * These values span the associated graded space of the operators (filtered by the number of
 * letters), in which the counting of cosetSeries.ts is done; they equal the exact values
 * (exactValue.ts) of operators with that many letters. Each linear letter is a short sum of
 * matrix ⊗ vectors (one vector per Lorentz slot), so a contraction is a product of dot products
 * and, for ε^{μνρσ}, one 4 × 4 determinant.
 */
import type { PrimeField } from '../../finite/primeField'
import { dot, type Config, type Leg, type Vec4 } from './kinematics'
import type { Letter, LetterKind, Monomial, Operator } from './monomial'

interface Term { c: number, M: number[], vecs: Vec4[] }

const ACCEPTS: Record<LetterKind, Leg['kind'][]> = {
  'u': ['pion', 'scalar', 'vector'], 'chi+': ['scalar'], 'chi-': ['scalar'], 'f+': ['vector'], 'f-': ['vector'],
  'chi': ['scalar'], 'chibar': ['scalar'], 'FL': ['vector'], 'FR': ['vector'],
}

export class FreeEvaluator {
  readonly i: number
  private readonly phi: number[][]
  private readonly cache = new Map<string, Term[]>()
  constructor(readonly F: PrimeField, readonly config: Config) {
    this.i = F.sqrtMinusOne()
    this.phi = config.legs.map((leg) => this.response(leg))
  }

  private mat(a: readonly number[], c = 1): number[] { return a.map((x) => this.F.mul(x, this.F.from(c))) }

  private response(leg: Leg): number[] {
    const { F, config } = this
    const N = config.N
    if (leg.kind === 'pion') return leg.T!
    const k2 = dot(F, leg.k, leg.k)
    const out = new Array<number>(N * N).fill(0)
    // on shell only as the partner of a single Goldstone leg, where the exact solution drops it too
    if (k2 === 0) return out
    if (leg.kind === 'scalar') {
      const minus = leg.chi!.map((x, q) => F.sub(x, leg.chiBar![q]!))
      let tr = 0
      for (let a = 0; a < N; a++) tr = F.add(tr, minus[a * N + a]!)
      for (let a = 0; a < N; a++) minus[a * N + a] = F.sub(minus[a * N + a]!, F.div(tr, N))
      const c = F.div(F.mul(this.i, F.inv(2)), F.mul(2, k2))
      return minus.map((x) => F.mul(c, x))
    }
    const kr = dot(F, leg.k, leg.er!)
    const kl = dot(F, leg.k, leg.el!)
    const c = F.div(F.neg(this.i), F.mul(2, k2))
    for (let q = 0; q < N * N; q++) out[q] = F.mul(c, F.sub(F.mul(kr, leg.tr![q]!), F.mul(kl, leg.tl![q]!)))
    return out
  }

  /** Linear part of a bare block on a leg, as terms (own slots only). */
  private bare(kind: LetterKind, j: number): Term[] {
    const { F } = this
    const leg = this.config.legs[j]!
    const strength = (T: number[], e: Vec4): Term[] => [{ c: this.i, M: T, vecs: [leg.k, e] }, { c: F.neg(this.i), M: T, vecs: [e, leg.k] }]
    const neg = (ts: Term[]) => ts.map((t) => ({ ...t, c: F.neg(t.c) }))
    switch (kind) {
      case 'u': {
        const out: Term[] = [{ c: F.mul(F.neg(2), this.i), M: this.phi[j]!, vecs: [leg.k] }]
        if (leg.kind === 'vector') out.push({ c: 1, M: leg.tr!, vecs: [leg.er!] }, { c: F.neg(1), M: leg.tl!, vecs: [leg.el!] })
        return out
      }
      case 'chi+': return [{ c: 1, M: leg.chi!, vecs: [] }, { c: 1, M: leg.chiBar!, vecs: [] }]
      case 'chi-': return [{ c: 1, M: leg.chi!, vecs: [] }, { c: F.neg(1), M: leg.chiBar!, vecs: [] }]
      case 'chi': return [{ c: 1, M: leg.chi!, vecs: [] }]
      case 'chibar': return [{ c: 1, M: leg.chiBar!, vecs: [] }]
      case 'FL': return strength(leg.tl!, leg.el!)
      case 'FR': return strength(leg.tr!, leg.er!)
      case 'f+': return [...strength(leg.tl!, leg.el!), ...strength(leg.tr!, leg.er!)]
      case 'f-': return [...strength(leg.tl!, leg.el!), ...neg(strength(leg.tr!, leg.er!))]
    }
  }

  /** Linear part of ∇_{d…}X on leg j: each derivative contributes i k in its slot. */
  private letterTerms(l: Letter, j: number): Term[] {
    const key = `${l.kind}|${l.d.length}|${j}`
    let hit = this.cache.get(key)
    if (!hit) {
      const leg = this.config.legs[j]!
      const pre = this.F.pow(this.i, l.d.length)
      hit = this.bare(l.kind, j).map((t) => ({ c: this.F.mul(pre, t.c), M: t.M, vecs: [...l.d.map(() => leg.k), ...t.vecs] }))
      this.cache.set(key, hit)
    }
    return hit
  }

  operator(op: Operator): number {
    const F = this.F
    let s = 0
    for (const t of op.terms) s = F.add(s, F.mul(F.from(t.coef), this.monomial(t.mono)))
    return op.iPower === 1 ? F.mul(this.i, s) : s
  }

  /** Σ over assignments of letters to legs of the multilinear contraction. */
  monomial(m: Monomial): number {
    const letters = m.factors.flatMap((f) => f.letters)
    const legs = this.config.legs
    if (letters.length !== legs.length) return 0
    const F = this.F
    let total = 0
    const used = new Array<boolean>(legs.length).fill(false)
    const choice: number[] = []
    const rec = (i: number) => {
      if (i === letters.length) { total = F.add(total, this.assigned(m, letters, choice)); return }
      for (let j = 0; j < legs.length; j++) {
        if (used[j] || !ACCEPTS[letters[i]!.kind].includes(legs[j]!.kind)) continue
        used[j] = true; choice.push(j)
        rec(i + 1)
        used[j] = false; choice.pop()
      }
    }
    rec(0)
    return total
  }

  /** One assignment: sum over the term choices of each letter. */
  private assigned(m: Monomial, letters: Letter[], legOf: number[]): number {
    const F = this.F
    const termLists = letters.map((l, i) => this.letterTerms(l, legOf[i]!))
    const slots = new Map<number, [number, number][]>()
    letters.forEach((l, i) => [...l.d, ...l.idx].forEach((x, s) => { const a = slots.get(x) ?? []; a.push([i, s]); slots.set(x, a) }))
    let total = 0
    const pick: Term[] = []
    const rec = (i: number, c: number) => {
      if (i === letters.length) {
        let v = c
        for (const [x, where] of slots) {
          if (m.eps?.includes(x)) continue
          const [[a, s], [b, t]] = where as [[number, number], [number, number]]
          v = F.mul(v, dot(F, pick[a]!.vecs[s]!, pick[b]!.vecs[t]!))
          if (v === 0) return
        }
        if (m.eps) v = F.mul(v, this.epsilon(m.eps.map((x) => { const [a, s] = slots.get(x)![0]!; return pick[a]!.vecs[s]! })))
        if (v !== 0) total = F.add(total, F.mul(v, this.flavor(m, pick)))
        return
      }
      for (const t of termLists[i]!) { pick.push(t); rec(i + 1, F.mul(c, t.c)); pick.pop() }
    }
    rec(0, 1)
    return total
  }

  private epsilon(v: Vec4[]): number {
    const F = this.F
    let s = 0
    const perm = (rest: number[], acc: number[], sign: number) => {
      if (rest.length === 0) {
        let prod = sign === 1 ? 1 : F.p - 1
        acc.forEach((mu, r) => { prod = F.mul(prod, v[r]![mu]!) })
        s = F.add(s, prod)
        return
      }
      rest.forEach((x, i) => perm([...rest.slice(0, i), ...rest.slice(i + 1)], [...acc, x], i % 2 === 0 ? sign : -sign))
    }
    perm([0, 1, 2, 3], [], 1)
    return s
  }

  private flavor(m: Monomial, pick: Term[]): number {
    const F = this.F
    const N = this.config.N
    let k = 0
    let v = 1
    for (const f of m.factors) {
      const mats = f.letters.map(() => pick[k++]!.M)
      v = F.mul(v, f.type === 'trace' ? traceOfProduct(F, N, mats) : mixedDet(F, N, mats))
    }
    return v
  }
}

function matMul(F: PrimeField, N: number, a: number[], b: number[]): number[] {
  const out = new Array<number>(N * N).fill(0)
  for (let i = 0; i < N; i++) for (let k = 0; k < N; k++) {
    const x = a[i * N + k]!
    if (x === 0) continue
    for (let j = 0; j < N; j++) out[i * N + j] = (out[i * N + j]! + x * b[k * N + j]!) % F.p
  }
  return out
}

function traceOfProduct(F: PrimeField, N: number, mats: number[][]): number {
  let acc = mats[0]!
  for (let i = 1; i < mats.length; i++) acc = matMul(F, N, acc, mats[i]!)
  let t = 0
  for (let i = 0; i < N; i++) t = F.add(t, acc[i * N + i]!)
  return t
}

function mixedDet(F: PrimeField, N: number, mats: number[][]): number {
  const perms: [number[], number][] = []
  const rec = (rest: number[], acc: number[], sign: number) => {
    if (rest.length === 0) { perms.push([acc, sign]); return }
    rest.forEach((x, i) => rec([...rest.slice(0, i), ...rest.slice(i + 1)], [...acc, x], i % 2 === 0 ? sign : -sign))
  }
  rec(Array.from({ length: N }, (_, i) => i), [], 1)
  let s = 0
  for (const [a, sa] of perms) for (const [b, sb] of perms) {
    let prod = sa * sb === 1 ? 1 : F.p - 1
    for (let k = 0; k < N; k++) prod = F.mul(prod, mats[k]![a[k]! * N + b[k]!]!)
    s = F.add(s, prod)
  }
  let fact = 1
  for (let k = 2; k <= N; k++) fact *= k
  return F.div(s, fact)
}
