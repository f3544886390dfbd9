/**
 * Structures of heavy–light contact operators (ψ†Γψ)(light fields), in the particle's rest
 * frame: Γ = 1 or σ^i on the heavy pair; a light Dirac pair as e†(τ_a ⊗ Σ)e (τ_a acting on the
 * upper/lower components in the Dirac representation, Σ = 1 or σ^i; all sixteen Hermitian);
 * derivatives on legs — spatial ∂_i anywhere, ∂_t only on light legs (the heavy field's EOM
 * removes D_t on it) — and the spatial indices contracted by δ and at most one ε (rotation
 * scalars: Weyl, "The Classical Groups", 1939). Real coefficients; legs 0 = ψ†, 1 = ψ, then
 * the content's light legs.
 *
 * Symmetry signs of a structure with real coefficient (common practice; Peskin & Schroeder
 * §3.6 in the Dirac representation): P flips each spatial derivative and τ₁, τ₂ (γ⁰ = τ₃);
 * T (antiunitary) flips each Pauli matrix, τ₂ and each ∂_t; Hermitian conjugation only swaps
 * each leg with its conjugate leg (all matrices are Hermitian). Scalars are taken P-even.
 */
import { contractions } from './candidates'
import type { LightContent } from './lightContent'

export type Slot = { kind: 'hs' } | { kind: 'ds' } | { kind: 'd'; leg: number }

export interface LightStructure {
  heavySpin: boolean
  /** τ index 0..3 of the Dirac matrix, null without a light Dirac pair. */
  tau: number | null
  diracSpin: boolean
  /** Time derivatives per leg. */
  time: number[]
  slots: Slot[]
  pairs: Array<[number, number]>
  eps?: [number, number, number]
  /** Index into the content's colour tensors. */
  colour: number
}

export type LightCombo = Array<{ coef: number; s: LightStructure }>

function slotLabel(x: Slot): string {
  return x.kind === 'd' ? `d${x.leg}` : x.kind
}

/** Canonical key (slots of one kind are interchangeable) and the sign from ordering ε; null when ε kills it. */
export function lightKey(s: LightStructure): { key: string; sign: number } | null {
  const lab = s.slots.map(slotLabel)
  const pairs = s.pairs.map(([a, b]) => [lab[a]!, lab[b]!].sort().join('~')).sort()
  let sign = 1
  let eps = ''
  if (s.eps) {
    const e = s.eps.map((x) => lab[x]!)
    if (new Set(e).size < 3) return null
    for (let i = 0; i < 3; i++) for (let j = i + 1; j < 3; j++) if (e[i]! > e[j]!) sign = -sign
    eps = [...e].sort().join(',')
  }
  return { key: `${s.heavySpin ? 1 : 0}|${s.tau}|${s.diracSpin ? 1 : 0}|${s.time.join(',')}|${lab.slice().sort().join(',')}|${pairs.join(';')}|${eps}|${s.colour}`, sign }
}

/** Ways to place nd derivatives: spatial counts per leg and time counts on light legs. */
function placements(nLegs: number, nd: number): Array<{ space: number[]; time: number[] }> {
  const out: Array<{ space: number[]; time: number[] }> = []
  const rec = (leg: number, left: number, space: number[], time: number[]) => {
    if (leg === nLegs) {
      if (left === 0) out.push({ space: space.slice(), time: time.slice() })
      return
    }
    for (let sp = 0; sp <= left; sp++) {
      for (let t = 0; t <= (leg < 2 ? 0 : left - sp); t++) {
        space.push(sp)
        time.push(t)
        rec(leg + 1, left - sp - t, space, time)
        space.pop()
        time.pop()
      }
    }
  }
  rec(0, nd, [], [])
  return out
}

/**
 * Every contracted structure of a content with nd derivatives (de-duplicated by canonical
 * key; parity-odd ones dropped when `parity` is imposed).
 * @example lightStructures(scalarContent, 0, true).length // 1 for ψ†ψ φ
 */
export function lightStructures(content: LightContent, nd: number, parity: boolean): LightStructure[] {
  const nLegs = content.legs.length + 2
  const dirac = content.legs.some((l) => l.field!.kind === 'dirac')
  const seen = new Set<string>()
  const out: LightStructure[] = []
  for (const place of placements(nLegs, nd)) {
    for (const heavySpin of [false, true])
      for (const tau of dirac ? [0, 1, 2, 3] : [null])
        for (const diracSpin of dirac ? [false, true] : [false]) {
          const slots: Slot[] = [...(heavySpin ? [{ kind: 'hs' } as Slot] : []), ...(diracSpin ? [{ kind: 'ds' } as Slot] : [])]
          place.space.forEach((n, leg) => {
            for (let k = 0; k < n; k++) slots.push({ kind: 'd', leg })
          })
          const spatial = place.space.reduce((a, b) => a + b, 0)
          if (parity && paritySign(spatial, tau) < 0) continue
          for (const c of contractions(slots.length))
            for (let colour = 0; colour < content.colours.length; colour++) {
              const s: LightStructure = { heavySpin, tau, diracSpin, time: place.time, slots, pairs: c.pairs, eps: c.eps, colour }
              const k = lightKey(s)
              if (!k || seen.has(k.key)) continue
              seen.add(k.key)
              out.push(s)
            }
        }
  }
  return out
}

function paritySign(spatialDerivatives: number, tau: number | null): number {
  return (spatialDerivatives % 2 === 0 ? 1 : -1) * (tau === 1 || tau === 2 ? -1 : 1)
}

/** P sign of a structure (scalars P-even, the Dirac pair of intrinsic parity +1). */
export function lightParity(s: LightStructure): number {
  return paritySign(s.slots.filter((x) => x.kind === 'd').length, s.tau)
}

/** T sign of a structure with a real coefficient. */
export function lightTimeSign(s: LightStructure): number {
  const n = (s.heavySpin ? 1 : 0) + (s.diracSpin ? 1 : 0) + (s.tau === 2 ? 1 : 0) + s.time.reduce((a, b) => a + b, 0)
  return n % 2 === 0 ? 1 : -1
}

function colourKey(pairs: ReadonlyArray<{ a: number; b: number; eps: boolean }>): string {
  return pairs
    .map((p) => `${p.a}${p.eps ? 'e' : 'd'}${p.b}`)
    .sort()
    .join(',')
}

/**
 * Hermitian conjugate of a structure of a self-conjugate content: legs relabelled by `perm`
 * (ψ† ↔ ψ and each light leg ↔ a leg of its conjugate); colour pairings relabelled (pairs are
 * stored with a < b; an ε pair that comes out reversed gives a sign). Null when the relabelled
 * colour tensor is not in the content's list (cannot happen for a self-conjugate content).
 */
export function daggerLight(s: LightStructure, perm: readonly number[], content: LightContent): { coef: number; s: LightStructure } | null {
  const slots = s.slots.map((x): Slot => (x.kind === 'd' ? { kind: 'd', leg: perm[x.leg]! } : x))
  const time = s.time.map((_, leg) => s.time[perm.indexOf(leg)]!)
  let sign = 1
  const want = content.colours[s.colour]!.groups.map((g) =>
    colourKey(
      g.pairs.map((p) => {
        const a = perm[p.a]!
        const b = perm[p.b]!
        if (p.eps && a > b) sign = -sign
        return { a: Math.min(a, b), b: Math.max(a, b), eps: p.eps }
      }),
    ),
  ).join('|')
  const colour = content.colours.findIndex((c) => c.groups.map((g) => colourKey(g.pairs)).join('|') === want)
  if (colour < 0) return null
  return { coef: sign, s: { ...s, slots, time, colour } }
}

/** A leg permutation realising Hermitian conjugation on a self-conjugate content. */
export function conjugationPermutation(content: LightContent): number[] {
  const perm = [1, 0]
  const free = content.legs.map((_, i) => i)
  content.legs.forEach((l) => {
    const want = (x: typeof l) => x.field!.name === l.field!.name && (l.field!.kind === 'realScalar' || x.conj !== l.conj)
    const j = free.findIndex((i) => want(content.legs[i]!))
    perm.push(free[j]! + 2)
    free.splice(j, 1)
  })
  return perm
}
