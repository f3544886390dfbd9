/**
 * Field contents of heavy–light contact operators (ψ†…ψ)(light fields): the multisets of
 * light legs allowed by the gauge and global symmetries up to a maximal order, and the
 * colour tensors that make each content an invariant (δ between fundamental and
 * antifundamental indices, and ε for SU(2)), checked against the group-theory count.
 */
import { EngineInputError } from '../errors'
import { add, neg, isZero, type Rational, ZERO } from '../exact/rational'
import { characterProduct, singletCount, suConjugate, suWeights, trivialCharacter } from '../group'
import { chargeOf, type LightField, type TheoryGroupLike } from './lightFields'

/** One leg: the heavy field's conjugate (0), the heavy field (1), or a light field or its conjugate. */
export interface Leg {
  field: LightField | null
  conj: boolean
}

export interface ColourPair {
  a: number
  b: number
  eps: boolean
}
/** Per SU group with charged legs: the list of index pairings of one invariant tensor. */
export interface ColourTensor {
  groups: Array<{ n: number; pairs: ColourPair[] }>
}

export interface LightContent {
  /** Light legs (the heavy legs 0 = ψ†, 1 = ψ come first in every leg list). */
  legs: Leg[]
  key: string
  /** Twice the mass dimension of the light legs. */
  dim2: number
  selfConjugate: boolean
  colours: ColourTensor[]
}

export interface HeavyQuantumNumbers {
  reps: Record<string, number[]>
  charges: Record<string, string | number>
}

const legName = (l: Leg): string => `${l.field!.name}${l.conj ? '*' : ''}`

function legOptions(fields: readonly LightField[]): Leg[] {
  return fields.flatMap((f) =>
    f.kind === 'realScalar'
      ? [{ field: f, conj: false }]
      : [
          { field: f, conj: false },
          { field: f, conj: true },
        ],
  )
}

/** Multisets of legs with total doubled dimension ≤ max2 (indices non-decreasing). */
function multisets(options: readonly Leg[], max2: number, start = 0): Leg[][] {
  const out: Leg[][] = [[]]
  for (let i = start; i < options.length; i++) {
    const d = options[i]!.field!.dim2
    if (d > max2) continue
    for (const rest of multisets(options, max2 - d, i)) out.push([options[i]!, ...rest])
  }
  return out
}

function diracShapeOk(legs: readonly Leg[]): boolean {
  const dirac = legs.filter((l) => l.field!.kind === 'dirac')
  if (dirac.length === 0) return true
  return dirac.length === 2 && dirac.filter((l) => l.conj).length === 1
}

function neutral(legs: readonly Leg[], groups: readonly TheoryGroupLike[]): boolean {
  for (const g of groups) {
    if (g.type === 'SU') continue
    let q: Rational = ZERO
    for (const l of legs) q = add(q, l.conj ? neg(chargeOf(l.field!, g.name)) : chargeOf(l.field!, g.name))
    if (g.type === 'Z' ? Number(q.num % BigInt(g.n ?? 1)) !== 0 || q.den !== 1n : !isZero(q)) return false
  }
  return true
}

function repOf(leg: Leg, i: number, group: TheoryGroupLike, heavy: HeavyQuantumNumbers): number[] {
  const n = group.n ?? 2
  const base = i < 2 ? heavy.reps[group.name] : leg.field!.reps[group.name]
  const labels = base && base.length === n - 1 ? base : new Array<number>(n - 1).fill(0)
  const conj = i === 0 ? true : i === 1 ? false : leg.conj
  return conj ? suConjugate(n, labels) : labels
}

function singlets(all: readonly Leg[], group: TheoryGroupLike, heavy: HeavyQuantumNumbers): number {
  const n = group.n ?? 2
  let ch = trivialCharacter(n)
  all.forEach((l, i) => {
    ch = characterProduct(ch, suWeights(n, repOf(l, i, group, heavy)))
  })
  return singletCount(n, ch)
}

function indexType(labels: readonly number[], n: number, what: string, group: string): 'up' | 'down' | null {
  if (labels.every((x) => x === 0)) return null
  const one = labels.reduce((s, x) => s + x, 0) === 1
  if (one && labels[0] === 1) return 'up'
  if (one && labels[n - 2] === 1) return 'down'
  throw new EngineInputError(
    'heavyLight',
    `${what.charAt(0).toUpperCase()}${what.slice(1)} sits in [${labels.join(',')}] of ${group}; heavy–light operators support only singlets, fundamentals and antifundamentals`,
  )
}

function pairings(items: number[], types: Map<number, 'up' | 'down'>, n: number): ColourPair[][] {
  if (items.length === 0) return [[]]
  const [a, ...rest] = items
  const out: ColourPair[][] = []
  rest.forEach((b, j) => {
    const same = types.get(a!) === types.get(b)
    if (same && n !== 2) return
    const remaining = rest.filter((_, k) => k !== j)
    for (const p of pairings(remaining, types, n)) out.push([{ a: a!, b, eps: same }, ...p])
  })
  return out
}

/** Colour tensors of a content: products over SU groups of index pairings. */
function colourTensors(all: readonly Leg[], groups: readonly TheoryGroupLike[], heavy: HeavyQuantumNumbers): ColourTensor[] {
  let tensors: ColourTensor[] = [{ groups: [] }]
  for (const g of groups) {
    if (g.type !== 'SU') continue
    const n = g.n ?? 2
    const types = new Map<number, 'up' | 'down'>()
    all.forEach((l, i) => {
      const t = indexType(repOf(l, i, g, heavy), n, i < 2 ? 'the heavy particle' : `light field ${l.field!.name}`, g.name)
      if (t) types.set(i, t)
    })
    if (types.size === 0) continue
    const options = pairings([...types.keys()], types, n)
    tensors = tensors.flatMap((t) => options.map((pairs) => ({ groups: [...t.groups, { n, pairs }] })))
  }
  return tensors
}

/**
 * Allowed light contents with doubled light dimension ≤ max2, each with its colour tensors.
 * Throws for light representations other than singlets, fundamentals and antifundamentals.
 * @example lightContents(electronOnly, qedGroups, heavyQN, 6).map(c => c.key) // ["e e*"]
 */
export function lightContents(fields: readonly LightField[], groups: readonly TheoryGroupLike[], heavy: HeavyQuantumNumbers, max2: number): LightContent[] {
  const heavyLegs: Leg[] = [
    { field: null, conj: true },
    { field: null, conj: false },
  ]
  const out: LightContent[] = []
  for (const legs of multisets(legOptions(fields), max2)) {
    if (legs.length === 0 || !diracShapeOk(legs) || !neutral(legs, groups)) continue
    const all = [...heavyLegs, ...legs]
    const counts = groups.filter((g) => g.type === 'SU').map((g) => singlets(all, g, heavy))
    if (counts.some((c) => c === 0)) continue
    const colours = colourTensors(all, groups, heavy)
    const names = legs.map(legName)
    const conjNames = legs.map((l) => (l.field!.kind === 'realScalar' ? legName(l) : legName({ ...l, conj: !l.conj })))
    out.push({
      legs,
      key: names.join(' '),
      dim2: legs.reduce((s, l) => s + l.field!.dim2, 0),
      selfConjugate: [...names].sort().join(' ') === [...conjNames].sort().join(' '),
      colours,
    })
  }
  return out
}

/** Product of the SU singlet counts of a content (checked against the rank of its colour tensors). */
export function colourInvariantCount(content: LightContent, groups: readonly TheoryGroupLike[], heavy: HeavyQuantumNumbers): number {
  const all: Leg[] = [{ field: null, conj: true }, { field: null, conj: false }, ...content.legs]
  return groups.filter((g) => g.type === 'SU').reduce((s, g) => s * singlets(all, g, heavy), 1)
}
