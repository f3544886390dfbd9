/**
 * The space of bilinear operators ψ† O ψ at one order in 1/m (dim O = order + 1), modulo
 * the heavy field's leading-order EOM and integration by parts, restricted to rotation
 * scalars that are parity even and — after Hermitian completion — time-reversal even.
 */
import { EngineInputError, EngineCancelledError } from '../errors'
import type { CancelFlag } from '../finite'
import { elementSignature, type Element } from './algebra'
import { candidateStructures, relationStructures, tracedStructures } from './candidates'
import { QuotientSpace } from './quotient'
import { daggerCombo, expandCombo, expandStructure, simplifyCombo, thetaCombo, type Combo } from './structure'

export interface SymmetricCandidate {
  combo: Combo
  /** Anti-Hermitian in the real algebra (the physical operator carries a factor i). */
  antiHermitian: boolean
  element: Element
}

export interface OrderSpace {
  order: number
  charged: boolean
  colorN: number
  candidates: SymmetricCandidate[]
  space: QuotientSpace
}

const cache = new Map<string, OrderSpace>()

function gcd(a: number, b: number): number {
  let x = Math.abs(a)
  let y = Math.abs(b)
  while (y) [x, y] = [y, x % y]
  return x
}

/**
 * Hermitian, Θ = T∘†-even completions of each candidate structure, de-duplicated.
 * Θ-even and †-definite ⇔ the physical operator (times i if anti-Hermitian) is Hermitian
 * and time-reversal even.
 */
export function symmetricCandidates(order: number, signal?: CancelFlag, colorN = 1): SymmetricCandidate[] {
  const seen = new Set<string>()
  const out: SymmetricCandidate[] = []
  const structures = colorN > 1 ? [...tracedStructures(order + 1), ...candidateStructures(order + 1)] : candidateStructures(order + 1)
  for (const s of structures) {
    if (signal?.aborted) throw new EngineCancelledError('heavy enumeration')
    const base: Combo = [{ coef: 1, s }]
    const sym = simplifyCombo([...base, ...thetaCombo(base)])
    if (sym.length === 0) continue
    for (const anti of [false, true]) {
      const raw = simplifyCombo([...sym, ...daggerCombo(sym).map((t) => ({ coef: anti ? -t.coef : t.coef, s: t.s }))])
      if (raw.length === 0) continue
      const g = raw.reduce((acc, t) => gcd(acc, t.coef), 0)
      const c = raw.map((t) => ({ coef: t.coef / g, s: t.s }))
      const element = expandCombo(c)
      if (element.size === 0) continue
      const sig = elementSignature(element)
      if (seen.has(sig)) continue
      seen.add(sig)
      out.push({ combo: c, antiHermitian: anti, element })
    }
  }
  return out
}

/**
 * Build (or fetch from the memo) the quotient space at one order.
 * @example orderSpace(1, true).space.dimension // 2 (kinetic D² and σ·B)
 * Method: candidates and relations mapped to their gauge-field symbols over two primes
 * (see symbol.ts, quotient.ts); greedy basis in candidate order.
 * Reference: Manohar, Phys. Rev. D 56 (1997) 230 (operator basis of the heavy-fermion theory).
 */
export function orderSpace(order: number, charged: boolean, signal?: CancelFlag, colorN = 1): OrderSpace {
  if (!Number.isInteger(order) || order < 1 || order > 4) {
    throw new EngineInputError('orderSpace', `order in 1/m must be an integer 1..4, got ${order}`)
  }
  if (colorN > 1 && order > 3) {
    throw new EngineInputError('orderSpace', `non-abelian (SU(${colorN})) enumeration is limited to order 3 in 1/m, got ${order}`)
  }
  const key = `${order}:${charged}:${colorN}`
  const hit = cache.get(key)
  if (hit) return hit
  const candidates = symmetricCandidates(order, signal, charged ? colorN : 1)
  const relations = relationStructures(order + 1).map(expandStructure).filter((e) => e.size > 0)
  const space = new QuotientSpace(candidates.map((c) => c.element), relations, {
    sectors: charged ? [0, 1, 2] : [0],
    signal,
    colorN: charged ? colorN : 1,
  })
  const res: OrderSpace = { order, charged, colorN, candidates, space }
  cache.set(key, res)
  return res
}
