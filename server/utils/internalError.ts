import { randomBytes } from 'node:crypto'

// Crockford's base-32 letters: no I, L, O or U, so a reference read aloud or retyped stays exact.
const LETTERS = '0123456789ABCDEFGHJKMNPQRSTVWXYZ'

/** A short random reference a user can quote, e.g. "7F3K2Q" (32^6 ≈ 10^9 values). */
export function errorReference(): string {
  return [...randomBytes(6)].map((b) => LETTERS[b % 32]).join('')
}

/** The text a user sees for an internal error: no detail, only the reference to quote. */
export function internalErrorText(ref: string): string {
  return `Internal error (ref ${ref}); it has been logged.`
}

/**
 * Log an unexpected error (a bug, a failed consistency check, a crash) with a fresh reference
 * and the context it happened in, and return the reference and the text to show instead.
 */
export function reportInternalError(error: unknown, context: string): { ref: string; text: string } {
  const ref = errorReference()
  const where = error instanceof Error && 'where' in error && error.where ? ` (raised in ${String(error.where)})` : ''
  console.error(`[scalewright] internal error ref ${ref} during ${context}${where}:`, error)
  return { ref, text: internalErrorText(ref) }
}
