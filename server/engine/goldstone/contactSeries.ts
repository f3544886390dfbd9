/**
 * Hilbert series of the contact terms: local invariants of G = SU(N)_L × SU(N)_R built from the
 * external sources alone (no Goldstone field): χ = 2B(s + ip) → R χ L†, χ†, F_Lμν, F_Rμν and
 * their covariant derivatives, modulo integration by parts and the Bianchi identities (sources
 * have no equation of motion). A content is (n_χ, n_χ†, n_FL, n_FR, n_v), v_μν the field strength of
 * the optional singlet vector source (each twist maps it to itself: sign −1 per letter under C and CP).
 *
 * Discrete symmetries: P exchanges χ ↔ χ† and F_L ↔ F_R (and L ↔ R in G); C sends χ → χ^T,
 * F_L → −F_R^T, F_R → −F_L^T; CP sends χ → χ̄ (= χ†^T), F_L → −F_L^T. A twist that exchanges two
 * letter types pairs them: a cycle of length k of the pairs is a 2k-th power of the twisted
 * element on one type, whose square is an ordinary group element (T² = (h_R h_L, h_L h_R) for P,
 * (h̄_R h_L, h̄_L h_R) for C, (h̄_L h_L, h̄_R h_R) for CP). The flavor integrals then reduce to
 * power sums (unitaryIntegral.ts): with T twisted-conjugate to C∘(1, g), χ gives p_c(g) for odd
 * c and p_{c/2}(g)² for even c.
 * Method: as cosetSeries.ts (Pólya cycle index, Lorentz towers, Schur–Weyl flavor integrals).
 * ΔH: ⟨F_L F̃_L⟩ and ⟨F_R F̃_R⟩ are total derivatives of Chern–Simons currents, which the
 * Euler characteristic ∫(1/P)Z still counts; they are removed by hand (see contactTopological).
 * Reference: Henning, Lu, Melia, Murayama, JHEP 10 (2017) 199; Macdonald (1995), I.7 and VI.9.
 */
import { ExactSum } from '../counting/exactSum'
import { cycleTypes, type CycleType } from '../counting/cycleTypes'
import { add as addRat, rat, type Rational } from '../exact/rational'
import { factorial } from '../group/symmetricGroup'
import type { CosetContext } from './cosetSeries'
import type { TowerCycle } from './lorentzIntegral'
import { adjointSinglets, conjugationSinglets, specialPairing, withTracesRemoved } from './unitaryIntegral'

/** (n_χ, n_χ†, n_FL, n_FR, n_v): n_v letters of the singlet vector source's field strength v_μν (C = −1, a G-singlet). */
export type ContactContent = readonly [number, number, number, number, number]

type Traces = ExactSum[][]

function freshTraces(K: number): Traces {
  return [0, 1, 2, 3].map(() => Array.from({ length: K + 1 }, () => new ExactSum()))
}

function add(ctx: CosetContext, out: ExactSum[], series: readonly number[], weight: number, flavor: number, sign: number): void {
  if (flavor === 0) return
  for (let d = 0; d <= ctx.K; d++) if (series[d] !== 0) out[d]!.addProduct(weight, flavor, series[d]!, sign)
}

/** Odd cycle c → c; even cycle c → c/2, c/2 (a power sum of g or the square of one). */
function split(parts: readonly number[]): number[] {
  return parts.flatMap((c) => (c % 2 === 1 ? [c] : [c / 2, c / 2]))
}

const src = (c: number): TowerCycle => ({ kind: 'source', cycle: c })
const str = (c: number): TowerCycle => ({ kind: 'strength', cycle: c })

/** Iterate over tuples of cycle types, one per size, with the product of class sizes. */
function eachCycleTuple(sizes: readonly number[], visit: (types: CycleType[], weight: number) => void): void {
  const types: CycleType[] = []
  const rec = (i: number, w: number): void => {
    if (i === sizes.length) {
      visit(types, w)
      return
    }
    for (const ct of cycleTypes(sizes[i]!)) {
      types.push(ct)
      rec(i + 1, w * ct.size)
      types.pop()
    }
  }
  rec(0, 1)
}

/** The singlet letters' cycles: field strengths of their own cycle lengths, and their sign under C ((−1) per letter). */
const singletSign = (n: number, charge: boolean): number => (charge && n % 2 === 1 ? -1 : 1)

function untwisted(ctx: CosetContext, N: number, [a, b, c, d, e]: ContactContent, out: ExactSum[]): void {
  eachCycleTuple([a, b, c, d, e], ([x, y, l, r, v], w) => {
    const left = withTracesRemoved([], l!.parts, (kept) => specialPairing(N, [...y!.parts, ...kept], [...x!.parts, ...kept]))
    if (left === 0) return
    const right = withTracesRemoved([], r!.parts, (kept) => specialPairing(N, [...x!.parts, ...kept], [...y!.parts, ...kept]))
    const factors = [...x!.parts.map(src), ...y!.parts.map(src), ...l!.parts.map(str), ...r!.parts.map(str), ...v!.parts.map(str)]
    add(ctx, out, ctx.lorentzOf(factors, false), w, left * right, 1)
  })
}

function chargeTwisted(ctx: CosetContext, N: number, [a, b, c, , e]: ContactContent, out: ExactSum[]): void {
  eachCycleTuple([a, b, c, e], ([x, y, f, v], w) => {
    const flavor = withTracesRemoved([], f!.parts, (kept) => specialPairing(N, [...split(x!.parts), ...kept], [...split(y!.parts), ...kept]))
    const factors = [...x!.parts.map(src), ...y!.parts.map(src), ...f!.parts.map((k) => str(2 * k)), ...v!.parts.map(str)]
    add(ctx, out, ctx.lorentzOf(factors, false), w, flavor, singletSign(e, true))
  })
}

function parityTwisted(ctx: CosetContext, N: number, [a, , c, , e]: ContactContent, out: ExactSum[]): void {
  eachCycleTuple([a, c, e], ([x, f, v], w) => {
    const flavor = withTracesRemoved(x!.parts, f!.parts, (nu) => adjointSinglets(N, nu))
    const factors = [...x!.parts.map((k) => src(2 * k)), ...f!.parts.map((k) => str(2 * k)), ...v!.parts.map(str)]
    add(ctx, out, ctx.lorentzOf(factors, true), w, flavor, 1)
  })
}

function bothTwisted(ctx: CosetContext, N: number, [a, , c, d, e]: ContactContent, out: ExactSum[]): void {
  eachCycleTuple([a, c, d, e], ([x, l, r, v], w) => {
    const side = (parts: readonly number[]) => withTracesRemoved([], parts, (kept) => conjugationSinglets(N, [...x!.parts, ...split(kept)]))
    const flavor = side(l!.parts) * side(r!.parts)
    const sign = [...l!.parts, ...r!.parts].reduce((s, j) => (j % 2 === 1 ? -s : s), 1) * singletSign(e, true)
    const factors = [...x!.parts.map((k) => src(2 * k)), ...l!.parts.map(str), ...r!.parts.map(str), ...v!.parts.map(str)]
    add(ctx, out, ctx.lorentzOf(factors, true), w, flavor, sign)
  })
}

/**
 * The four traces [1, P, C, CP] of one orbit of contents under P and C (a content and its images
 * (b, a, d, c), (a, b, d, c), (b, a, c, d)), per chiral order; the twisted traces only receive the
 * contents the twist maps to themselves.
 * @example contactTraces(ctx, 3, [1, 1, 0, 0]) at order 4 gives ⟨χχ†⟩ (and det χ for N = 2 from [2, 0, 0, 0])
 */
export function contactTraces(ctx: CosetContext, N: number, content: ContactContent): Rational[][] {
  const [a, b, c, d, e] = content
  const members = new Map<string, ContactContent>()
  for (const m of [
    [a, b, c, d, e],
    [b, a, d, c, e],
    [a, b, d, c, e],
    [b, a, c, d, e],
  ] as const)
    members.set(m.join(','), m)
  const out = [0, 1, 2, 3].map(() => Array.from({ length: ctx.K + 1 }, () => rat(0)))
  for (const m of members.values()) {
    const acc = freshTraces(ctx.K)
    untwisted(ctx, N, m, acc[0]!)
    if (m[0] === m[1] && m[2] === m[3]) parityTwisted(ctx, N, m, acc[1]!)
    if (m[2] === m[3]) chargeTwisted(ctx, N, m, acc[2]!)
    if (m[0] === m[1]) bothTwisted(ctx, N, m, acc[3]!)
    // The untwisted sum runs over S_a × S_b × S_c × S_d, a twisted one over the groups of its pairs.
    const f = factorial
    const dens = [f(m[0]) * f(m[1]) * f(m[2]) * f(m[3]), f(m[0]) * f(m[2]), f(m[0]) * f(m[1]) * f(m[2]), f(m[0]) * f(m[2]) * f(m[3])].map((x) => x * f(m[4]))
    acc.forEach((row, t) =>
      row.forEach((x, o) => {
        out[t]![o] = addRat(out[t]![o]!, rat(x.value(), dens[t]!))
      }),
    )
  }
  return out
}

/**
 * ΔH (to add): topological densities the Euler characteristic keeps: ε^{μνρσ}⟨F_Lμν F_Lρσ⟩ ± (L → R) at order 4
 * in the orbit of (0, 0, 2, 0, 0), and ε^{μνρσ} v_μν v_ρσ (C-even P-odd) for (0, 0, 0, 0, 2), the sum C-even P-odd and the difference C-odd P-even (both total
 * derivatives of Chern–Simons currents, hence not operators).
 */
export function contactTopological(content: ContactContent, order: number): { cEvenPOdd: number; cOddPEven: number } {
  const [a, b, c, d, e] = content
  if (order === 4 && a + b + c + d === 0 && e === 2) return { cEvenPOdd: -1, cOddPEven: 0 } // ε v_μν v_ρσ, abelian Chern–Simons
  const hit = order === 4 && a === 0 && b === 0 && e === 0 && c + d === 2 && c !== 1
  return { cEvenPOdd: hit ? -1 : 0, cOddPEven: hit ? -1 : 0 }
}
