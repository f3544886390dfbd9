/**
 * The exact value of an operator on a classical solution (perturbiner.ts): the coefficient of the
 * full set of legs of ∫d⁴x O, i.e. its tree-level matrix element at first order, mod p.
 * Lorentz labels are summed with η^{μν} while the letters of a trace are multiplied in order, so
 * only the labels still open between letters are enumerated (the start of each cyclic trace is
 * chosen to keep them few). Traces that share labels with other factors or with ε^{μνρσ} (ε^{0123}
 * = +1, indices of the letters lower) stay open until the factors are multiplied.
 */
import { EngineInputError } from '../../errors'
import type { GMat, GScalar } from './graded'
import { METRIC } from './kinematics'
import { SOURCE_SIDES, type Factor, type Letter, type Monomial, type Operator } from './monomial'
import { ClassicalSolution, PAIRS } from './perturbiner'

const pairIndex = (a: number, b: number): number => PAIRS.findIndex(([x, y]) => x === a && y === b)

const PERMUTATIONS_4: [number[], number][] = (() => {
  const out: [number[], number][] = []
  const rec = (rest: number[], acc: number[], sign: number) => {
    if (rest.length === 0) { out.push([acc, sign]); return }
    rest.forEach((x, i) => rec([...rest.slice(0, i), ...rest.slice(i + 1)], [...acc, x], i % 2 === 0 ? sign : -sign))
  }
  rec([0, 1, 2, 3], [], 1)
  return out
})()

/** Evaluates letters and monomials on one classical solution; letter components are cached. */
export class ExactEvaluator {
  private readonly cache = new Map<string, GMat>()
  constructor(readonly sol: ClassicalSolution) {}

  private bare(l: Letter, idx: number[]): GMat {
    const s = this.sol
    const antisym = (arr: GMat[]): GMat => {
      const [a, b] = idx as [number, number]
      if (a === b) return s.space.zero()
      return a < b ? arr[pairIndex(a, b)]! : s.space.scale(s.F.neg(1), arr[pairIndex(b, a)]!)
    }
    switch (l.kind) {
      case 'u': return s.uMu[idx[0]!]!
      case 'chi+': return s.chiPlus
      case 'chi-': return s.chiMinus
      case 'f+': return antisym(s.fPlus)
      case 'f-': return antisym(s.fMinus)
      case 'chi': return s.chi
      case 'chibar': return s.chiBar
      case 'FL': return antisym(s.strengthL)
      case 'FR': return antisym(s.strengthR)
    }
  }

  /** ∇_{d0}…∇_{dk} X_{idx} (D for source letters) at concrete index values. */
  letter(l: Letter, d: number[], idx: number[]): GMat {
    const key = `${l.kind}|${d.join('')}|${idx.join('')}`
    const hit = this.cache.get(key)
    if (hit) return hit
    let v: GMat
    if (d.length === 0) v = this.bare(l, idx)
    else {
      const inner = this.letter(l, d.slice(1), idx)
      const s = this.sol
      const sp = s.space
      const mu = d[0]!
      const dv = sp.weight(inner, s.derivative[mu]!)
      const sides = SOURCE_SIDES[l.kind]
      if (!sides) v = sp.add(dv, sp.commutator(s.gamma[mu]!, inner))
      else {
        const A = (side: 'L' | 'R') => (side === 'L' ? s.l[mu]! : s.r[mu]!)
        const conn = sp.sub(sp.mul(A(sides[0]), inner), sp.mul(inner, A(sides[1])))
        v = sp.sub(dv, sp.scale(s.i, conn))
      }
    }
    this.cache.set(key, v)
    return v
  }

  /** A letter with its internally contracted labels summed; `values` gives the other labels. */
  private letterSummed(l: Letter, values: Map<number, number>): GMat {
    const labels = [...l.d, ...l.idx]
    const internal = labels.filter((x, i) => labels.indexOf(x) !== i)
    const sp = this.sol.space
    if (internal.length === 0) return this.letter(l, l.d.map((x) => values.get(x)!), l.idx.map((x) => values.get(x)!))
    let sum = sp.zero()
    forEachAssignment(internal, (vals, w) => {
      const all = new Map([...values, ...vals])
      const term = this.letter(l, l.d.map((x) => all.get(x)!), l.idx.map((x) => all.get(x)!))
      sum = w === 1 ? sp.add(sum, term) : sp.sub(sum, term)
    })
    return sum
  }

  /** Value of ∫d⁴x of the operator at the full set of legs (mod p). */
  operator(op: Operator): number {
    const F = this.sol.F
    let s = 0
    for (const t of op.terms) s = F.add(s, F.mul(F.from(t.coef), this.monomial(t.mono)))
    return op.iPower === 1 ? F.mul(this.sol.i, s) : s
  }

  monomial(m: Monomial): number {
    const F = this.sol.F
    const sp = this.sol.space
    const full = sp.size - 1
    const external = externalLabels(m)
    if (m.factors.length === 1 && !m.eps && m.factors[0]!.type === 'trace') return this.traceAtFull(m.factors[0]!.letters)
    const tensors = m.factors.map((f) => ({ labels: [...external].filter((x) => factorLabels(f).has(x)).sort((a, b) => a - b), values: this.factorTensor(f, external) }))
    const epsLabels = m.eps ?? []
    const shared = [...external].filter((x) => !epsLabels.includes(x))
    let total = 0
    const epsAssignments: [Map<number, number>, number][] = m.eps ? PERMUTATIONS_4.map(([perm, sign]) => [new Map(epsLabels.map((x, i) => [x, perm[i]!])), sign]) : [[new Map(), 1]]
    for (const [epsVals, epsSign] of epsAssignments) {
      forEachAssignment(shared, (vals, w) => {
        const all = new Map([...vals, ...epsVals])
        let prod: GScalar | null = null
        for (const t of tensors) {
          const key = t.labels.map((x) => all.get(x)).join('')
          const g = t.values.get(key)!
          prod = prod === null ? g : sp.mulScalar(prod, g)
        }
        const v = prod![full]!
        total = F.add(total, w * epsSign === 1 ? v : F.neg(v))
      })
    }
    return total
  }

  /** One trace alone (no shared labels, no ε): only the full-set component is formed. */
  private traceAtFull(letters: readonly Letter[]): number {
    const F = this.sol.F
    const sp = this.sol.space
    const rotated = bestRotation(letters, new Set())
    const states = this.contract(rotated.slice(0, -1), new Set(), rotated[rotated.length - 1]!)
    const last = rotated[rotated.length - 1]!
    let total = 0
    for (const st of states) {
      const own = lettersLabels([last]).filter((x) => !st.open.has(x))
      forEachAssignment(own.filter((x, i) => own.indexOf(x) === i && !isInternal(last, x)), (vals, w) => {
        const all = new Map([...st.open, ...vals])
        const v = sp.traceProductAtFull(st.M, this.letterSummed(last, all))
        // labels of the last letter that were open close here
        let weight = w
        for (const [x, val] of st.open) if (lettersLabels([last]).includes(x)) weight *= METRIC[val]!
        total = F.add(total, weight === 1 ? v : F.neg(v))
      })
    }
    return total
  }

  /**
   * Multiply letters in order, summing each label when its second appearance is reached (unless it
   * is external). States carry the open labels' values; `next` (optional) is the letter that will
   * follow, whose labels must stay open.
   */
  private contract(letters: readonly Letter[], external: Set<number>, next?: Letter): { open: Map<number, number>, M: GMat }[] {
    const sp = this.sol.space
    let states: { open: Map<number, number>, M: GMat }[] = [{ open: new Map(), M: sp.identity() }]
    letters.forEach((l, pos) => {
      const mine = lettersLabels([l]).filter((x) => !isInternal(l, x))
      const later = new Set(lettersLabels(letters.slice(pos + 1)).concat(next ? lettersLabels([next]) : []))
      const merged = new Map<string, { open: Map<number, number>, M: GMat }>()
      for (const st of states) {
        const fresh = mine.filter((x) => !st.open.has(x))
        forEachAssignment(fresh, (vals) => {
          const all = new Map([...st.open, ...vals])
          let product = pos === 0 ? this.letterSummed(l, all) : sp.mul(st.M, this.letterSummed(l, all))
          let weight = 1
          const open = new Map<number, number>()
          for (const [x, v] of all) {
            if (external.has(x) || later.has(x)) open.set(x, v)
            else if (st.open.has(x) && mine.includes(x)) weight *= METRIC[v]!
          }
          if (weight === -1) product = sp.scale(this.sol.F.neg(1), product)
          const key = [...open].sort((a, b) => a[0] - b[0]).map(([x, v]) => `${x}:${v}`).join(',')
          const prev = merged.get(key)
          merged.set(key, { open, M: prev ? sp.add(prev.M, product) : product })
        }, false)
      }
      states = [...merged.values()]
    })
    return states
  }

  /** Graded scalar of one factor for every assignment of its external labels (key: values in label order). */
  private factorTensor(f: Factor, external: Set<number>): Map<string, GScalar> {
    const sp = this.sol.space
    const mine = [...factorLabels(f)].filter((x) => external.has(x)).sort((a, b) => a - b)
    const out = new Map<string, GScalar>()
    if (f.type === 'trace') {
      const rotated = bestRotation(f.letters, external)
      for (const st of this.contract(rotated, external)) {
        const key = [...st.open].sort((a, b) => a[0] - b[0]).map(([, v]) => v).join('')
        out.set(key, sp.trace(st.M))
      }
      return out
    }
    forEachAssignment(mine, (vals) => {
      const internal = lettersLabels(f.letters).filter((x) => !external.has(x))
      const unique = internal.filter((x, i) => internal.indexOf(x) === i)
      let sum: GScalar | null = null
      forEachAssignment(unique, (inner, w) => {
        const all = new Map([...vals, ...inner])
        const mats = f.letters.map((l) => this.letter(l, l.d.map((x) => all.get(x)!), l.idx.map((x) => all.get(x)!)))
        const d = this.mixedDeterminant(mats)
        sum = sum === null ? (w === 1 ? d : negate(this.sol.F.p, d)) : addScalar(this.sol.F.p, sum, w === 1 ? d : negate(this.sol.F.p, d))
      })
      out.set(mine.map((x) => vals.get(x)).join(''), sum ?? sp.zeroScalar())
    })
    return out
  }

  /** (1/N!) Σ_{σ,τ} sgn σ sgn τ Π_k (X_k)_{σk τk}, graded. */
  private mixedDeterminant(mats: GMat[]): GScalar {
    const { F, space: sp } = this.sol
    const N = this.sol.config.N
    if (mats.length !== N) throw new EngineInputError('mixedDeterminant', `det needs ${N} letters for N = ${N}, got ${mats.length}`)
    const entry = (X: GMat, i: number, j: number): GScalar => Float64Array.from({ length: sp.size }, (_, S) => X[S * sp.nn + i * N + j]!)
    const perms = permutations(N)
    let total = sp.zeroScalar()
    for (const [s, ss] of perms) {
      for (const [t, ts] of perms) {
        let prod = entry(mats[0]!, s[0]!, t[0]!)
        for (let k = 1; k < N; k++) prod = sp.mulScalar(prod, entry(mats[k]!, s[k]!, t[k]!))
        total = ss * ts === 1 ? addScalar(F.p, total, prod) : addScalar(F.p, total, negate(F.p, prod))
      }
    }
    let fact = 1
    for (let k = 2; k <= N; k++) fact *= k
    const inv = F.inv(fact)
    return total.map((x) => F.mul(x, inv)) as GScalar
  }
}

function negate(p: number, a: GScalar): GScalar {
  return a.map((x) => (x === 0 ? 0 : p - x)) as GScalar
}

function addScalar(p: number, a: GScalar, b: GScalar): GScalar {
  return a.map((x, i) => (x + b[i]!) % p) as GScalar
}

function permutations(n: number): [number[], number][] {
  if (n === 1) return [[[0], 1]]
  const out: [number[], number][] = []
  for (const [p, s] of permutations(n - 1)) {
    for (let i = 0; i < n; i++) out.push([[...p.slice(0, i), n - 1, ...p.slice(i)], (n - 1 - i) % 2 === 0 ? s : -s])
  }
  return out
}

function lettersLabels(letters: readonly Letter[]): number[] {
  return letters.flatMap((l) => [...l.d, ...l.idx])
}

function isInternal(l: Letter, x: number): boolean {
  const labels = [...l.d, ...l.idx]
  return labels.indexOf(x) !== labels.lastIndexOf(x)
}

function factorLabels(f: Factor): Set<number> {
  return new Set(lettersLabels(f.letters))
}

/** Labels shared between factors or with ε. */
function externalLabels(m: Monomial): Set<number> {
  const out = new Set<number>(m.eps ?? [])
  const where = new Map<number, number>()
  m.factors.forEach((f, i) => {
    for (const x of factorLabels(f)) {
      if (where.has(x) && where.get(x) !== i) out.add(x)
      where.set(x, i)
    }
  })
  return out
}

/** Enumerate 4^k values of the labels; w = Π η over them when `metric`. */
function forEachAssignment(labels: readonly number[], visit: (vals: Map<number, number>, w: number) => void, metric = true): void {
  const vals = new Map<number, number>()
  const rec = (i: number, w: number) => {
    if (i === labels.length) { visit(vals, w); return }
    for (let v = 0; v < 4; v++) { vals.set(labels[i]!, v); rec(i + 1, metric ? w * METRIC[v]! : w) }
    vals.delete(labels[i]!)
  }
  rec(0, 1)
}

/** The cyclic rotation of a trace with the fewest open labels along the way. */
function bestRotation(letters: readonly Letter[], external: Set<number>): Letter[] {
  let best: Letter[] = [...letters]
  let bestCost = Infinity
  for (let r = 0; r < letters.length; r++) {
    const rot = [...letters.slice(r), ...letters.slice(0, r)]
    let cost = 0
    const open = new Set<number>()
    rot.forEach((l, pos) => {
      const later = new Set(lettersLabels(rot.slice(pos + 1)))
      const mine = lettersLabels([l]).filter((x) => !isInternal(l, x))
      const fresh = mine.filter((x) => !open.has(x)).length
      cost += 4 ** (open.size + fresh)
      for (const x of mine) { if (external.has(x) || later.has(x)) open.add(x); else open.delete(x) }
    })
    if (cost < bestCost) { bestCost = cost; best = rot }
  }
  return best
}

