/**
 * Lower a printed operator to its contact amplitude in one class: the Feynman rule with
 * spinor-helicity wave-functions (scalar 1, ψ → λ, ψ̄ → λ̃, F_L → λλ, F_R → λ̃λ̃, D_μ → the
 * leg's momentum λλ̃), evaluated as a tensor network at a sample point, so that the basis's
 * fingerprint machinery (rewrite.ts) can compare it with the kept operators.
 *
 * Conventions: a field strength contributes the helicity the class asks for (an operator
 * with k field strengths lands in up to 2^k classes); the k-th written occurrence of a
 * species goes to the k-th leg of that species, the symmetrisation over identical legs and
 * the Fermi sign are added by the caller; a fermion reordering from written to leg order
 * gives its sign. Factors of i (literal, σ^{μν}, f^{ABC}, ∂ → i p, duals) are summed into
 * one power i^e; terms whose powers differ by an odd number cannot be compared over Q and
 * are refused, and an overall odd power is reported (the amplitude is i times the value).
 */
import { EngineConsistencyError, EngineInputError } from '../errors'
import type { PrimeField } from '../finite/primeField'
import type { Species, TheoryModel } from '../theory/model'
import type { OperatorClass } from '../basis/classKey'
import type { SamplePoint } from '../basis/evaluation'
import type { SuWave } from '../basis/gaugeStructures'
import type { ParsedOperator } from './ast'
import { buildSkeleton, type FieldObject, type Skeleton, type SkeletonObject, type SlotType } from './skeleton'
import { build, contractAll, type Tensor } from './tensor'
import { adjointMetric, chargeEntry, EPS, diracWave, gamma5Entry, gammaEntry, generatorEntry, leviEntry, sigmaEntry, structureEntry, vectorMetric } from './spinors'

/** One way a term lands in the class: a species per field and the resulting legs. */
interface Placement {
  skeleton: Skeleton
  coeff: { num: bigint; den: bigint }
  species: Species[]
  legs: number[]
  phase: number
  sign: number
}

export interface LoweredOperator {
  placements: Placement[]
  /** True when the amplitude is i times the evaluated value (an odd power of i throughout). */
  timesI: boolean
  /** Class keys the operator touches (for messages). */
  evaluate(F: PrimeField, point: SamplePoint, map: number[]): number
}

/** The species a written field can be: a field strength either helicity, else one. */
function speciesChoices(model: TheoryModel, o: FieldObject): Species[] {
  const all = model.species.filter((s) => s.field === o.item.name)
  const f = all[0]!
  if (f.lorentz === 'FL' || f.lorentz === 'FR') return all
  if (o.item.tilde && (f.fermion || !model.su.some((g) => g.n === 2 && f.suKind[g.name] !== 'singlet'))) {
    throw new EngineInputError('readOperator', `At position ${o.item.pos + 1}: a tilde on ${o.item.name} is read as ε ${o.item.name}* and needs an SU(2) doublet scalar`)
  }
  const conj = o.item.conj !== o.item.tilde
  return [all.find((s) => s.conj === conj) ?? f]
}

function* assignments(choices: Species[][]): Generator<Species[]> {
  if (choices.length === 0) {
    yield []
    return
  }
  for (const s of choices[0]!) for (const rest of assignments(choices.slice(1))) yield [s, ...rest]
}

/** Legs for each written field (k-th occurrence of a species → k-th such leg), or null. */
function legsFor(cls: OperatorClass, species: Species[]): number[] | null {
  const used = new Set<number>()
  const out: number[] = []
  for (const s of species) {
    const leg = cls.legs.findIndex((l, i) => l.label === s.label && !used.has(i))
    if (leg < 0) return null
    used.add(leg)
    out.push(leg)
  }
  return used.size === cls.legs.length ? out : null
}

function permutationSign(xs: number[]): number {
  let s = 1
  for (let i = 0; i < xs.length; i++) for (let j = i + 1; j < xs.length; j++) if (xs[i]! > xs[j]!) s = -s
  return s
}

/**
 * Lower a parsed operator onto one class.
 * @example lowerOperator(model, cls, parseNotation("(H^\\dagger H)^3", …)).placements.length // 1
 * Throws EngineInputError when no term lands in the class, or the powers of i disagree.
 */
export function lowerOperator(model: TheoryModel, cls: OperatorClass, op: ParsedOperator): LoweredOperator {
  const placements: Placement[] = []
  for (const term of op.terms) {
    const sk = buildSkeleton(model, op.text, term)
    const derivs = sk.fields.reduce((s, f) => s + f.derivs.length, 0)
    if (derivs !== cls.k) continue
    for (const species of assignments(sk.fields.map((f) => speciesChoices(model, f)))) {
      const legs = legsFor(cls, species)
      if (!legs) continue
      const fermionLegs = legs.filter((_, i) => species[i]!.fermion)
      placements.push({ skeleton: sk, coeff: term.coeff, species, legs, phase: termPhase(sk, species) + term.iPower, sign: permutationSign(fermionLegs) })
    }
  }
  if (placements.length === 0)
    throw new EngineInputError('readOperator', `"${op.text}" has no part in the class ${cls.key}: its fields or its number of derivatives differ (the class has ${cls.k} derivatives)`)
  const parity = ((placements[0]!.phase % 2) + 2) % 2
  if (placements.some((p) => ((p.phase % 2) + 2) % 2 !== parity))
    throw new EngineInputError(
      'readOperator',
      `"${op.text}" adds terms with and without a factor i in the class ${cls.key}; such a sum is not a rational combination, write its Hermitian parts as separate operators`,
    )
  const groups = model.su.filter((g) => cls.legs.some((l) => l.suKind[g.name] !== 'singlet')).map((g) => g.name)
  return {
    placements,
    timesI: parity === 1,
    evaluate: (F, point, map) => {
      let total = 0
      for (const p of placements) {
        const v = evaluatePlacement(F, model, p, point, map, groups)
        const e = (((p.phase - parity) % 4) + 4) % 4
        const c = F.div(F.from(p.coeff.num), F.from(p.coeff.den))
        const sgn = (e === 2 ? -1 : 1) * p.sign
        total = F.add(total, F.mul(sgn === 1 ? c : F.neg(c), v))
      }
      return total
    },
  }
}

/** i's from the Feynman rule: ∂ → i p per derivative, σ^{μν} and f carry i, F̃_L = −i F_L, F̃_R = i F_R. */
function termPhase(sk: Skeleton, species: Species[]): number {
  let e = 0
  sk.fields.forEach((f, i) => {
    e += f.derivs.length
    if (f.item.tilde && (species[i]!.lorentz === 'FL' || species[i]!.lorentz === 'FR')) e += species[i]!.lorentz === 'FL' ? 3 : 1
  })
  for (const o of sk.objects)
    if ((o.kind === 'matrix' && o.item.which === 'sigma') || (o.kind === 'tensor' && (o.item.which === 'f' || (o.item.which === 'epsilon' && o.slots[0]!.type.startsWith('adj'))))) e += 1
  return e
}

function dimOf(model: TheoryModel, t: SlotType): number {
  if (t === 'vec' || t === 'dirac') return 4
  const n = model.su.find((g) => g.name === t.split(':')[1])!.n
  return t.startsWith('adj') ? n * n : n
}

function evaluatePlacement(F: PrimeField, model: TheoryModel, p: Placement, pt: SamplePoint, map: number[], groups: string[]): number {
  const sk = p.skeleton
  const tensors: Tensor[] = []
  const rename = new Map<object, string>()
  for (const pair of sk.pairs) {
    if (pair.type !== 'vec' && !pair.type.startsWith('adj')) continue
    const second = `${pair.b.label}#2`
    rename.set(pair.b, second)
    const n = pair.type === 'vec' ? 0 : model.su.find((g) => g.name === pair.type.slice(4))!.n
    const d = dimOf(model, pair.type)
    tensors.push(build([pair.a.label, second], [d, d], ([x, y]) => (pair.type === 'vec' ? half(F, 2 * vectorMetric(x!, y!)) : F.from(adjointMetric(n, x!, y!)))))
  }
  const lab = (s: { label: string }): string => rename.get(s) ?? s.label
  sk.fields.forEach((f, i) => tensors.push(...fieldTensors(F, model, f, p.species[i]!, map[p.legs[i]!]!, pt, groups, lab)))
  for (const o of sk.objects) if (o.kind !== 'field') tensors.push(objectTensor(F, model, o, lab))
  return contractAll(F, tensors)
}

function half(F: PrimeField, twice: number): number {
  return F.div(F.from(twice), F.from(2))
}

function fieldTensors(F: PrimeField, model: TheoryModel, f: FieldObject, s: Species, leg: number, pt: SamplePoint, groups: string[], lab: (s: { label: string }) => string): Tensor[] {
  const lam = pt.kin.lam[leg]!
  const lamt = pt.kin.lamt[leg]!
  const out: Tensor[] = []
  if (f.dirac) out.push(build([lab(f.dirac)], [4], ([d]) => diracWave(F, s.lorentz === 'L' ? lam : lamt, s.lorentz === 'L', f.item.conj && !f.item.transpose)[d!]!))
  if (s.lorentz === 'FL') out.push(build(f.vecs.map(lab), [4, 4], ([v, w]) => F.mul(F.mul(lam[v! >> 1]!, lam[w! >> 1]!), F.from(EPS[v! & 1]![w! & 1]!))))
  if (s.lorentz === 'FR') out.push(build(f.vecs.map(lab), [4, 4], ([v, w]) => F.mul(F.mul(lamt[v! & 1]!, lamt[w! & 1]!), F.from(EPS[v! >> 1]![w! >> 1]!))))
  for (const d of f.derivs) out.push(build([lab(d)], [4], ([v]) => F.mul(lam[v! >> 1]!, lamt[v! & 1]!)))
  for (const [g, slot] of Object.entries(f.gauge)) {
    const gi = groups.indexOf(g)
    const wave = gi >= 0 ? (pt.waves[gi]![leg] ?? null) : null
    out.push(...gaugeTensors(F, model, g, wave, lab(slot), f.item.tilde && s.lorentz === 'S'))
  }
  return out
}

function gaugeTensors(F: PrimeField, model: TheoryModel, g: string, wave: SuWave, label: string, tilde: boolean): Tensor[] {
  const n = model.su.find((x) => x.name === g)!.n
  if (wave === null) throw new EngineConsistencyError('lowerOperator', `no ${g} wave-function for a charged leg`)
  if (!Array.isArray(wave))
    throw new EngineInputError(
      'readOperator',
      `A field of ${g} in a representation other than the fundamental, its conjugate or the adjoint cannot be typed in printed notation yet; type it in the bracket syntax (legs, brackets and {g:K} contractions)`,
    )
  if (Array.isArray(wave[0])) return [build([label], [n * n], ([a]) => (wave as number[][])[Math.floor(a! / n)]![a! % n]!)]
  if (!tilde) return [build([label], [n], ([a]) => (wave as number[])[a!]!)]
  const inner = `${label}~t`
  return [build([inner], [n], ([a]) => (wave as number[])[a!]!), build([label, inner], [n, n], ([a, b]) => F.from(EPS[a!]![b!]!))]
}

function objectTensor(F: PrimeField, model: TheoryModel, o: Exclude<SkeletonObject, FieldObject>, lab: (s: { label: string }) => string): Tensor {
  const labels = o.slots.map(lab)
  const dims = o.slots.map((s) => dimOf(model, s.type))
  if (o.kind === 'tensor') {
    const n = model.su.find((g) => g.name === o.group)!.n
    if (o.item.which === 'epsilon' && o.slots[0]!.type.startsWith('adj') && n === 2 && o.slots.length === 3) {
      // ε^{IJK} = f^{IJK} for SU(2)
      return build(labels, dims, ([a, b, c]) => structureEntry(F, 'f', n, a!, b!, c!))
    }
    if (o.item.which === 'epsilon') {
      if (o.slots.length !== n || o.slots[0]!.type.startsWith('adj'))
        throw new EngineInputError('readOperator', `At position ${o.item.pos + 1}: ε of ${o.group} = SU(${n}) needs ${n} fundamental indices`)
      return build(labels, dims, (ix) => F.from(leviEntry(ix)))
    }
    if (o.item.which === 'delta') return build(labels, dims, ([a, b]) => (a === b ? 1 : 0))
    return build(labels, dims, ([a, b, c]) => structureEntry(F, o.item.which as 'f' | 'd', n, a!, b!, c!))
  }
  const w = o.item.which
  if (w === 'gamma') return build(labels, dims, ([v, d, e]) => F.from(gammaEntry(v!, d!, e!)))
  if (w === 'sigma') return build(labels, dims, ([v, x, d, e]) => half(F, 2 * sigmaEntry(v!, x!, d!, e!)))
  if (w === 'gamma5') return build(labels, dims, ([d, e]) => F.from(gamma5Entry(d!, e!)))
  if (w === 'PL' || w === 'PR') return build(labels, dims, ([d, e]) => (d === e && d! < 2 === (w === 'PL') ? 1 : 0))
  if (w === 'C') return build(labels, dims, ([d, e]) => F.from(chargeEntry(d!, e!)))
  const n = model.su.find((g) => g.name === o.group)!.n
  const scale = o.item.symbol === 'T' ? 1 : 2
  return build(labels, dims, ([a, r, s]) => F.mul(F.from(scale), generatorEntry(F, n, a!, r!, s!)))
}
