/**
 * The written form of a Hermitian or parity combination of an operator X, as a basis stores it
 * and the board shows it: "(X) + h.c.", "(X) - h.c.", "(X) + P", "(X) - P", nested as the
 * basis builds them ("((X) + h.c.) - P"). The one writer and the one reader of that form.
 */

/** "h.c.": X and its Hermitian conjugate; "P": X and its parity image. */
export type CombinationKind = 'h.c.' | 'P'

export interface Combination {
  kind: CombinationKind
  /** +1 for (X) + …, −1 for (X) − …. */
  sign: 1 | -1
  /** The text of X. */
  inner: string
}

/**
 * Write (X) ± h.c. or (X) ± P.
 * @example combinationText('<12>[34]', 'h.c.', -1) // "(<12>[34]) - h.c."
 */
export function combinationText(inner: string, kind: CombinationKind, sign: 1 | -1): string {
  return `(${inner}) ${sign === 1 ? '+' : '-'} ${kind}`
}

const OUTER = /^\((.*)\) ([+-]) (h\.c\.|P)$/

/**
 * Read the outermost combination of a text, or null when it is not one.
 * @example readCombination('((X) + h.c.) - P') // { kind: 'P', sign: -1, inner: '(X) + h.c.' }
 */
export function readCombination(text: string): Combination | null {
  const m = OUTER.exec(text.trim())
  if (!m) return null
  return { kind: m[3] as CombinationKind, sign: m[2] === '+' ? 1 : -1, inner: m[1]! }
}

/** True when a text names "h.c." or "P" (so it must be read as a combination). */
export function mentionsCombination(text: string): boolean {
  return /h\.c\.|\bP\b/.test(text)
}
