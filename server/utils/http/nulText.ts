// PostgreSQL cannot store the NUL character (U+0000) in text or JSONB; a request that carries
// one is refused up front with the field named, instead of failing inside a query.

/**
 * The path of the first string (or key) holding U+0000 in a parsed JSON value, written as a
 * user reads it ("definition.fields[0].name"), or null when there is none.
 * @example nulPath({ notes: ['ok', 'a\u0000b'] }) // "notes[1]"
 */
export function nulPath(value: unknown, path = ''): string | null {
  if (typeof value === 'string') return value.includes('\u0000') ? path || 'body' : null
  if (Array.isArray(value)) {
    for (const [i, item] of value.entries()) {
      const found = nulPath(item, `${path}[${i}]`)
      if (found) return found
    }
    return null
  }
  if (value && typeof value === 'object') {
    for (const [key, item] of Object.entries(value)) {
      const at = path ? `${path}.${key.replace(/\u0000/g, '\\0')}` : key.replace(/\u0000/g, '\\0')
      if (key.includes('\u0000')) return at
      const found = nulPath(item, at)
      if (found) return found
    }
  }
  return null
}

/** The message for a NUL found at `path`. */
export function nulMessage(path: string): string {
  return `${path}: text may not contain the NUL character (U+0000); remove it`
}
