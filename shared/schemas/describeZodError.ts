import type { ZodError } from 'zod'
import { ENTRY_WORDS, KEY_WORDS, RECORD_WORDS, WRAPPER_KEYS } from './fieldWords'
import './zodMessages'

/** One problem of a zod error: where it is (path inside the validated value) and its message. */
export interface IssueLike {
  path: readonly PropertyKey[]
  message: string
}

const child = (node: unknown, key: PropertyKey): unknown => (node !== null && typeof node === 'object' ? (node as Record<PropertyKey, unknown>)[key] : undefined)

function entryName(list: unknown, i: number): string {
  const name = child(child(list, i), 'name')
  return typeof name === 'string' && name.trim() ? ` "${name.trim()}"` : ''
}

/**
 * Where a problem is, in the words of the form or file: `['definition', 'fields', 2, 'charges', 'Y']`
 * → 'field 3 "phi", charge under Y' (names are read from `root`, the value that was validated).
 */
export function issueLocation(path: readonly PropertyKey[], root?: unknown): string {
  return locationParts(path, root).join(', ')
}

function locationParts(path: readonly PropertyKey[], root?: unknown): string[] {
  const parts: string[] = []
  let node = root
  for (let i = 0; i < path.length; i++) {
    const key = path[i]!
    const next = path[i + 1]
    if (typeof key === 'string' && typeof next === 'number' && ENTRY_WORDS[key]) {
      parts.push(`${ENTRY_WORDS[key]} ${next + 1}${entryName(child(node, key), next)}`)
      node = child(child(node, key), next)
      i++
    } else if (typeof key === 'string' && typeof next === 'string' && RECORD_WORDS[key]) {
      parts.push(RECORD_WORDS[key](next))
      node = child(child(node, key), next)
      i++
    } else {
      if (typeof key === 'number') parts.push(`entry ${key + 1}`)
      else if (!(WRAPPER_KEYS.has(String(key)) && i < path.length - 1)) parts.push(KEY_WORDS[String(key)] ?? String(key))
      node = child(node, key)
    }
  }
  return parts
}

// Only Latin letters: a symbol such as α keeps its case ("Α of X" would be a capital alpha).
const capitalised = (s: string) => (/^[a-z]/.test(s) ? s.charAt(0).toUpperCase() + s.slice(1) : s)
// A message that begins with one of these is a predicate: "Maximum dimension must be at least 5".
const PREDICATE = /^(must|is|are|has|have|may|needs|cannot|does)\b/

/**
 * One readable line for one problem, with the place in front: "Field 3 "phi", charge under Y:
 * a charge is a rational written "p/q" …", "Maximum dimension must be at least 5". A schema's
 * own full sentence that already names its (top-level) field ("Password must have at least
 * 10 characters") stands alone. `whole` names the validated value itself (problems at its top).
 */
export function describeIssue(issue: IssueLike, root?: unknown, whole = 'the request'): string {
  const message = issue.message.trim()
  const parts = locationParts(issue.path, root)
  if (parts.length === 1 && /^[A-Z]/.test(message) && message.toLowerCase().includes(parts[0]!.toLowerCase())) return message
  const where = parts.join(', ') || whole
  return capitalised(PREDICATE.test(message) ? `${where} ${message}` : `${where}: ${message}`)
}

/** One readable sentence per problem, naming the field at fault in the user's words. */
export function describeZodError(error: ZodError, root?: unknown, whole?: string): string {
  return error.issues.map((issue) => describeIssue(issue, root, whole)).join('; ')
}

/**
 * A message shown next to its own input: the place is already on screen, so only the message,
 * as a sentence ("is required" → "This is required", "must be …" → "Must be …").
 */
export function inputMessage(message: string): string {
  const m = message.trim()
  if (/^(is|has)\b/.test(m)) return `This ${m}`
  if (/^(are|have)\b/.test(m)) return `These ${m}`
  return capitalised(m)
}
