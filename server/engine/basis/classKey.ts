/**
 * Operator classes of the explicit basis: a multiset of legs (species of the theory model)
 * and a number k of covariant derivatives, keyed by theory/classKey.ts ("D^2 H^2 H*^2").
 * Canonical leg order: theory order (field, then conjugate); identical legs are adjacent.
 */
import { EngineInputError } from '../errors'
import type { Species } from '../theory/model'
import { formatClassKey, readClassKey } from '../theory/classKey'

export interface OperatorClass {
  key: string
  k: number
  /** Legs in canonical order; identical particles are adjacent. */
  legs: Species[]
  /** Twice the mass dimension of the operators of this class. */
  dim2: number
}

/** Canonical key of a class (legs in canonical order). @example classKeyOf(2, [H,H,Hs,Hs]) // "D^2 H^2 H*^2" */
export function classKeyOf(k: number, legs: Species[]): string {
  const blocks: { label: string; power: number }[] = []
  for (const p of legs) {
    const last = blocks[blocks.length - 1]
    if (last?.label === p.label) last.power++
    else blocks.push({ label: p.label, power: 1 })
  }
  return formatClassKey(k, blocks)
}

/**
 * Build a class from k and a multiset of legs (sorted into theory order).
 * @example makeClass(ps, 0, [Hs, H, H]).key // "H^2 H*"
 */
export function makeClass(particles: Species[], k: number, legs: Species[]): OperatorClass {
  const order = new Map(particles.map((p, i) => [p.label, i]))
  const sorted = [...legs].sort((a, b) => order.get(a.label)! - order.get(b.label)!)
  const dim2 = 2 * k + sorted.reduce((s, p) => s + p.dim2, 0)
  return { key: classKeyOf(k, sorted), k, legs: sorted, dim2 }
}

/**
 * Parse a class key against the theory's species.
 * @example parseClassKey(ps, "D^2 H^2 H*^2").legs.length // 4
 * Throws EngineInputError naming the unknown field, or when fewer than minLegs fields remain.
 */
export function parseClassKey(particles: Species[], key: string, minLegs = 3): OperatorClass {
  const byLabel = new Map(particles.map((p) => [p.label, p]))
  const { derivatives, blocks } = readClassKey(key)
  const legs: Species[] = []
  for (const b of blocks) {
    const p = byLabel.get(b.label)
    if (!p) throw new EngineInputError('parseClassKey', `The class "${key}" names "${b.label}", which is not a field of this theory (its fields are ${[...byLabel.keys()].join(', ')})`)
    for (let i = 0; i < b.power; i++) legs.push(p)
  }
  if (legs.length < minLegs) throw new EngineInputError('parseClassKey', `The class "${key}" has fewer than ${minLegs} fields; an operator class needs at least ${minLegs}`)
  return makeClass(particles, derivatives, legs)
}

/**
 * Key of the conjugate class (every leg replaced by its conjugate).
 * @example conjugateClass(ps, class "L^2 H^2").key // "L*^2 H*^2"
 */
export function conjugateClass(particles: Species[], c: OperatorClass): OperatorClass {
  return makeClass(
    particles,
    c.k,
    c.legs.map((p) => particles[p.partner]!),
  )
}
