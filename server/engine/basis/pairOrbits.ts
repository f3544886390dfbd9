/**
 * The symmetrisation of (Lorentz, gauge) pairs over the permutations of identical legs, planned
 * once per class instead of evaluated per point. Relabelling a structure's legs by σ gives
 * ± another structure (signs from bracket and ε orderings), so
 *   Sym(c)(x) = Σ_σ sgn σ · c(σ·x) = Σ_σ sgn σ · s_σ · c_σ(x),
 * a fixed integer combination of relabelled structures evaluated at x once each. And if
 * relabelling pair k by τ gives s × pair j, then Sym(k) = sgn τ · s · Sym(j)
 * (Σ_σ sgn σ c(σ∘τ) = sgn τ Σ_ρ sgn ρ c(ρ)), so one pair per orbit is planned.
 * Six identical SU(2) triplets: 265 trace structures, 720 permutations, a handful of orbits.
 * Reference: common practice (Bose/Fermi symmetrisation is a group average).
 */
import type { SuStructure } from './gaugeStructures'
import type { LorentzStructure } from './lorentzStructures'
import type { LegPermutation } from './symmetry'

export interface Pair {
  lorentz: LorentzStructure
  gauge: SuStructure[]
}

/** Pair k's symmetrised values are `sign` × those of pair `rep` (rep = k for representatives). */
export interface OrbitLink {
  rep: number
  sign: number
}

export interface SymmetrisationPlan {
  links: OrbitLink[]
  /** Relabelled structures, each evaluated once per point with the legs as they are. */
  lorentz: LorentzStructure[]
  gauge: SuStructure[][]
  /** Per representative: Sym = Σ coeff · lorentz[l] · gauge[g]. */
  terms: Map<number, { l: number; g: number; coeff: number }[]>
}

/**
 * Relabellings (one per pair, one per permutation for each orbit representative) beyond which
 * the planning stops and the caller sums directly.
 */
const MAX_KEY_WORK = 2_000_000

interface Image<T> {
  key: string
  sign: number
  value: T
}

/** A structure's brackets relabelled by τ, each ordered i < j (a swap flips the sign). */
function moveBrackets(list: [number, number][], tau: number[], acc: { sign: number }): [number, number][] {
  const out = list.map(([i, j]): [number, number] => {
    const a = tau[i]!
    const b = tau[j]!
    if (a > b) acc.sign = -acc.sign
    return a < b ? [a, b] : [b, a]
  })
  return out.sort((x, y) => x[0] - y[0] || x[1] - y[1])
}

function lorentzImage(l: LorentzStructure, tau: number[]): Image<LorentzStructure> {
  const acc = { sign: 1 }
  const angle = moveBrackets(l.angle, tau, acc)
  const square = moveBrackets(l.square, tau, acc)
  const derivs = l.derivs.slice()
  l.derivs.forEach((d, i) => {
    derivs[tau[i]!] = d
  })
  return { key: `${angle.join(';')}[${square.join(';')}]`, sign: acc.sign, value: { derivs, angle, square } }
}

/** Sign of the permutation that sorts `xs` (distinct numbers). */
function sortSign(xs: number[]): number {
  let s = 1
  for (let i = 0; i < xs.length; i++) for (let j = i + 1; j < xs.length; j++) if (xs[i]! > xs[j]!) s = -s
  return s
}

/** The slot each slot moves to when leg a becomes leg tau[a] (same position among the leg's slots). */
function slotMap(slots: SuStructure['slots'], tau: number[]): number[] {
  const byLeg = new Map<number, number[]>()
  slots.forEach((sl, i) => {
    const list = byLeg.get(sl.leg) ?? []
    list.push(i)
    byLeg.set(sl.leg, list)
  })
  return slots.map((sl, i) => byLeg.get(tau[sl.leg]!)![byLeg.get(sl.leg)!.indexOf(i)]!)
}

function gaugeImage(g: SuStructure[], moves: number[][]): Image<SuStructure[]> {
  let sign = 1
  const value = g.map((s, gi) => {
    const move = moves[gi]!
    const deltas = s.deltas.map(([u, l]): [number, number] => [move[u]!, move[l]!]).sort((x, y) => x[0] - y[0] || x[1] - y[1])
    const eps = s.eps
      .map((block) => {
        const moved = block.map((x) => move[x]!)
        sign *= sortSign(moved)
        return moved.sort((x, y) => x - y)
      })
      .sort((x, y) => x[0]! - y[0]!)
    return { ...s, deltas, eps }
  })
  return { key: value.map((s) => `${s.group}:${s.deltas.join(';')}|${s.eps.join(';')}`).join('/'), sign, value }
}

/** Index of each distinct image (by key), adding new ones to `list`. */
function intern<T>(index: Map<string, number>, list: T[], img: Image<T>): number {
  let i = index.get(img.key)
  if (i === undefined) {
    i = list.length
    index.set(img.key, i)
    list.push(img.value)
  }
  return i
}

/**
 * The plan for these pairs, or null when the permutations are not a signed group action or
 * the planning would cost more than it saves.
 * @example symmetrisationPlan(pairs of Ξ⁶, 720 permutations)!.terms.size // a few representatives
 */
export function symmetrisationPlan(pairs: Pair[], perms: LegPermutation[]): SymmetrisationPlan | null {
  if (perms.length < 2 || perms.some((p) => Math.abs(p.sign) !== 1)) return null
  // Conjugated structures carry their own slot arrays: share the maps by layout.
  const byLayout = new Map<string, number[][]>()
  const moveCache = new Map<SuStructure['slots'], number[][]>()
  const movesOf = (g: SuStructure[], t: number): number[][] =>
    g.map((s) => {
      let m = moveCache.get(s.slots)
      if (!m) {
        const layout = s.slots.map((sl) => `${sl.leg}${sl.upper ? 'u' : 'l'}${sl.box ?? ''}`).join(',')
        m = byLayout.get(layout) ?? perms.map((p) => slotMap(s.slots, p.map))
        byLayout.set(layout, m)
        moveCache.set(s.slots, m)
      }
      return m[t]!
    })
  const plan: SymmetrisationPlan = { links: [], lorentz: [], gauge: [], terms: new Map() }
  const lIndex = new Map<string, number>()
  const gIndex = new Map<string, number>()
  const orbit = new Map<string, OrbitLink>()
  const identity = perms.findIndex((q) => q.map.every((x, i) => x === i))
  if (identity < 0) return null
  let work = 0
  for (let k = 0; k < pairs.length; k++) {
    const p = pairs[k]!
    const self = lorentzImage(p.lorentz, perms[identity]!.map)
    const selfG = gaugeImage(p.gauge, movesOf(p.gauge, identity))
    const seen = orbit.get(`${self.key}#${selfG.key}`)
    if (seen) {
      plan.links.push({ rep: seen.rep, sign: self.sign * selfG.sign * seen.sign })
      continue
    }
    work += perms.length
    if (work > MAX_KEY_WORK) return null
    plan.links.push({ rep: k, sign: 1 })
    const acc = new Map<string, { l: number; g: number; coeff: number }>()
    imagesOf(p, perms, movesOf).forEach((img, t) => {
      // p∘τ = img.sign · canon, so a pair equal to s' · canon has Sym = s' · img.sign · sgn τ · Sym(p).
      if (!orbit.has(img.key)) orbit.set(img.key, { rep: k, sign: img.sign * perms[t]!.sign })
      const l = intern(lIndex, plan.lorentz, img.l)
      const g = intern(gIndex, plan.gauge, img.g)
      const term = acc.get(`${l},${g}`) ?? { l, g, coeff: 0 }
      term.coeff += perms[t]!.sign * img.sign
      acc.set(`${l},${g}`, term)
    })
    plan.terms.set(
      k,
      [...acc.values()].filter((x) => x.coeff !== 0),
    )
  }
  return plan
}

interface PairImage {
  key: string
  sign: number
  l: Image<LorentzStructure>
  g: Image<SuStructure[]>
}

/** The pair relabelled by every permutation, in the order of `perms`. */
function imagesOf(p: Pair, perms: LegPermutation[], movesOf: (g: SuStructure[], t: number) => number[][]): PairImage[] {
  return perms.map((perm, t) => {
    const l = lorentzImage(p.lorentz, perm.map)
    const g = gaugeImage(p.gauge, movesOf(p.gauge, t))
    return { key: `${l.key}#${g.key}`, sign: l.sign * g.sign, l, g }
  })
}
