/**
 * The leading ("free-limit") value of an operator at a configuration with as many legs as it has
 * letters: every letter takes exactly one leg through its part linear in the fields,
 *   u_μ → −2∂_μφ + r_μ − l_μ,  χ_± → χ ± χ†,  f_±μν → F_Lμν ± F_Rμν,  ∇_μ → ∂_μ,
 * with φ of a source leg its linear response 2k²φ = −i k·(r − l) + (i/2)(χ_− − ⟨χ_−⟩/N).
 * These values span the associated graded space of the operators (filtered by the number of
 * letters), in which the counting of cosetSeries.ts is done; they equal the exact values
 * (exactValue.ts) of operators with that many letters. A linear letter is a sum over flavor
 * matrices M of M ⊗ (Σ c · one vector per Lorentz slot), so a contraction is a product of dot
 * products (one 4 × 4 determinant for ε^{μνρσ}) and each flavor product is formed once per choice
 * of matrices.
 */
import type { PrimeField } from '../../finite/primeField'
import { dot, type Config, type Leg, type LegKind } from './kinematics'
import type { Letter, LetterKind, Monomial, Operator } from './monomial'

/** One flavor matrix with its Lorentz tensor: Σ_t c_t ⊗_slots vector(ids_t). */
interface Group {
  M: Float64Array
  terms: { c: number; vecs: number[] }[]
}

interface Compiled {
  letters: Letter[]
  pairs: [number, number, number, number][]
  eps: [number, number][] | null
  factorSizes: { type: 'trace' | 'det'; size: number }[]
}

/** Leg kinds a linear letter lives on (intrinsic parity: odd letters on pion, p, a legs). */
export const ACCEPTS: Record<LetterKind, readonly LegKind[]> = {
  u: ['pion', 'p', 'a'],
  'chi+': ['s'],
  'chi-': ['p'],
  'f+': ['v'],
  'f-': ['a'],
  chi: ['s', 'p'],
  chibar: ['s', 'p'],
  FL: ['v', 'a'],
  FR: ['v', 'a'],
}

const compiledCache = new WeakMap<Monomial, Compiled>()

function compile(m: Monomial): Compiled {
  const hit = compiledCache.get(m)
  if (hit) return hit
  const letters = m.factors.flatMap((f) => f.letters)
  const where = new Map<number, [number, number][]>()
  letters.forEach((l, i) => [...l.d, ...l.idx].forEach((x, s) => where.set(x, [...(where.get(x) ?? []), [i, s]])))
  const pairs: [number, number, number, number][] = []
  for (const [x, w] of where) if (!m.eps?.includes(x)) pairs.push([w[0]![0], w[0]![1], w[1]![0], w[1]![1]])
  const eps = m.eps ? m.eps.map((x) => where.get(x)![0]!) : null
  const c: Compiled = { letters, pairs, eps, factorSizes: m.factors.map((f) => ({ type: f.type, size: f.letters.length })) }
  compiledCache.set(m, c)
  return c
}

export class FreeEvaluator {
  readonly i: number
  readonly N: number
  /** Vector table: leg j has k (3j), l-polarization (3j + 1), r-polarization (3j + 2). */
  private readonly vectors: number[][]
  private readonly dots: number[][]
  private readonly groupCache = new Map<string, Group[]>()
  private readonly phi: Float64Array[]
  constructor(
    readonly F: PrimeField,
    readonly config: Config,
  ) {
    this.i = F.sqrtMinusOne()
    this.N = config.N
    this.vectors = config.legs.flatMap((l) => [l.k, l.el ?? [0, 0, 0, 0], l.er ?? [0, 0, 0, 0]])
    this.dots = this.vectors.map((a) => this.vectors.map((b) => dot(F, a, b)))
    this.phi = config.legs.map((leg) => Float64Array.from(this.response(leg)))
  }

  /** φ of a leg: T for a Goldstone, the linear response 2k²φ = −i k·(r − l) + (i/2) χ̂_− for a source. */
  private response(leg: Leg): number[] {
    const { F, N } = this
    if (leg.kind === 'pion') return leg.T!
    const k2 = dot(F, leg.k, leg.k)
    const out = new Array<number>(N * N).fill(0)
    // on shell only as the partner of a single Goldstone leg, where the exact solution drops it too
    if (k2 === 0 || leg.kind === 's' || leg.kind === 'v') return out
    if (leg.kind === 'p') {
      const minus = leg.chi!.map((x, q) => F.sub(x, leg.chiBar![q]!))
      let tr = 0
      for (let a = 0; a < N; a++) tr = F.add(tr, minus[a * N + a]!)
      for (let a = 0; a < N; a++) minus[a * N + a] = F.sub(minus[a * N + a]!, F.div(tr, N))
      const c = F.div(F.mul(this.i, F.inv(2)), F.mul(2, k2))
      return minus.map((x) => F.mul(c, x))
    }
    const ke = dot(F, leg.k, leg.er!)
    const c = F.div(F.mul(F.neg(this.i), F.mul(2, ke)), F.mul(2, k2))
    return leg.tr!.map((x) => F.mul(c, x))
  }

  /** Linear part of ∇_{d…}X on leg j, grouped by flavor matrix (own slots after derivative slots). */
  private groups(l: Letter, j: number): Group[] {
    const key = `${l.kind}|${l.d.length}|${j}`
    const hit = this.groupCache.get(key)
    if (hit) return hit
    const { F } = this
    const leg = this.config.legs[j]!
    const [k, e] = [3 * j, 3 * j + 2]
    const i = this.i
    const m = (a: readonly number[], c = 1) => Float64Array.from(a, (x) => F.mul(F.from(c), x))
    // F_μν of a leg with l or r = M e: i(k_μ e_ν − k_ν e_μ) M
    const strength = (M: readonly number[], s: number): Group => ({
      M: m(M),
      terms: [
        { c: F.mul(F.from(s), i), vecs: [k, e] },
        { c: F.mul(F.from(-s), i), vecs: [e, k] },
      ],
    })
    const r = leg.tr
    let base: Group[] = []
    if (l.kind === 'u') {
      base = [{ M: this.phi[j]!, terms: [{ c: F.mul(F.neg(2), i), vecs: [k] }] }]
      // r − l = 2A e on an axial leg
      if (leg.kind === 'a') base.push({ M: m(r!), terms: [{ c: 2, vecs: [e] }] })
    } else if (l.kind === 'chi+' || l.kind === 'chi-') {
      base = [{ M: m(leg.chi!.map((x, q) => (l.kind === 'chi+' ? F.add(x, leg.chiBar![q]!) : F.sub(x, leg.chiBar![q]!)))), terms: [{ c: 1, vecs: [] }] }]
    } else if (l.kind === 'chi' || l.kind === 'chibar') {
      base = [{ M: m(l.kind === 'chi' ? leg.chi! : leg.chiBar!), terms: [{ c: 1, vecs: [] }] }]
    } else {
      // F_L has l = ∓M on v/a legs... l = tl, r = tr; f_± = F_L ± F_R
      const sl = l.kind === 'FR' ? 0 : 1
      const sr = l.kind === 'FL' ? 0 : l.kind === 'f-' ? -1 : 1
      if (sl !== 0) base.push(strength(leg.tl!, sl))
      if (sr !== 0) base.push(strength(r!, sr))
      base = mergeGroups(F, base)
    }
    const pre = F.pow(i, l.d.length)
    const out = base.map((g) => ({ M: g.M, terms: g.terms.map((t) => ({ c: F.mul(pre, t.c), vecs: [...l.d.map(() => k), ...t.vecs] })) }))
    this.groupCache.set(key, out)
    return out
  }

  operator(op: Operator): number {
    const F = this.F
    let s = 0
    for (const t of op.terms) s = F.add(s, F.mul(F.from(t.coef), this.monomial(t.mono)))
    return op.iPower === 1 ? F.mul(this.i, s) : s
  }

  /** Σ over assignments of letters to legs of the multilinear contraction. */
  monomial(m: Monomial): number {
    const c = compile(m)
    const legs = this.config.legs
    if (c.letters.length !== legs.length) return 0
    const F = this.F
    let total = 0
    const used = new Array<boolean>(legs.length).fill(false)
    const legOf: number[] = []
    const rec = (i: number) => {
      if (i === c.letters.length) {
        total = F.add(total, this.assigned(c, legOf))
        return
      }
      for (let j = 0; j < legs.length; j++) {
        if (used[j] || !ACCEPTS[c.letters[i]!.kind].includes(legs[j]!.kind)) continue
        used[j] = true
        legOf.push(j)
        rec(i + 1)
        used[j] = false
        legOf.pop()
      }
    }
    rec(0)
    return total
  }

  /** One assignment: Σ over flavor matrices (flavor product) × Σ over their tensor terms (dots). */
  private assigned(c: Compiled, legOf: number[]): number {
    const F = this.F
    const groupLists = c.letters.map((l, i) => this.groups(l, legOf[i]!))
    if (groupLists.every((g) => g.length === 1)) {
      const chosen = groupLists.map((g) => g[0]!)
      const tensor = this.contraction(c, chosen)
      return tensor === 0 ? 0 : F.mul(tensor, this.flavor(c, chosen))
    }
    const chosen: Group[] = []
    let total = 0
    const rec = (i: number) => {
      if (i === groupLists.length) {
        const tensor = this.contraction(c, chosen)
        if (tensor !== 0) total = F.add(total, F.mul(tensor, this.flavor(c, chosen)))
        return
      }
      for (const g of groupLists[i]!) {
        chosen.push(g)
        rec(i + 1)
        chosen.pop()
      }
    }
    rec(0)
    return total
  }

  /** Σ over the tensor terms of the chosen groups of Π dots (and the ε determinant). */
  private contraction(c: Compiled, chosen: Group[]): number {
    const F = this.F
    const p = F.p
    const picks: { c: number; vecs: number[] }[] = []
    let total = 0
    const rec = (i: number, coef: number) => {
      if (i === chosen.length) {
        let v = coef
        for (const [a, s, b, t] of c.pairs) {
          v = (v * this.dots[picks[a]!.vecs[s]!]![picks[b]!.vecs[t]!]!) % p
          if (v === 0) return
        }
        if (c.eps) v = F.mul(v, this.epsilon(c.eps.map(([a, s]) => picks[a]!.vecs[s]!)))
        total = (total + v) % p
        return
      }
      for (const t of chosen[i]!.terms) {
        picks.push(t)
        rec(i + 1, (coef * t.c) % p)
        picks.pop()
      }
    }
    rec(0, 1)
    return total
  }

  private epsilon(ids: number[]): number {
    const F = this.F
    const v = ids.map((id) => this.vectors[id]!)
    let s = 0
    for (const [perm, sign] of PERMUTATIONS_4) {
      let prod = sign === 1 ? 1 : F.p - 1
      for (let r = 0; r < 4; r++) prod = F.mul(prod, v[r]![perm[r]!]!)
      s = F.add(s, prod)
    }
    return s
  }

  private readonly bufA = new Float64Array(64)
  private readonly bufB = new Float64Array(64)

  private flavor(c: Compiled, chosen: Group[]): number {
    const F = this.F
    let k = 0
    let v = 1
    for (const f of c.factorSizes) {
      const x =
        f.type === 'trace'
          ? this.traceOfProduct(chosen, k, f.size)
          : mixedDet(
              F,
              this.N,
              chosen.slice(k, k + f.size).map((g) => g.M),
            )
      k += f.size
      v = F.mul(v, x)
      if (v === 0) return 0
    }
    return v
  }

  /** tr(M_from … M_{from+size−1}) with two scratch buffers. */
  private traceOfProduct(chosen: Group[], from: number, size: number): number {
    const { N } = this
    const p = this.F.p
    let acc: Float64Array = chosen[from]!.M
    let out = this.bufA
    let spare = this.bufB
    for (let m = 1; m < size; m++) {
      const b = chosen[from + m]!.M
      out.fill(0, 0, N * N)
      for (let i = 0; i < N; i++)
        for (let k = 0; k < N; k++) {
          const x = acc[i * N + k]!
          if (x === 0) continue
          for (let j = 0; j < N; j++) out[i * N + j] = (out[i * N + j]! + x * b[k * N + j]!) % p
        }
      acc = out
      ;[out, spare] = [spare, out]
    }
    let t = 0
    for (let i = 0; i < N; i++) t += acc[i * N + i]!
    return t % p
  }
}

const PERMUTATIONS_4: [number[], number][] = permutations(4)

/** Groups whose matrices are proportional (±) are merged into one, so each letter has one matrix per leg. */
function mergeGroups(F: PrimeField, groups: Group[]): Group[] {
  if (groups.length < 2) return groups
  const [a, b] = groups as [Group, Group]
  const same = a.M.every((x, q) => x === b.M[q])
  const opposite = a.M.every((x, q) => x === F.neg(b.M[q]!))
  if (!same && !opposite) return groups
  const s = same ? 1 : F.p - 1
  const terms = [...a.terms, ...b.terms.map((t) => ({ c: F.mul(s, t.c), vecs: t.vecs }))]
  return [{ M: a.M, terms }]
}

function permutations(n: number): [number[], number][] {
  if (n === 1) return [[[0], 1]]
  const out: [number[], number][] = []
  for (const [p, s] of permutations(n - 1)) for (let i = 0; i < n; i++) out.push([[...p.slice(0, i), n - 1, ...p.slice(i)], (n - 1 - i) % 2 === 0 ? s : -s])
  return out
}

function mixedDet(F: PrimeField, N: number, mats: Float64Array[]): number {
  const perms = permutations(N)
  let s = 0
  for (const [a, sa] of perms)
    for (const [b, sb] of perms) {
      let prod = sa * sb === 1 ? 1 : F.p - 1
      for (let k = 0; k < N; k++) prod = F.mul(prod, mats[k]![a[k]! * N + b[k]!]!)
      s = F.add(s, prod)
    }
  let fact = 1
  for (let k = 2; k <= N; k++) fact *= k
  return F.div(s, fact)
}
