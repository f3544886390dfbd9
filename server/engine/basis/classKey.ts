/**
 * Operator classes: a multiset of particles and a number k of covariant derivatives,
 * written as a key such as "D^2 H^2 H*^2", "G_L^3" or "Q Q* u u*".
 * Canonical order: "D^k" first, then particles in theory order (field, then conjugate).
 */
import { EngineInputError } from '../errors'
import type { Particle } from './particles'

export interface OperatorClass {
  key: string
  k: number
  /** Legs in canonical order; identical particles are adjacent. */
  legs: Particle[]
  /** Twice the mass dimension of the operators of this class. */
  dim2: number
}

/** Canonical key of a class. @example classKeyOf(2, [H,H,Hs,Hs]) // "D^2 H^2 H*^2" */
export function classKeyOf(k: number, legs: Particle[]): string {
  const parts: string[] = []
  if (k > 0) parts.push(k === 1 ? 'D' : `D^${k}`)
  let i = 0
  while (i < legs.length) {
    let j = i
    while (j < legs.length && legs[j]!.label === legs[i]!.label) j++
    parts.push(j - i === 1 ? legs[i]!.label : `${legs[i]!.label}^${j - i}`)
    i = j
  }
  return parts.join(' ')
}

/**
 * Build a class from k and a multiset of legs (sorted into theory order).
 * @example makeClass(ps, 0, [Hs, H, H]).key // "H^2 H*"
 */
export function makeClass(particles: Particle[], k: number, legs: Particle[]): OperatorClass {
  const order = new Map(particles.map((p, i) => [p.label, i]))
  const sorted = [...legs].sort((a, b) => order.get(a.label)! - order.get(b.label)!)
  const dim2 = 2 * k + sorted.reduce((s, p) => s + p.dim2, 0)
  return { key: classKeyOf(k, sorted), k, legs: sorted, dim2 }
}

/**
 * Parse a class key against the theory's particles.
 * @example parseClassKey(ps, "D^2 H^2 H*^2").legs.length // 4
 * Throws EngineInputError naming the unknown token.
 */
export function parseClassKey(particles: Particle[], key: string, minLegs = 3): OperatorClass {
  const byLabel = new Map(particles.map((p) => [p.label, p]))
  let k = 0
  const legs: Particle[] = []
  for (const tok of key.trim().split(/\s+/)) {
    const m = /^(.+?)(?:\^(\d+))?$/.exec(tok)
    if (!m) throw new EngineInputError('parseClassKey', `Cannot read "${tok}" in the class "${key}"; write a class as fields with powers, e.g. "D^2 phi^2 phi*^2"`)
    const mult = m[2] === undefined ? 1 : Number(m[2])
    if (m[1] === 'D') { k += mult; continue }
    const p = byLabel.get(m[1]!)
    if (!p) throw new EngineInputError('parseClassKey', `The class "${key}" names "${m[1]}", which is not a field of this theory (its fields are ${[...byLabel.keys()].join(', ')})`)
    for (let i = 0; i < mult; i++) legs.push(p)
  }
  if (legs.length < minLegs) throw new EngineInputError('parseClassKey', `The class "${key}" has fewer than 3 fields; an operator class needs at least 3`)
  return makeClass(particles, k, legs)
}

/**
 * Key of the conjugate class (every leg replaced by its conjugate).
 * @example conjugateClass(ps, class "L^2 H^2").key // "L*^2 H*^2"
 */
export function conjugateClass(particles: Particle[], c: OperatorClass): OperatorClass {
  const byLabel = new Map(particles.map((p) => [p.label, p]))
  return makeClass(particles, c.k, c.legs.map((p) => byLabel.get(p.conjugate)!))
}
