/**
 * CP-even and CP-odd real parameters per class, from the trace of CP on the operators of a
 * self-conjugate class: #even − #odd = tr(CP) = ∫_{G·σ} (twisted integrand), the Hilbert series
 * integrated over the CP coset instead of the group (Molien–Weyl for the group extended by CP).
 *
 * Convention (stated with every result): CP maps each field to its conjugate with parity on
 * its Lorentz indices, CP(φ*) = CP(φ)*, exchanging upper and lower SU(n) indices; a real
 * field of a group whose conjugation is inner keeps intrinsic CP +1. Then a Hermitian operator
 * without ε^{μνρσ} (e.g. (ψ̄γ^μψ)(ψ̄γ_μψ), H†H G G) is CP-even, one with it (H†H G G̃) CP-odd,
 * and a class C with a distinct conjugate C̄ gives, for its n complex coefficients, n CP-even
 * (Re) and n CP-odd (Im) real parameters.
 *
 * Twisted cycle index of a self-conjugate content: a pair of conjugate species (s, s̄), each
 * m times, enters through the cycles of (σg)² on the m copies of s (cycle type λ ⊢ m, weight
 * |C_λ|/m!, Fermi sign (−1)^{ℓ(λ)}, flavours Nf^{ℓ(λ)}); a real species enters through the
 * cycles of σg. Lorentz part: cpLorentz.ts; non-abelian part: cpGroups.ts; U(1) and Z_n
 * factors are 1.
 * Checks: SMEFT dimension 6 (Alonso, Jenkins, Manohar, Trott, JHEP 04 (2014) 159) and
 * flavour-symmetric SMEFT (Faroughy, Isidori, Wilsch, Yamamoto, JHEP 08 (2020) 166).
 */
import { EngineConsistencyError } from '../errors'
import type { TheoryModel } from '../theory/model'
import type { FieldContent } from './classes'
import { cycleTypes } from './cycleTypes'
import { ExactSum } from './exactSum'
import { BASE_SPINS } from './lorentz'
import { cpLorentzSeries, type TwistedLorentzFactor } from './cpLorentz'
import { type TwistedGroup, type TwistedGroupEntry, conjugationIsInner, innerTwisted, suRealSupported, suTwisted } from './cpGroups'
import { groupKindLabel } from '../../../shared/schemas/groupKinds'

export const CP_CONVENTION =
  'CP maps each field to its conjugate (parity on Lorentz indices, upper and lower SU(n) indices exchanged, real fields of other groups with intrinsic CP +1): a Hermitian operator is CP-even unless it carries ε^{μνρσ}; the n complex coefficients of a class with a distinct conjugate class give n CP-even and n CP-odd real parameters'

/** Why CP counts cannot be given for this theory, or null when they can. */
export function cpUnavailable(model: TheoryModel): string | null {
  if (model.finite.length > 0) {
    return `CP counts are not given for theories with a finite flavour group (${model.finite.map((g) => g.table.label).join(', ')}): which automorphism acts as CP there is a model-building choice`
  }
  const outer = model.lie.find((g) => !conjugationIsInner(g.rs))
  if (outer) return `CP counts are not given for ${outer.name} = ${groupKindLabel(outer.kind, outer.n)}: complex conjugation is an outer automorphism of it`
  for (const sp of model.species) {
    if (sp.partner !== model.species.indexOf(sp)) continue
    const bad = model.su.find((g) => sp.reps[g.name]!.some((a) => a !== 0) && !suRealSupported(g.n, sp.reps[g.name]!))
    if (bad)
      return `CP counts are not given for the real field ${sp.field} in SU(${bad.n}) [${sp.reps[bad.name]!.join(',')}]: only real representations of the form [α; α] (traceless tensors with equal upper and lower index shapes) have the index-swap CP used here`
  }
  return null
}

/** Caches of one count run. */
export class CpContext {
  readonly groups: TwistedGroup[]
  readonly lorentz = new Map<string, number[]>()
  readonly shapes = new Map<string, bigint[]>()
  constructor(readonly model: TheoryModel) {
    this.groups = [...model.su.map((g) => suTwisted(g.n)), ...model.lie.map((g) => innerTwisted(g.rs))]
  }
}

/** True when every species appears as often as its conjugate. */
export function isSelfConjugate(model: TheoryModel, counts: readonly number[]): boolean {
  return model.species.every((sp, s) => counts[s] === counts[sp.partner])
}

/** The counts of the conjugate content. */
export function conjugateCounts(model: TheoryModel, counts: readonly number[]): number[] {
  const out = new Array<number>(counts.length).fill(0)
  model.species.forEach((sp, s) => {
    out[sp.partner] = counts[s]!
  })
  return out
}

interface Orbit {
  s: number
  m: number
  kind: 'pair' | 'self'
}

/**
 * tr(CP) on the operators of a self-conjugate content, per derivative number (content order).
 * @example cpTrace(ctx, content of 'H H* G_L G_R' …) // [#even − #odd]
 */
export function cpTrace(ctx: CpContext, content: FieldContent): bigint[] {
  const { model } = ctx
  const orbits: Orbit[] = []
  model.species.forEach((sp, s) => {
    const m = content.counts[s]!
    if (m === 0 || sp.partner < s) return
    orbits.push({ s, m, kind: sp.partner === s ? 'self' : 'pair' })
  })
  const key = orbits.map((o) => `${o.s}:${o.m}`).join(' ') + `|${content.derivatives.join(',')}`
  const hit = ctx.shapes.get(key)
  if (hit) return hit
  const K = Math.max(...content.derivatives)
  const sums = content.derivatives.map(() => new ExactSum())
  const lorentz: TwistedLorentzFactor[] = []
  const entries: TwistedGroupEntry[][] = ctx.groups.map(() => [])
  const visit = (i: number, w: number, flavors: number): void => {
    if (i === orbits.length) {
      let g = 1
      for (let k = 0; k < ctx.groups.length && g !== 0; k++) if (entries[k]!.length) g *= ctx.groups[k]!.integrate(entries[k]!)
      if (g === 0) return
      const series = lorentzSeries(ctx, lorentz, K)
      content.derivatives.forEach((d, j) => {
        if (series[d]) sums[j]!.addProduct(w, g, flavors, series[d]!)
      })
      return
    }
    const o = orbits[i]!
    const sp = model.species[o.s]!
    const reps = [...model.su.map((g) => sp.reps[g.name]!), ...model.lie.map((g) => sp.lie[g.name]!)]
    for (const ct of cycleTypes(o.m)) {
      const sign = sp.fermion && o.kind === 'pair' ? (ct.length % 2 === 0 ? 1 : -1) : 1
      for (const c of ct.parts) {
        lorentz.push({ kind: o.kind, spins: BASE_SPINS[sp.lorentz], cycle: c })
        reps.forEach((a, k) => {
          if (a.some((x) => x !== 0)) entries[k]!.push({ kind: o.kind, rep: a.join(','), cycle: c })
        })
      }
      visit(i + 1, w * sign * ct.size, flavors * sp.flavors ** ct.length)
      for (const _ of ct.parts) {
        lorentz.pop()
        reps.forEach((a, k) => {
          if (a.some((x) => x !== 0)) entries[k]!.pop()
        })
      }
    }
  }
  visit(0, 1, 1)
  let den = 1n
  for (const o of orbits) for (let f = 2n; f <= BigInt(o.m); f++) den *= f
  const out = sums.map((s, j) => {
    const v = s.value()
    if (v % den !== 0n) throw new EngineConsistencyError('cpTrace', `twisted sum ${v}/${den} is not an integer for content [${content.counts.join(',')}] with ${content.derivatives[j]} derivatives`)
    return v / den
  })
  ctx.shapes.set(key, out)
  return out
}

function lorentzSeries(ctx: CpContext, factors: TwistedLorentzFactor[], K: number): number[] {
  const key = factors
    .map((f) => `${f.kind}${f.spins.join('.')}^${f.cycle}`)
    .sort()
    .join('|')
  let s = ctx.lorentz.get(key)
  if (!s || s.length <= K) {
    s = cpLorentzSeries(factors, K)
    ctx.lorentz.set(key, s)
  }
  return s
}

/**
 * CP-even and CP-odd parameters of a self-conjugate class with n operators and CP trace t.
 * Throws EngineConsistencyError unless |t| <= n and t ≡ n (mod 2).
 */
export function cpSplit(n: bigint, t: bigint, key: string): { even: number; odd: number } {
  if (t > n || -t > n || (n - t) % 2n !== 0n) throw new EngineConsistencyError('cpSplit', `class ${key}: CP trace ${t} is impossible for ${n} operators`)
  return { even: Number((n + t) / 2n), odd: Number((n - t) / 2n) }
}
