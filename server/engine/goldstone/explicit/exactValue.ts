/**
 * The exact value of an operator on a classical solution (perturbiner.ts): the coefficient of the
 * full set of legs of ∫d⁴x O, i.e. its tree-level matrix element at first order, mod p.
 * Lorentz labels are summed with η^{μν} while the letters of a trace are multiplied in order, so
 * only the labels still open between letters are enumerated (the start of each cyclic trace is
 * chosen to keep them few). Every letter needs at least one leg, so a partial product is formed
 * only on subsets small enough to leave a leg for each letter still to come. Traces that share
 * labels with other factors or with ε^{μνρσ} (ε^{0123} = +1, indices of the letters lower) stay
 * open until the factors are multiplied.
 */
import { EngineInputError } from '../../errors'
import type { GMat, GScalar } from './graded'
import { METRIC } from './kinematics'
import { SOURCE_SIDES, type Factor, type Letter, type Monomial, type Operator } from './monomial'
import { ClassicalSolution, PAIRS } from './perturbiner'
import { bestRotation, compileTrace, distinctLabels, type TracePlan } from './contractionPlan'

const pairIndex = (a: number, b: number): number => PAIRS.findIndex(([x, y]) => x === a && y === b)

const PERMUTATIONS_4: [number[], number][] = permutations(4)

function permutations(n: number): [number[], number][] {
  if (n === 1) return [[[0], 1]]
  const out: [number[], number][] = []
  for (const [p, s] of permutations(n - 1)) for (let i = 0; i < n; i++) out.push([[...p.slice(0, i), n - 1, ...p.slice(i)], (n - 1 - i) % 2 === 0 ? s : -s])
  return out
}

const planCache = new WeakMap<Monomial, { plans: TracePlan[]; external: number[] }>()

/** Evaluates letters and monomials on one classical solution; letter components are cached. */
export class ExactEvaluator {
  private readonly cache = new Map<string, GMat>()
  private readonly n: number
  constructor(readonly sol: ClassicalSolution) {
    this.n = sol.config.legs.length
  }

  private bare(l: Letter, idx: number[]): GMat {
    const s = this.sol
    const antisym = (arr: GMat[]): GMat => {
      const [a, b] = idx as [number, number]
      if (a === b) return s.space.zero()
      return a < b ? arr[pairIndex(a, b)]! : s.space.scale(s.F.neg(1), arr[pairIndex(b, a)]!)
    }
    switch (l.kind) {
      case 'u':
        return s.uMu[idx[0]!]!
      case 'chi+':
        return s.chiPlus
      case 'chi-':
        return s.chiMinus
      case 'f+':
        return antisym(s.fPlus)
      case 'f-':
        return antisym(s.fMinus)
      case 'chi':
        return s.chi
      case 'chibar':
        return s.chiBar
      case 'FL':
        return antisym(s.strengthL)
      case 'FR':
        return antisym(s.strengthR)
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
        v = sp.sub(dv, sp.scale(s.i, sp.sub(sp.mul(A(sides[0]), inner), sp.mul(inner, A(sides[1])))))
      }
    }
    this.cache.set(key, v)
    return v
  }

  private readonly components = new Map<Letter, GMat[]>()

  /** A letter with its own (non-internal) labels set to `values` (in `own` order), internal ones summed. */
  letterAt(l: Letter, own: readonly number[], values: ArrayLike<number>): GMat {
    let flat = 0
    for (let i = 0; i < own.length; i++) flat += values[i]! * 4 ** i
    let slot = this.components.get(l)
    if (!slot) {
      slot = new Array(4 ** own.length)
      this.components.set(l, slot)
    }
    const hit = slot[flat]
    if (hit) return hit
    const labels = [...l.d, ...l.idx]
    const internal = labels.filter((x, i) => labels.indexOf(x) !== i)
    const value = new Map<number, number>(own.map((x, i) => [x, values[i]!]))
    const at = () =>
      this.letter(
        l,
        l.d.map((x) => value.get(x)!),
        l.idx.map((x) => value.get(x)!),
      )
    let out: GMat
    if (internal.length === 0) out = at()
    else {
      const sp = this.sol.space
      out = sp.zero()
      for (let a = 0; a < 4 ** internal.length; a++) {
        let w = 1
        internal.forEach((x, i) => {
          const v = Math.floor(a / 4 ** i) % 4
          value.set(x, v)
          w *= METRIC[v]!
        })
        out = w === 1 ? sp.add(out, at()) : sp.sub(out, at())
      }
    }
    slot[flat] = out
    return out
  }

  /** Value of ∫d⁴x of the operator at the full set of legs (mod p); zero with more letters than legs. */
  operator(op: Operator): number {
    const F = this.sol.F
    let s = 0
    for (const t of op.terms) s = F.add(s, F.mul(F.from(t.coef), this.monomial(t.mono)))
    return op.iPower === 1 ? F.mul(this.sol.i, s) : s
  }

  monomial(m: Monomial): number {
    const letters = m.factors.reduce((s, f) => s + f.letters.length, 0)
    if (letters > this.n) return 0
    let compiled = planCache.get(m)
    if (!compiled) {
      // ε labels are fixed to each of the 24 permutations in turn; the other shared labels stay open
      const fixed = new Set(m.eps ?? [])
      const external = new Set([...externalLabels(m)].filter((x) => !fixed.has(x)))
      compiled = { plans: m.factors.map((f) => compileTrace(bestRotation(f.letters, external, fixed), external, fixed)), external: [...external].sort((a, b) => a - b) }
      planCache.set(m, compiled)
    }
    const { plans, external } = compiled
    const F = this.sol.F
    const single = m.factors.length === 1 && m.factors[0]!.type === 'trace'
    if (!m.eps) return single ? this.traceAtFull(plans[0]!, new Int8Array(plans[0]!.maxLabel + 1)) : this.combine(m, plans, external, null)
    let total = 0
    for (const [perm, sign] of PERMUTATIONS_4) {
      const vals = new Int8Array(Math.max(...m.eps, ...plans.map((p) => p.maxLabel)) + 1)
      m.eps.forEach((x, i) => {
        vals[x] = perm[i]!
      })
      const v = single ? this.traceAtFull(plans[0]!, vals) : this.combine(m, plans, external, vals)
      total = sign === 1 ? F.add(total, v) : F.sub(total, v)
    }
    return total
  }

  /**
   * Multiply along a trace plan. `reserve` legs are kept for letters outside this factor, so a
   * product after step t is formed on subsets of at most n − reserve − (letters still to come).
   */
  private run(plan: TracePlan, reserve: number, steps: number, vals: Int8Array): (GMat | undefined)[] {
    const sp = this.sol.space
    const ownVals = new Int8Array(8)
    let state: (GMat | undefined)[] = [sp.identity()]
    for (let t = 0; t < steps; t++) {
      const st = plan.steps[t]!
      const maxSize = this.n - reserve - (plan.steps.length - 1 - t)
      const next: (GMat | undefined)[] = new Array(4 ** st.nextOpen.length)
      for (let a = 0; a < state.length; a++) {
        const M = state[a]
        if (!M) continue
        for (let i = 0; i < st.prevOpen.length; i++) vals[st.prevOpen[i]!] = Math.floor(a / 4 ** i) % 4
        for (let b = 0; b < 4 ** st.fresh.length; b++) {
          for (let i = 0; i < st.fresh.length; i++) vals[st.fresh[i]!] = Math.floor(b / 4 ** i) % 4
          let w = 1
          for (const x of st.closing) w *= METRIC[vals[x]!]!
          for (let i = 0; i < st.own.length; i++) ownVals[i] = vals[st.own[i]!]!
          const comp = this.letterAt(st.letter, st.own, ownVals)
          const product = t === 0 ? comp : sp.mul(M, comp, maxSize)
          let c = 0
          for (let i = 0; i < st.nextOpen.length; i++) c += vals[st.nextOpen[i]!]! * 4 ** i
          // accumulators are fresh arrays, never a cached letter component
          if (!next[c]) next[c] = sp.zero()
          sp.accumulate(next[c]!, product, w as 1 | -1)
        }
      }
      state = next
    }
    return state
  }

  /** One trace alone (no shared labels, no ε): only the full-set component of the last product. */
  private traceAtFull(plan: TracePlan, vals: Int8Array): number {
    const F = this.sol.F
    const sp = this.sol.space
    const last = plan.steps[plan.steps.length - 1]!
    const state = plan.steps.length === 1 ? [sp.identity()] : this.run(plan, 0, plan.steps.length - 1, vals)
    let total = 0
    for (let a = 0; a < state.length; a++) {
      const M = state[a]
      if (!M) continue
      for (let i = 0; i < last.prevOpen.length; i++) vals[last.prevOpen[i]!] = Math.floor(a / 4 ** i) % 4
      let w = 1
      for (const x of last.closing) w *= METRIC[vals[x]!]!
      const v = sp.traceProductAtFull(
        M,
        this.letterAt(
          last.letter,
          last.own,
          Int8Array.from(last.own, (x) => vals[x]!),
        ),
      )
      total = F.add(total, w === 1 ? v : F.neg(v))
    }
    return total
  }

  /** Several factors: each a graded scalar tensor over its shared labels (ε labels preset in `fixed`). */
  private combine(m: Monomial, plans: TracePlan[], shared: number[], fixed: Int8Array | null): number {
    const { F, space: sp } = this.sol
    const sizes = m.factors.map((f) => f.letters.length)
    const total = sizes.reduce((a, b) => a + b, 0)
    const vals = fixed ?? new Int8Array(Math.max(0, ...plans.map((p) => p.maxLabel)) + 1)
    const tensors = m.factors.map((f, i) => ({
      labels: plans[i]!.external,
      values: f.type === 'trace' ? this.traceTensor(plans[i]!, total - sizes[i]!, vals.slice()) : this.detTensor(f, plans[i]!, vals.slice()),
    }))
    const full = sp.size - 1
    let out = 0
    for (let a = 0; a < 4 ** shared.length; a++) {
      let w = 1
      shared.forEach((x, i) => {
        const v = Math.floor(a / 4 ** i) % 4
        vals[x] = v
        w *= METRIC[v]!
      })
      let prod: GScalar | null = null
      for (const t of tensors) {
        let c = 0
        t.labels.forEach((x, i) => {
          c += vals[x]! * 4 ** i
        })
        const g = t.values[c]
        if (!g) {
          prod = null
          break
        }
        prod = prod === null ? g : sp.mulScalar(prod, g)
      }
      if (prod) out = F.add(out, w === 1 ? prod[full]! : F.neg(prod[full]!))
    }
    return out
  }

  private traceTensor(plan: TracePlan, reserve: number, vals: Int8Array): (GScalar | undefined)[] {
    return this.run(plan, reserve, plan.steps.length, vals).map((M) => (M ? this.sol.space.trace(M) : undefined))
  }

  /** (1/N!) Σ_{σ,τ} sgn σ sgn τ Π_k (X_k)_{σk τk} for every value of the external labels. */
  private detTensor(f: Factor, plan: TracePlan, preset: Int8Array): (GScalar | undefined)[] {
    const { F, space: sp } = this.sol
    const N = this.sol.config.N
    if (f.letters.length !== N) throw new EngineInputError('detTensor', `det needs ${N} letters for N = ${N}, got ${f.letters.length}`)
    const ext = plan.external
    const labels = distinctLabels(f.letters)
    const vals = new Int8Array(Math.max(preset.length, ...labels.map((x) => x + 1)))
    vals.set(preset)
    // labels neither shared nor preset (ε) are summed inside the determinant
    const presetLabels = new Set(plan.steps.flatMap((st) => st.own.filter((x) => !st.fresh.includes(x) && !st.prevOpen.includes(x) && !st.closing.includes(x))))
    const internal = labels.filter((x) => !ext.includes(x) && !presetLabels.has(x))
    const out: (GScalar | undefined)[] = new Array(4 ** ext.length)
    const perms = permutations(N)
    let fact = 1
    for (let k = 2; k <= N; k++) fact *= k
    const inv = F.inv(fact)
    for (let a = 0; a < out.length; a++) {
      ext.forEach((x, i) => {
        vals[x] = Math.floor(a / 4 ** i) % 4
      })
      const sum = sp.zeroScalar()
      for (let b = 0; b < 4 ** internal.length; b++) {
        let w = 1
        internal.forEach((x, i) => {
          const v = Math.floor(b / 4 ** i) % 4
          vals[x] = v
          w *= METRIC[v]!
        })
        const mats = f.letters.map((l) =>
          this.letter(
            l,
            l.d.map((x) => vals[x]!),
            l.idx.map((x) => vals[x]!),
          ),
        )
        const entry = (X: GMat, i: number, j: number): GScalar => Float64Array.from({ length: sp.size }, (_, S) => X[S * sp.nn + i * N + j]!)
        for (const [s, ss] of perms)
          for (const [t, ts] of perms) {
            let prod = entry(mats[0]!, s[0]!, t[0]!)
            for (let k = 1; k < N; k++) prod = sp.mulScalar(prod, entry(mats[k]!, s[k]!, t[k]!))
            const sign = ss * ts * w
            for (let S = 0; S < sp.size; S++) sum[S] = sign === 1 ? F.add(sum[S]!, prod[S]!) : F.sub(sum[S]!, prod[S]!)
          }
      }
      out[a] = sum.map((x) => F.mul(x, inv)) as GScalar
    }
    return out
  }
}

/** Labels shared between factors or with ε. */
function externalLabels(m: Monomial): Set<number> {
  const out = new Set<number>(m.eps ?? [])
  const where = new Map<number, number>()
  m.factors.forEach((f, i) => {
    for (const x of distinctLabels(f.letters)) {
      if (where.has(x) && where.get(x) !== i) out.add(x)
      where.set(x, i)
    }
  })
  return out
}
