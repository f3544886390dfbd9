import { describe, expect, it } from 'vitest'
import { readdirSync, readFileSync, statSync } from 'node:fs'
import { join, resolve } from 'node:path'
import { EngineInputError } from '../../../server/engine/errors'
import { forbiddenIn } from '../../support/forbiddenMessages'
import { BAD_INPUTS } from './badInputs'

// Every input error of the engine is written for the physicist who caused it: no function
// names, no internal keys, no "undefined". Known bad inputs are run through the engine, and
// every place that throws an input error must be reached by at least one of them.

const root = resolve(import.meta.dirname, '..', '..', '..')

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((e) => {
    const full = join(dir, e)
    return statSync(full).isDirectory() ? files(full) : full.endsWith('.ts') ? [full] : []
  })
}

const sources = ['server/engine', 'shared', 'server/api'].flatMap((d) => files(join(root, d))).map((f) => readFileSync(f, 'utf8'))

/** The places (their `where`) named by a literal in `new EngineInputError('where', …)`. */
const throwingPlaces = new Set(sources.flatMap((text) => [...text.matchAll(/new EngineInputError\('([^']+)'/g)].map((m) => m[1]!)))

/** The text of a template literal starting at `open` (a backtick), `${…}` replaced by "X". */
function templateText(text: string, open: number): string {
  let out = ''
  for (let i = open + 1; i < text.length; i++) {
    const ch = text[i]!
    if (ch === '`') return out
    if (ch === '\\') {
      out += text[++i]
      continue
    }
    if (ch !== '$' || text[i + 1] !== '{') {
      out += ch
      continue
    }
    let depth = 0
    for (i++; i < text.length; i++) {
      if (text[i] === '`')
        i = text.indexOf('`', i + 1) // a nested template inside ${…}
      else if (text[i] === '{') depth++
      else if (text[i] === '}' && --depth === 0) break
    }
    out += 'X'
  }
  return out
}

/** The literal messages of `new EngineInputError(where, message)` in the code (placeholders as X). */
function literalMessages(): string[] {
  const out: string[] = []
  for (const text of sources) {
    for (const m of text.matchAll(/new EngineInputError\([^,]+,\s*/g)) {
      const at = m.index! + m[0].length
      if (text[at] === '`') out.push(templateText(text, at))
      else if (text[at] === "'") out.push(text.slice(at + 1, text.indexOf("'", at + 1)))
    }
  }
  return out
}

// Places no input can reach today, with the reason; their texts are still checked below.
const UNREACHABLE: Record<string, string> = {
  suStructures: 'a class has at most 12 fields (classCandidates refuses more), so one kind of SU(n) index never exceeds 12',
}

describe('engine input errors, as a physicist reads them', () => {
  const reached = new Set<string>()
  it.each(BAD_INPUTS.map((c) => [c.name, c] as const))('%s', (_name, c) => {
    let error: unknown
    try {
      c.run()
    } catch (e) {
      error = e
    }
    expect(error, 'an EngineInputError').toBeInstanceOf(EngineInputError)
    const e = error as EngineInputError
    reached.add(e.where)
    expect(forbiddenIn(e.message), e.message).toEqual([])
    expect(e.message).not.toContain(`${e.where}:`)
    if (c.says) expect(e.message).toMatch(c.says)
  })

  it('every place that throws an input error is reached by a bad input above', () => {
    const missing = [...throwingPlaces].filter((w) => !reached.has(w) && !UNREACHABLE[w])
    expect(missing, 'places without a bad input in tests/unit/errors/badInputs.ts').toEqual([])
  })

  it('every literal message in the code passes the same list (overflows included)', () => {
    const messages = literalMessages()
    expect(messages.length).toBeGreaterThan(100)
    const bad = messages.map((m) => [m, forbiddenIn(m)] as const).filter(([, rules]) => rules.length)
    expect(bad).toEqual([])
  })
})
