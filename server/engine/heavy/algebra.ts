/**
 * The algebra of gauge-covariant differential operators acting on a heavy two-component field,
 * written as real linear combinations of words in the covariant derivatives.
 *
 * Conventions (abelian gauge field, coupling g absorbed into the connection):
 *   D_t = ∂_t + igA⁰, D = ∇ − igA (both anti-Hermitian as operators),
 *   ℰ_i := [D_t, D_i] = igE_i,  ℬ_k := ½ ε_kij [D_i, D_j] = −igB_k,  s_k := iσ_k,
 * so that every coefficient is rational (s_i s_j = −δ_ij − ε_ijk s_k, a quaternion algebra).
 * A bilinear ψ'† X ψ modulo integration by parts is the differential operator X acting on ψ
 * (all derivatives moved off ψ'†), so X itself is the object we manipulate.
 *
 * An Element maps a key "<spin>:<word>" to an integer coefficient; spin 0 is the unit and
 * 1..3 are s_1..s_3; a word is a string of digits 0 (D_t) and 1..3 (D_x, D_y, D_z), the
 * leftmost letter acting last. A word "t<digits>" (non-abelian only) stands for the colour
 * trace of the function that <digits> produces acting on a constant, times the unit matrix.
 */
import { EngineInputError } from '../errors'

export type Element = Map<string, number>

/** Key of a term. */
export function termKey(spin: number, word: string): string {
  return `${spin}:${word}`
}

/** Split a key into spin component and word. */
export function splitKey(key: string): { spin: number; word: string } {
  return { spin: Number(key[0]), word: key.slice(2) }
}

function addTerm(out: Element, key: string, c: number): void {
  if (c === 0) return
  const v = (out.get(key) ?? 0) + c
  if (!Number.isSafeInteger(v)) throw new EngineInputError('heavy algebra', `coefficient overflow at ${key}`)
  if (v === 0) out.delete(key)
  else out.set(key, v)
}

/** a + f·b. */
export function addScaled(a: Element, b: Element, f = 1): Element {
  const out = new Map(a)
  for (const [k, c] of b) addTerm(out, k, c * f)
  return out
}

/** Product of two quaternion units: s_a s_b = sign · s_c (0 is the unit). */
export function spinProduct(a: number, b: number): { spin: number; sign: number } {
  if (a === 0) return { spin: b, sign: 1 }
  if (b === 0) return { spin: a, sign: 1 }
  if (a === b) return { spin: 0, sign: -1 }
  const c = 6 - a - b
  return { spin: c, sign: -levi(a, b, c) }
}

/** Levi-Civita symbol ε_abc for a, b, c in 1..3. */
export function levi(a: number, b: number, c: number): number {
  if (a === b || b === c || a === c) return 0
  return (b - a) * (c - a) * (c - b) > 0 ? 1 : -1
}

/** Product in the algebra (words concatenate, spins multiply; spins commute with words). */
export function multiply(a: Element, b: Element): Element {
  const out: Element = new Map()
  for (const [ka, ca] of a) {
    const sa = Number(ka[0])
    const wa = ka.slice(2)
    for (const [kb, cb] of b) {
      const wb = kb.slice(2)
      if ((wa.startsWith('t') && wb !== '') || (wb.startsWith('t') && wa !== '')) {
        throw new EngineInputError('multiply', `a colour trace can only multiply spin matrices, got "${wa}" · "${wb}"`)
      }
      const { spin, sign } = spinProduct(sa, Number(kb[0]))
      addTerm(out, termKey(spin, wa + kb.slice(2)), sign * ca * cb)
    }
  }
  return out
}

/** The element of one letter with a concrete index (1..3) where it has one. */
export function letterElement(letter: 'D' | 'T' | 'E' | 'B' | 's', index: number): Element {
  switch (letter) {
    case 'T': return new Map([[termKey(0, '0'), 1]])
    case 'D': return new Map([[termKey(0, `${index}`), 1]])
    case 'E': return new Map([[termKey(0, `0${index}`), 1], [termKey(0, `${index}0`), -1]])
    case 'B': {
      const out: Element = new Map()
      for (let i = 1; i <= 3; i++) for (let j = 1; j <= 3; j++) {
        const e = levi(index, i, j)
        if (e !== 0) addTerm(out, termKey(0, `${i}${j}`), e)
      }
      return out
    }
    case 's': return new Map([[termKey(index, ''), 1]])
  }
}

/** Colour trace of every term: "s:w" → "s:tw" (the words must be untraced and non-empty). */
export function traceElement(a: Element): Element {
  const out: Element = new Map()
  for (const [k, c] of a) {
    const { spin, word } = splitKey(k)
    if (word === '' || word.startsWith('t')) throw new EngineInputError('traceElement', `cannot trace the word "${word}"`)
    addTerm(out, termKey(spin, `t${word}`), c)
  }
  return out
}

/** True when no term survives. */
export function isZeroElement(a: Element): boolean {
  return a.size === 0
}

/** A stable string of an element up to overall sign (for de-duplication). */
export function elementSignature(a: Element): string {
  const keys = [...a.keys()].sort()
  if (keys.length === 0) return '0'
  const s = Math.sign(a.get(keys[0]!)!)
  return keys.map((k) => `${k}=${a.get(k)! * s}`).join(',')
}
