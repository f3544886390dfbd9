/**
 * Words of printed operators: aliases in the tokenizer's spelling, runs of letters split into
 * known names ("qbar" → q bar, "HH" → H H), index runs split into index names ("Imunu" → I mu nu).
 */
import { tokenize, type Token } from './tokens'

export const GREEK_INDEX = new Set(['mu', 'nu', 'rho', 'sigma', 'lambda', 'kappa', 'alpha', 'beta', 'gamma', 'delta', 'eta', 'xi', 'omega', 'zeta', 'theta'])
export const KEYWORDS = [
  'D',
  'partial',
  'gamma',
  'sigma',
  'tau',
  'lambda',
  'T',
  'epsilon',
  'delta',
  'f',
  'd',
  'P',
  'PL',
  'PR',
  'C',
  'i',
  'bar',
  'dagger',
  'tilde',
  'Dboth',
  'Box',
  'square',
  'langle',
  'rangle',
  'frac',
  'tr',
  'Tr',
  'h',
  'c',
  'sqrt',
]

/** Alias names as the tokenizer reads them ("\\varphi", "varphi" and "φ" all become "phi"). */
export function normaliseAliases(aliases?: Record<string, string>): Record<string, string> | undefined {
  if (!aliases) return undefined
  const out: Record<string, string> = {}
  for (const [k, v] of Object.entries(aliases)) {
    const words = tokenize(k.startsWith('\\') || !/^[A-Za-z]+$/.test(k) ? k : `\\${k}`).filter((t) => t.kind === 'word')
    out[k] = v
    if (words.length === 1) out[words[0]!.text] = v
  }
  return out
}

/** Split letter runs ("qbar", "HH", "Imunu") into names the parser knows. */
export function splitWords(toks: Token[], isField: (w: string) => boolean): Token[] {
  const out: Token[] = []
  for (const t of toks) {
    if (t.kind !== 'word' || isField(t.text) || KEYWORDS.includes(t.text) || GREEK_INDEX.has(t.text) || t.text.startsWith('post-') || t.text.length === 1) {
      out.push(t)
      continue
    }
    let rest = t.text
    let pos = t.pos
    const parts: Token[] = []
    while (rest.length > 0) {
      let len = rest.length
      while (len > 1 && !(isField(rest.slice(0, len)) || KEYWORDS.includes(rest.slice(0, len)) || GREEK_INDEX.has(rest.slice(0, len)))) len--
      parts.push({ kind: 'word', text: rest.slice(0, len), pos, raw: rest.slice(0, len) })
      rest = rest.slice(len)
      pos += len
    }
    out.push(...parts)
  }
  return out
}

export function splitIndexWord(w: string): string[] {
  if (GREEK_INDEX.has(w) || w.length === 1) return [w]
  const out: string[] = []
  let rest = w
  while (rest.length > 0) {
    const g = [...GREEK_INDEX].find((x) => rest.startsWith(x))
    const take = g ?? rest[0]!
    out.push(take)
    rest = rest.slice(take.length)
  }
  return out
}
