import { z } from 'zod'

// One error map for every schema, in the browser and on the server: zod's own texts ("Too
// small: expected string to have >=1 characters", "Invalid key in record", …) never reach a
// screen. Each message is a lower-case predicate ("must be at least 5"); describeZodError puts
// the field's name in front, an input shows it on its own (capitalised). A message a schema
// gives itself always wins over this map.

type Issue = z.core.$ZodRawIssue

const KINDS: Record<string, string> = {
  string: 'text',
  number: 'a number',
  int: 'a whole number',
  bigint: 'a whole number',
  nan: 'a number',
  boolean: 'true or false',
  array: 'a list',
  tuple: 'a list',
  object: 'an object { … }',
  record: 'an object { … }',
  map: 'an object { … }',
  set: 'a list',
  date: 'a date',
  null: 'empty (null)',
  literal: 'a fixed value',
}

const quoted = (v: unknown) => (typeof v === 'string' ? `"${v}"` : String(v))
const kindOf = (expected: unknown) => KINDS[String(expected)] ?? 'a value of another kind'
// JSON has no NaN: a number input left empty or unreadable arrives as null, so null is "of the wrong kind".
const missing = (input: unknown) => input === undefined

function tooSmall(iss: Extract<Issue, { code: 'too_small' }>): string {
  const min = Number(iss.minimum)
  if (iss.origin === 'string') return min <= 1 ? 'must not be empty' : `must have at least ${min} characters`
  if (iss.origin === 'array' || iss.origin === 'set') return min <= 1 ? 'must list at least one entry' : `must list at least ${min} entries`
  if (min === 0 && !iss.inclusive) return 'must be positive'
  return iss.inclusive === false ? `must be above ${min}` : `must be at least ${min}`
}

function tooBig(iss: Extract<Issue, { code: 'too_big' }>): string {
  const max = Number(iss.maximum)
  if (iss.origin === 'string') return `must have at most ${max} characters`
  if (iss.origin === 'array' || iss.origin === 'set') return `may list at most ${max} entries`
  return iss.inclusive === false ? `must be below ${max}` : `must be at most ${max}`
}

/** A union: the message of the branch that matched the input's type, else the kinds it accepts. */
function union(iss: Extract<Issue, { code: 'invalid_union' }>): string {
  if (missing(iss.input)) return 'is required'
  const branches = 'errors' in iss ? iss.errors : []
  const typed = branches.find((b) => b.length > 0 && b.every((i) => i.code !== 'invalid_type'))
  if (typed?.[0]?.message) return typed[0].message
  const kinds = branches.flatMap((b) => b.filter((i) => i.code === 'invalid_type').map((i) => kindOf((i as { expected?: unknown }).expected)))
  return kinds.length ? `must be ${[...new Set(kinds)].join(' or ')}` : 'does not have a form this field accepts'
}

function nestedMessage(issues: readonly { message?: string }[] | undefined): string {
  return (
    issues
      ?.map((i) => i.message)
      .filter(Boolean)
      .join('; ') || 'not accepted here'
  )
}

/** The message for an issue no schema wrote a text for. */
export function defaultMessage(iss: Issue): string {
  switch (iss.code) {
    case 'invalid_type':
      return missing(iss.input) ? 'is required' : `must be ${kindOf(iss.expected)}`
    case 'too_small':
      return tooSmall(iss)
    case 'too_big':
      return tooBig(iss)
    case 'invalid_format':
      return iss.format === 'email' ? 'must be a valid e-mail address' : 'does not have the expected form'
    case 'not_multiple_of':
      return `must be a multiple of ${iss.divisor}`
    case 'unrecognized_keys': {
      const one = iss.keys.length === 1
      return `has ${one ? 'an unknown key' : 'unknown keys'} ${iss.keys.map(quoted).join(', ')}; check the spelling or remove ${one ? 'it' : 'them'}`
    }
    case 'invalid_union':
      return union(iss)
    // The key is already named by the place (e.g. 'representation under 1bad').
    case 'invalid_key':
      return `is not allowed here (${nestedMessage(iss.issues)})`
    case 'invalid_element':
      return `has an entry that is not allowed (${nestedMessage(iss.issues)})`
    case 'invalid_value':
      return iss.values.length === 1 ? `must be ${quoted(iss.values[0])}` : `must be one of ${iss.values.map(quoted).join(', ')}`
    default:
      return 'is not valid'
  }
}

/**
 * Install the map for every schema (idempotent). Importing this file installs it; the server
 * bundle drops imports made for their side effects only, so a server plugin calls it too.
 */
export function installZodMessages(): void {
  z.config({ customError: (iss) => defaultMessage(iss) })
}

installZodMessages()
