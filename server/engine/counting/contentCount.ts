/**
 * Hilbert-series coefficient of one field content, for each derivative number k:
 *   H = ∫ dμ_Lorentz dμ_groups (1/P) Π_species PE_±[φ_s χ_s]  restricted to Π φ_s^{n_s} D^k.
 * The plethystic exponential restricted to φ_s^{n_s} is the cycle-index sum
 * (1/n_s!) Σ_λ (±1)^{n_s−ℓ} (n_s!/z_λ) Nf_s^{ℓ(λ)} Π_cycles χ_s(g^c) (Fermi sign for fermions,
 * Nf_s flavors entering only as Nf^ℓ). For a fixed cycle type the integrand factorizes into
 * a Lorentz part (times 1/P) and one part per SU(n) group, each integrated once and cached.
 * Reference: Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016 (arXiv:1512.03433), sect. 3–4.
 */
import { EngineConsistencyError } from '../errors'
import { rat, toString as ratToString } from '../exact/rational'
import type { Species, TheoryModel } from '../theory/model'
import { cycleTypes } from './cycleTypes'
import { CycleMultiset, MAX_CYCLE } from './cycleMultiset'
import { ExactSum } from './exactSum'
import { GroupIntegrator, type IntegrationScheme, finiteScheme, lieScheme, suScheme } from './groupFactor'
import { lorentzSingletSeries, type LorentzFactor } from './lorentz'
import type { FieldContent } from './classes'

const LORENTZ_CODES: readonly LorentzFactor['type'][] = ['S', 'L', 'R', 'FL', 'FR']

/** Caches shared by all contents of one counting run. */
export class CountContext {
  readonly lorentz = new Map<string, number[]>()
  /** One integrator per non-abelian group: the SU groups, then the other Lie groups, then the finite ones. */
  readonly groups: GroupIntegrator<unknown, unknown>[]
  /** Per non-abelian group: the distinct non-trivial reps (keys) of the theory. */
  readonly repList: string[][]
  /** Per species per non-abelian group: index into repList, or -1 for a singlet. */
  readonly repIndex: number[][]
  /** Per species: index of its Lorentz type in LORENTZ_CODES. */
  readonly lorentzIndex: number[]
  /** Per species: the text of everything but U(1)/Z_n charges that the count depends on. */
  readonly speciesShape: string[]
  /** Results per content shape (contents equal up to U(1)/Z_n charges and species order). */
  readonly shapes = new Map<string, ContentResult>()
  /** Scratch multisets of the Lorentz and non-abelian cycle data (empty between contents). */
  readonly lorentzCycles = new CycleMultiset(LORENTZ_CODES.length)
  readonly groupCycles: CycleMultiset[]
  constructor(
    readonly model: TheoryModel,
    readonly maxDim: number,
  ) {
    this.groups = [...model.su.map((g) => integrator(suScheme(g.n))), ...model.lie.map((g) => integrator(lieScheme(g.rs))), ...model.finite.map((g) => integrator(finiteScheme(g.table)))]
    this.repList = this.groups.map(() => [])
    this.repIndex = model.species.map((sp) =>
      speciesRepKeys(model, sp).map((key, g) => {
        if (key === null) return -1
        const list = this.repList[g]!
        if (!list.includes(key)) list.push(key)
        return list.indexOf(key)
      }),
    )
    this.lorentzIndex = model.species.map((sp) => LORENTZ_CODES.indexOf(sp.lorentz))
    this.speciesShape = model.species.map((sp, s) => `${sp.lorentz}/${this.repIndex[s]!.join(',')}/${sp.flavored ? 'f' : ''}${sp.flavors}`)
    this.groupCycles = this.repList.map((reps) => new CycleMultiset(Math.max(1, reps.length)))
  }
}

/** An integrator with its scheme's types erased (the count only reads integers from it). */
function integrator<T, F>(scheme: IntegrationScheme<T, F>): GroupIntegrator<unknown, unknown> {
  return new GroupIntegrator(scheme) as unknown as GroupIntegrator<unknown, unknown>
}

/**
 * A species' representation key per non-abelian group in CountContext order (Dynkin labels
 * "1,0" for Lie groups, the irrep index for finite groups), null for the trivial one.
 */
export function speciesRepKeys(model: TheoryModel, sp: Species): (string | null)[] {
  const labels = [...model.su.map((g) => sp.reps[g.name]!), ...model.lie.map((g) => sp.lie[g.name]!)]
  const lie = labels.map((a) => (a.every((x) => x === 0) ? null : a.join(',')))
  return [...lie, ...model.finite.map((g) => sp.finite[g.name]!).map((i) => (i === 0 ? null : String(i)))]
}

export interface ContentResult {
  /** Count per derivative number (same order as content.derivatives). */
  counts: bigint[]
  /** Coefficients of Nf^0, Nf^1, ... per derivative number (rational strings). */
  polynomials: string[][]
}

/**
 * Count the operators of one field content for each allowed derivative number.
 * @example countFieldContent(ctx, { counts: countsOfClassKey(smeftModel, 'H^3 H*^3').counts, fieldDim2: 12, derivatives: [0] }).counts // [1n]
 */
export function countFieldContent(ctx: CountContext, content: FieldContent): ContentResult {
  const present: number[] = []
  for (let i = 0; i < content.counts.length; i++) if (content.counts[i]! > 0) present.push(i)
  const shape = shapeKey(ctx, content, present)
  const hit = ctx.shapes.get(shape)
  if (hit) return hit
  const result = evaluateContent(ctx, content, present)
  ctx.shapes.set(shape, result)
  return result
}

/** Everything the cycle-index sum depends on, species sorted (the sum is symmetric in them). */
function shapeKey(ctx: CountContext, content: FieldContent, present: number[]): string {
  const parts: string[] = []
  for (const s of present) parts.push(`${ctx.speciesShape[s]}/${content.counts[s]}`)
  return `${parts.sort().join(' ')}|${content.derivatives.join(',')}`
}

function evaluateContent(ctx: CountContext, content: FieldContent, present: number[]): ContentResult {
  const { model } = ctx
  const K = Math.max(...content.derivatives)
  const ks = content.derivatives
  const direct = ks.map(() => new ExactSum())
  const poly = ks.map(() => [] as ExactSum[])
  const lorentz = ctx.lorentzCycles
  const groups = ctx.groupCycles
  const visit = (p: number, w: number, flavorFactor: number, cycles: number): void => {
    if (p === present.length) {
      const g = groupPart(ctx, groups)
      if (g === 0) return
      const series = lorentzPart(ctx, lorentz, K)
      for (let j = 0; j < ks.length; j++) {
        const l = series[ks[j]!]!
        if (l === 0) continue
        direct[j]!.addProduct(w, g, flavorFactor, l)
        ;(poly[j]![cycles] ??= new ExactSum()).addProduct(w, g, l)
      }
      return
    }
    const s = present[p]!
    const sp = model.species[s]!
    const reps = ctx.repIndex[s]!
    const lcode = ctx.lorentzIndex[s]!
    for (const ct of cycleTypes(content.counts[s]!)) {
      updateCycles(lorentz, groups, lcode, reps, ct.parts, 1)
      const sign = sp.fermion ? ct.sign : 1
      visit(p + 1, w * sign * ct.size, flavorFactor * sp.flavors ** ct.length, cycles + (sp.flavored ? ct.length : 0))
      updateCycles(lorentz, groups, lcode, reps, ct.parts, -1)
    }
  }
  visit(0, 1, 1, 0)
  const den = present.reduce((acc, s) => acc * factorial(content.counts[s]!), 1n)
  const counts = direct.map((acc, j) => exactQuotient(acc.value(), den, content, j))
  const polynomials = poly.map((coeffs) => {
    const out: string[] = []
    for (let i = 0; i < coeffs.length; i++) out.push(ratToString(rat(coeffs[i]?.value() ?? 0n, den)))
    return out.length === 0 ? ['0'] : out
  })
  return { counts, polynomials }
}

function updateCycles(lorentz: CycleMultiset, groups: CycleMultiset[], lcode: number, reps: number[], parts: readonly number[], delta: number): void {
  for (const c of parts) {
    if (c > MAX_CYCLE) throw new EngineConsistencyError('countFieldContent', `cycle length ${c} above ${MAX_CYCLE}`)
    lorentz.add(lcode, c, delta)
    for (let g = 0; g < reps.length; g++) if (reps[g]! >= 0) groups[g]!.add(reps[g]!, c, delta)
  }
}

function groupPart(ctx: CountContext, groups: CycleMultiset[]): number {
  let g = 1
  for (let i = 0; i < groups.length && g !== 0; i++) {
    const integrator = ctx.groups[i]!
    if (groups[i]!.isEmpty()) continue
    const key = groups[i]!.key()
    g *= integrator.integrateKeyed(key, () => groups[i]!.list().map(([r, cycle]) => ({ rep: ctx.repList[i]![r]!, cycle })))
  }
  return g
}

function lorentzPart(ctx: CountContext, factors: CycleMultiset, K: number): number[] {
  const key = factors.key()
  let series = ctx.lorentz.get(key)
  if (!series || series.length <= K) {
    series = lorentzSingletSeries(
      factors.list().map(([t, cycle]) => ({ type: LORENTZ_CODES[t]!, cycle })),
      K,
    )
    ctx.lorentz.set(key, series)
  }
  return series
}

function exactQuotient(total: bigint, den: bigint, content: FieldContent, j: number): bigint {
  if (total % den !== 0n || total < 0n) {
    throw new EngineConsistencyError('countFieldContent', `count ${total}/${den} is not a non-negative integer for content [${content.counts.join(',')}] with ${content.derivatives[j]} derivatives`)
  }
  return total / den
}

function factorial(n: number): bigint {
  let f = 1n
  for (let i = 2; i <= n; i++) f *= BigInt(i)
  return f
}
