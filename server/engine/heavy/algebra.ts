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
 * 1..3 are s_1..s_3; a word is a string of letters, the leftmost acting last: digits 0 (D_t)
 * and 1..3 (D_x, D_y, D_z); a field-strength letter of an abelian factor g (ℰ_i, ℬ_i of that
 * factor alone, multiplying: see fieldLetter); and a bracketed atom "(w)" — the colour trace
 * of the function that w produces acting on a constant, times the unit matrix (non-abelian).
 * With several gauge factors D contains every coupled connection, so [D_t, D_i] is the sum of
 * their field strengths (charges absorbed into each connection).
 */
import { EngineConsistencyError } from '../errors'

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
  if (!Number.isSafeInteger(v)) throw new EngineConsistencyError('heavy algebra', `coefficient overflow at ${key}`)
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
      const { spin, sign } = spinProduct(sa, Number(kb[0]))
      addTerm(out, termKey(spin, wa + kb.slice(2)), sign * ca * cb)
    }
  }
  return out
}

/**
 * The word letter of a field-strength component of abelian factor g: ℰ_i (which = 'E') or
 * ℬ_i ('B'), i = 1..3; characters from "A" upward, six per factor.
 * @example fieldLetter(0, 'B', 3) // "F"
 */
export function fieldLetter(g: number, which: 'E' | 'B', i: number): string {
  return String.fromCharCode(65 + 6 * g + (which === 'E' ? 0 : 3) + i - 1)
}

/** Decode a field-strength letter: its factor, E or B, and component. */
export function decodeFieldLetter(ch: string): { g: number; which: 'E' | 'B'; i: number } {
  const c = ch.charCodeAt(0) - 65
  const r = c % 6
  return { g: Math.floor(c / 6), which: r < 3 ? 'E' : 'B', i: (r % 3) + 1 }
}

/** The atoms of a word: single letters, or "(…)" trace atoms. */
export function wordAtoms(word: string): string[] {
  const out: string[] = []
  for (let i = 0; i < word.length; i++) {
    if (word[i] !== '(') {
      out.push(word[i]!)
      continue
    }
    const j = word.indexOf(')', i)
    if (j < 0) throw new EngineConsistencyError('wordAtoms', `unclosed trace in the word "${word}"`)
    out.push(word.slice(i, j + 1))
    i = j
  }
  return out
}

/** The element of one letter with a concrete index (1..3) where it has one. */
export function letterElement(letter: 'D' | 'T' | 'E' | 'B' | 's', index: number): Element {
  switch (letter) {
    case 'T':
      return new Map([[termKey(0, '0'), 1]])
    case 'D':
      return new Map([[termKey(0, `${index}`), 1]])
    case 'E':
      return new Map([
        [termKey(0, `0${index}`), 1],
        [termKey(0, `${index}0`), -1],
      ])
    case 'B': {
      const out: Element = new Map()
      for (let i = 1; i <= 3; i++)
        for (let j = 1; j <= 3; j++) {
          const e = levi(index, i, j)
          if (e !== 0) addTerm(out, termKey(0, `${i}${j}`), e)
        }
      return out
    }
    case 's':
      return new Map([[termKey(index, ''), 1]])
  }
}

/** Colour trace of every term: "s:w" → "s:(w)" (the words must be non-empty and trace-free). */
export function traceElement(a: Element): Element {
  const out: Element = new Map()
  for (const [k, c] of a) {
    const { spin, word } = splitKey(k)
    if (word === '' || word.includes('(')) throw new EngineConsistencyError('traceElement', `cannot trace the word "${word}"`)
    addTerm(out, termKey(spin, `(${word})`), c)
  }
  return out
}

/** The abelian field-strength letter of factor g as an element. */
export function fieldElement(g: number, which: 'E' | 'B', i: number): Element {
  return new Map([[termKey(0, fieldLetter(g, which, i)), 1]])
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
