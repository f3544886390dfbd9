import { readdirSync, readFileSync, statSync } from 'node:fs'
import { join, resolve } from 'node:path'
import { KEY_WORDS } from '../../shared/schemas/fieldWords'

// What a message shown to a user must never contain: names from the code, zod's or the
// runtime's own texts, stack traces, SQL and internal keys. Used by the engine, API and
// browser tests alike, on every message they see.

const root = resolve(import.meta.dirname, '..', '..')

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((entry) => {
    const full = join(dir, entry)
    if (statSync(full).isDirectory()) return sourceFiles(full)
    return /\.(ts|vue)$/.test(entry) ? [full] : []
  })
}

let identifiers: Set<string> | undefined
/**
 * Names from the code a message could leak: every function, class and method of the engine,
 * the server and the shared code, and every place named in an engine error (its `where`).
 */
export function codeIdentifiers(): Set<string> {
  if (identifiers) return identifiers
  identifiers = new Set()
  const patterns = [/\bfunction\s+([A-Za-z_]\w*)/g, /\bclass\s+([A-Za-z_]\w*)/g, /new Engine\w*Error\('([^']+)'/g, /^\s+(?:static\s+)?([a-z]\w*)\s*\([^)]*\)\s*(?::[^{]*)?\{/gm]
  for (const dir of ['server', 'shared']) {
    for (const file of sourceFiles(join(root, dir))) {
      const text = readFileSync(file, 'utf8')
      for (const p of patterns) for (const m of text.matchAll(p)) identifiers.add(m[1]!)
    }
  }
  // The keys of request bodies and files are code too, when they stand unquoted in a sentence.
  for (const key of Object.keys(KEY_WORDS)) if (/[a-z][A-Z]/.test(key)) identifiers.add(key)
  for (const word of ['if', 'for', 'while', 'switch', 'catch', 'constructor']) identifiers.delete(word)
  return identifiers
}

const looksLikeCode = (word: string) => /[a-z][A-Z]|_|\.|\[/.test(word) || codeIdentifiers().has(word)
const camelCase = (word: string) => /^[a-z]+[A-Z]\w*$/.test(word)
const withoutQuoted = (message: string) => message.replace(/"[^"]*"|“[^”]*”|'[^']*'|`[^`]*`/g, '""')

interface Rule {
  name: string
  breaks: (message: string) => boolean
}

const RULES: Rule[] = [
  {
    name: 'a code name as prefix ("parseOperatorText: …")',
    breaks: (m) => {
      const w = /^\s*([A-Za-z_][\w.]*(?:\[\d+\])*)\s*:\s/.exec(m)?.[1]
      return w !== undefined && looksLikeCode(w)
    },
  },
  { name: 'a function name of the code followed by ":"', breaks: (m) => [...withoutQuoted(m).matchAll(/\b([a-z]+[A-Z]\w*)\s*:/g)].some((x) => codeIdentifiers().has(x[1]!)) },
  { name: 'a doubled prefix ("label: label: …")', breaks: (m) => /^\s*([^:]{1,60}):\s*\1\s*:/i.test(m) },
  { name: 'a path into a JSON document ("fields[0]")', breaks: (m) => /\b\w+\[\d+\]/.test(withoutQuoted(m)) },
  { name: '"undefined"', breaks: (m) => /\bundefined\b/.test(m) },
  { name: '"NaN"', breaks: (m) => /\bNaN\b/.test(m) },
  {
    name: "zod's own text",
    breaks: (m) =>
      /Invalid key|Invalid input|Invalid option|Invalid element|Unrecognized key|expected (string|number|object|array|boolean|int|bigint|date|record|map|set)\b|Too small|Too big/i.test(m),
  },
  { name: '"[object …]"', breaks: (m) => /\[object /.test(m) },
  { name: 'a stack trace', breaks: (m) => /\n\s*at \S|\bat \S+ \(.*:\d+:\d+\)|\.(ts|js|mjs|cjs|vue):\d+/.test(m) },
  {
    name: 'SQL or a database error',
    breaks: (m) =>
      /\bselect\b.+\bfrom\b|\binsert into\b|\bupdate\s+\w+\s+set\b|\bdelete from\b|violates .*constraint|duplicate key value|relation ".*" does not exist|syntax error at or near|\bknex\b|ECONNREFUSED/i.test(
        m,
      ),
  },
  { name: 'an internal key (snake_case)', breaks: (m) => /\b[a-z]+_[a-z_]+\b/.test(withoutQuoted(m)) },
  {
    name: 'a camelCase key outside quotes',
    breaks: (m) =>
      withoutQuoted(m)
        .split(/[^A-Za-z0-9_]+/)
        .some((w) => camelCase(w) && codeIdentifiers().has(w)),
  },
  { name: 'an error class name', breaks: (m) => /\b(TypeError|RangeError|ReferenceError|SyntaxError|ZodError|H3Error|FetchError|Engine\w*Error)\b|^Error:/.test(m) },
  { name: "the runtime's own text", breaks: (m) => /Cannot read propert|is not a function|is not iterable|Maximum call stack|\[(GET|POST|PUT|PATCH|DELETE)\]|Failed to fetch|<no response>/.test(m) },
  {
    name: 'a bare status text or a vague message',
    breaks: (m) => /^(Internal Server Error|Server Error|Bad Request|Unprocessable Entity|Not Found|Something went wrong|Error|Invalid)\.?$/i.test(m.trim()),
  },
]

/** The rules `message` breaks (empty when it may be shown to a user). */
export function forbiddenIn(message: string): string[] {
  return RULES.filter((r) => r.breaks(message)).map((r) => r.name)
}
