import { describeIssue } from '../../../shared/schemas/describeZodError'

// PostgreSQL cannot store the NUL character (U+0000) in text or JSONB; a request that carries
// one is refused up front with the place named in the user's words, instead of failing inside
// a query.

/** Where the first U+0000 of a parsed JSON value is: the path to the text, or to the object whose key holds it. */
export interface NulPlace {
  path: PropertyKey[]
  inKey: boolean
}

/**
 * The place of the first string (or key) holding U+0000, or null when there is none.
 * @example nulPlace({ notes: ['ok', 'a\u0000b'] }) // { path: ['notes', 1], inKey: false }
 */
export function nulPlace(value: unknown, path: PropertyKey[] = []): NulPlace | null {
  if (typeof value === 'string') return value.includes('\u0000') ? { path, inKey: false } : null
  if (Array.isArray(value)) {
    for (const [i, item] of value.entries()) {
      const found = nulPlace(item, [...path, i])
      if (found) return found
    }
    return null
  }
  if (value && typeof value === 'object') {
    for (const [key, item] of Object.entries(value)) {
      if (key.includes('\u0000')) return { path, inKey: true }
      const found = nulPlace(item, [...path, key])
      if (found) return found
    }
  }
  return null
}

/** The value with every NUL shown as ␀ (U+2400), so that names quoted in a message stay readable. */
function visible(value: unknown): unknown {
  if (typeof value === 'string') return value.replaceAll('\u0000', '\u2400')
  if (Array.isArray(value)) return value.map(visible)
  if (value && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k.replaceAll('\u0000', '\u2400'), visible(v)]))
  return value
}

/** The message for a NUL found at `place` of `root`, e.g. 'Note cannot contain the NUL character (U+0000); remove it'. */
export function nulMessage(place: NulPlace, root: unknown): string {
  const message = place.inKey ? 'has a key containing the NUL character (U+0000); remove it' : 'cannot contain the NUL character (U+0000); remove it'
  return describeIssue({ path: place.path, message }, visible(root))
}
