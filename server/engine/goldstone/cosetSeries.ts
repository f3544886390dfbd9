/**
 * Hilbert series of the chiral Lagrangian of SU(N)_L × SU(N)_R / SU(N)_V, one field content
 * (numbers of u, χ_+, χ_−, f_+, f_− letters) at a time:
 *   H = ∫_{O(4) × U(N)} (1/P) PE[Σ_blocks χ_tower ⊗ χ_flavor]  restricted to the content,
 * with the plethystic exponential expanded by Pólya's cycle index (a permutation of the identical
 * letters of each block; a cycle of length c evaluates the letter character at g^c). The four
 * traces H_{CP} of 1, P, C and CP on the invariants give the counts of each C, P sector:
 *   n(C = σ, P = τ) = ¼ Σ σ^{tc} τ^{tp} H_{tc tp}.
 * Method: the non-linear realization is counted as its free limit: the Goldstone letters are
 * the on-shell derivatives of u_μ (Maurer–Cartan puts the antisymmetric part into f_−, the EOM
 * removes traces), the sources are off-shell, and the trace relations of N × N matrices come
 * from the U(N) integral (unitaryIntegral.ts). Henning, Lu, Melia, Murayama, JHEP 10 (2017) 199,
 * sect. 6 (non-linear realizations); Graf, Henning, Lu, Melia, Murayama, "2, 12, 117, 1959,
 * 45171, 1170086, …: a Hilbert series for the QCD chiral Lagrangian", JHEP 01 (2021) 142.
 * ΔH: the empty content (the identity) is skipped, and a content of one letter is counted
 * directly (a Lorentz-scalar singlet without derivatives), which removes the only spurious
 * terms of ∫(1/P)Z here (the pseudoscalar q⁴ Λ⁴V of a single off-shell field strength).
 */
import { ExactSum } from '../counting/exactSum'
import { cycleTypes } from '../counting/cycleTypes'
import { factorial } from '../group/symmetricGroup'
import { EngineCancelledError, EngineConsistencyError } from '../errors'
import { add, div, isInteger, mul, rat, sum, toString as ratString, type Rational } from '../exact/rational'
import type { Block } from './blocks'
import { lorentzSeries, twistedLorentzSeries, type TowerCycle } from './lorentzIntegral'
import type { FlavorIntegrator } from './flavorModels'

/** The four traces [1, P, C, CP] of one content per chiral order, exact (cycle-index sums over n!). */
export interface ContentTraces {
  /** traces[t][d]: t = 2·(C twisted) + (P twisted), d the chiral order. */
  traces: Rational[][]
}

/** Caches shared by all contents of one count (one coset, N and highest order). */
export class CosetContext {
  readonly lorentz = new Map<string, number[]>()
  readonly twisted = new Map<string, number[]>()
  constructor(
    readonly flavor: FlavorIntegrator,
    readonly K: number,
    readonly signal?: { aborted: boolean },
  ) {}

  lorentzOf(factors: readonly TowerCycle[], twist: boolean): number[] {
    if (this.signal?.aborted) throw new EngineCancelledError('operator count')
    const key = factors
      .map((f) => `${f.kind}${f.cycle}`)
      .sort()
      .join(' ')
    const map = twist ? this.twisted : this.lorentz
    let hit = map.get(key)
    if (!hit) {
      hit = twist ? twistedLorentzSeries(factors, this.K) : lorentzSeries(factors, this.K)
      map.set(key, hit)
    }
    return hit
  }
}

interface Accumulators {
  traces: ExactSum[][]
}

/**
 * Count one content: blocks[i] appears counts[i] times. Orders below the content's lowest order are zero.
 * @example with blocks [u] and counts [4] at N = 3, K = 4: order 4 has 2 C-even P-even operators (⟨u·u⟩², ⟨u_μu_ν⟩⟨u^μu^ν⟩ after Cayley–Hamilton)
 */
export function contentTraces(ctx: CosetContext, blocks: readonly Block[], counts: readonly number[]): ContentTraces {
  const letters = counts.reduce((a, b) => a + b, 0)
  if (letters === 1) return singleLetter(ctx, blocks[counts.indexOf(1)]!)
  const acc: Accumulators = { traces: [0, 1, 2, 3].map(() => Array.from({ length: ctx.K + 1 }, () => new ExactSum())) }
  const present = blocks.map((b, i) => ({ b, n: counts[i]! })).filter((x) => x.n > 0)
  const cycles: { b: Block; c: number }[] = []
  const visit = (i: number, weight: number): void => {
    if (i === present.length) {
      accumulate(ctx, cycles, weight, acc)
      return
    }
    const { b, n } = present[i]!
    for (const ct of cycleTypes(n)) {
      for (const c of ct.parts) cycles.push({ b, c })
      visit(i + 1, weight * ct.size)
      cycles.length -= ct.parts.length
    }
  }
  visit(0, 1)
  const den = present.reduce((d, x) => d * factorial(x.n), 1n)
  return { traces: acc.traces.map((t) => t.map((x) => rat(x.value(), den))) }
}

function accumulate(ctx: CosetContext, cycles: readonly { b: Block; c: number }[], weight: number, acc: Accumulators): void {
  const factors = cycles.map(({ b, c }) => ({ kind: b.tower, cycle: c }))
  const flavorCycles = cycles.map(({ b, c }) => ({ kind: b.flavor, cycle: c }))
  let signP = 1
  let signC = 1
  for (const { b, c } of cycles) {
    if (c % 2 === 1) {
      signP *= b.parity
      signC *= b.charge
    }
  }
  const F = [ctx.flavor.singlets(flavorCycles, false), ctx.flavor.singlets(flavorCycles, true)]
  if (F[0] === 0 && F[1] === 0) return
  const L = [ctx.lorentzOf(factors, false), ctx.lorentzOf(factors, true)]
  for (let tc = 0; tc < 2; tc++) {
    if (F[tc] === 0) continue
    for (let tp = 0; tp < 2; tp++) {
      const sign = (tc ? signC : 1) * (tp ? signP : 1)
      const series = L[tp]!
      const out = acc.traces[2 * tc + tp]!
      for (let d = 0; d <= ctx.K; d++) if (series[d] !== 0) out[d]!.addProduct(weight, F[tc]!, series[d]!, sign)
    }
  }
}

/** The four sector counts of a class at one order; each must be a non-negative integer. */
export interface Sectors {
  cEvenPEven: number
  cEvenPOdd: number
  cOddPEven: number
  cOddPOdd: number
}

/**
 * Traces [1, P, C, CP] → the four sector counts n(C = σ, P = τ) = ¼ Σ σ^{tc} τ^{tp} H_{tc tp}.
 * `correction` (ΔH) is added to the sectors before the check.
 * @example sectorCounts([rat(2), rat(2), rat(2), rat(2)], 'u^2') // { cEvenPEven: 2, cEvenPOdd: 0, cOddPEven: 0, cOddPOdd: 0 }
 */
export function sectorCounts(traces: readonly Rational[], what: string, correction?: Partial<Sectors>): Sectors {
  const part = (sc: number, sp: number): number => {
    const name = `${sc === 1 ? 'cEven' : 'cOdd'}${sp === 1 ? 'PEven' : 'POdd'}` as keyof Sectors
    const raw = div(sum(traces.map((t, i) => mul(t, rat((i & 2 ? sc : 1) * (i & 1 ? sp : 1))))), rat(4))
    const x = add(raw, rat(correction?.[name] ?? 0))
    if (!isInteger(x) || x.num < 0n) {
      throw new EngineConsistencyError('sectorCounts', `the count of ${what} in the sector C = ${sc}, P = ${sp} is ${ratString(x)}, not a non-negative integer`)
    }
    return Number(x.num)
  }
  return { cEvenPEven: part(1, 1), cEvenPOdd: part(1, -1), cOddPEven: part(-1, 1), cOddPOdd: part(-1, -1) }
}

/** One letter: only a flavor singlet without derivatives survives integration by parts. */
function singleLetter(ctx: CosetContext, b: Block): ContentTraces {
  const traces = [0, 1, 2, 3].map(() => Array.from({ length: ctx.K + 1 }, () => rat(0)))
  if ((b.flavor === 'gl' || b.flavor === 'singlet') && b.tower === 'source' && ctx.K >= 2) {
    for (let t = 0; t < 4; t++) traces[t]![2] = rat((t & 2 ? b.charge : 1) * (t & 1 ? b.parity : 1))
  }
  return { traces }
}
