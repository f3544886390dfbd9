/**
 * Read a Goldstone-frame operator written as the board writes it (monomial.ts, operatorText):
 * "⟨u_μ u_ν u^μ u^ν⟩", "⟨∇_μ u_ν ∇^μ u^ν⟩⟨χ+⟩", "i(⟨f+_μν u^μ u^ν⟩)", "⟨χ+ χ+⟩ + 2 ⟨χ− χ−⟩",
 * "ε^{μνρσ} ⟨…⟩", "det(χ, χ)". Typing aids: < > for ⟨ ⟩, chi for χ, - for −, D for ∇ on a coset
 * letter, and any single Greek letter as an index. An index's position (_ or ^) does not matter:
 * every index must appear twice (or once beside the ε), each pair contracted with the metric.
 */
import { EngineInputError } from '../../errors'
import { type Factor, type Letter, type LetterKind, type Monomial, type Operator } from './monomial'

const KINDS: readonly [string, LetterKind][] = [
  ['F_L', 'FL'],
  ['F_R', 'FR'],
  ['χ†', 'chibar'],
  ['χ+', 'chi+'],
  ['χ−', 'chi-'],
  ['χ', 'chi'],
  ['f+', 'f+'],
  ['f−', 'f-'],
  ['u', 'u'],
]
const OWN: Record<LetterKind, number> = { u: 1, 'chi+': 0, 'chi-': 0, 'f+': 2, 'f-': 2, chi: 0, chibar: 0, FL: 2, FR: 2 }
const GREEK = /^[α-ωΑ-Ω]/u

function fail(text: string, why: string): never {
  throw new EngineInputError('parseGoldstoneOperator', `Cannot read "${text}" as a Goldstone-frame operator: ${why}. Write it as the board does, e.g. ⟨u_μ u_ν u^μ u^ν⟩ or i(⟨f+_μν u^μ u^ν⟩)`)
}

/** Same text with the typing aids replaced by the board's symbols. */
function normalize(text: string): string {
  return text
    .replace(/</g, '⟨')
    .replace(/>/g, '⟩')
    .replace(/chi/g, 'χ')
    .replace(/χ\^?dagger|χ\^†/g, 'χ†')
    .replace(/-/g, '−')
    .replace(/\s+/g, ' ')
    .trim()
}

class Reader {
  pos = 0
  readonly labels = new Map<string, number>()
  readonly uses = new Map<string, number>()
  constructor(
    readonly s: string,
    readonly original: string,
  ) {}
  peek(n = 1): string {
    return this.s.slice(this.pos, this.pos + n)
  }
  spaces(): void {
    while (this.s[this.pos] === ' ') this.pos++
  }
  done(): boolean {
    this.spaces()
    return this.pos >= this.s.length
  }
  take(token: string): boolean {
    this.spaces()
    if (!this.s.startsWith(token, this.pos)) return false
    this.pos += token.length
    return true
  }
  expect(token: string, what: string): void {
    if (!this.take(token)) fail(this.original, `${what} expected at "${this.s.slice(this.pos, this.pos + 12) || 'the end'}"`)
  }
  label(): number {
    const ch = this.s.slice(this.pos).match(GREEK)?.[0]
    if (!ch) fail(this.original, `a Greek index expected at "${this.s.slice(this.pos, this.pos + 12) || 'the end'}"`)
    this.pos += ch.length
    if (!this.labels.has(ch)) this.labels.set(ch, this.labels.size)
    this.uses.set(ch, (this.uses.get(ch) ?? 0) + 1)
    return this.labels.get(ch)!
  }
}

function readLetter(r: Reader): Letter {
  const d: number[] = []
  for (;;) {
    r.spaces()
    if (!['∇', 'D'].includes(r.peek())) break
    r.pos++
    if (!r.take('_') && !r.take('^')) fail(r.original, 'a derivative needs its index, e.g. ∇_μ')
    d.push(r.label())
  }
  r.spaces()
  const hit = KINDS.find(([t]) => r.s.startsWith(t, r.pos))
  if (!hit) fail(r.original, `a building block (u, χ+, χ−, f+, f−, χ, χ†, F_L, F_R) expected at "${r.s.slice(r.pos, r.pos + 12) || 'the end'}"`)
  r.pos += hit[0].length
  const idx: number[] = []
  if (OWN[hit[1]] > 0) {
    if (!r.take('_') && !r.take('^')) fail(r.original, `${hit[0]} needs ${OWN[hit[1]]} Lorentz ${OWN[hit[1]] === 1 ? 'index' : 'indices'}`)
    for (let i = 0; i < OWN[hit[1]]; i++) idx.push(r.label())
  }
  return { kind: hit[1], d, idx }
}

function readFactor(r: Reader): Factor {
  if (r.take('⟨')) {
    const letters: Letter[] = []
    while (!r.take('⟩')) {
      if (r.done()) fail(r.original, 'a trace ⟨… is not closed')
      letters.push(readLetter(r))
    }
    if (letters.length === 0) fail(r.original, 'an empty trace ⟨⟩')
    return { type: 'trace', letters }
  }
  r.expect('det(', 'a trace ⟨…⟩ or det(…)')
  const letters = [readLetter(r)]
  while (r.take(',')) letters.push(readLetter(r))
  r.expect(')', 'the closing ) of det(')
  return { type: 'det', letters }
}

function readMonomial(r: Reader): Monomial {
  let eps: [number, number, number, number] | undefined
  if (r.take('ε^{') || r.take('ε^')) {
    eps = [r.label(), r.label(), r.label(), r.label()]
    r.take('}')
  }
  const factors: Factor[] = []
  r.spaces()
  while (r.peek() === '⟨' || r.s.startsWith('det(', r.pos)) {
    factors.push(readFactor(r))
    r.spaces()
  }
  if (factors.length === 0) fail(r.original, 'a trace ⟨…⟩ expected')
  return { factors, ...(eps ? { eps } : {}) }
}

function readSum(r: Reader, close: string | null): { coef: number; mono: Monomial }[] {
  const terms: { coef: number; mono: Monomial }[] = []
  let sign = r.take('−') ? -1 : (r.take('+'), 1)
  for (;;) {
    r.spaces()
    const num = r.s.slice(r.pos).match(/^\d+/)?.[0]
    if (num) r.pos += num.length
    const mono = readMonomial(r)
    const loose = [...r.uses].find(([, n]) => n !== 2)
    if (loose) fail(r.original, `the index ${loose[0]} appears ${loose[1]} time${loose[1] === 1 ? '' : 's'} in one term; every index appears twice (once beside ε)`)
    r.labels.clear()
    r.uses.clear()
    terms.push({ coef: sign * (num ? Number(num) : 1), mono })
    if (r.done() || (close && r.peek() === close)) return terms
    if (r.take('+')) sign = 1
    else if (r.take('−')) sign = -1
    else fail(r.original, `+ or − expected between terms at "${r.s.slice(r.pos, r.pos + 12)}"`)
  }
}

/**
 * The operator a text denotes, with every index contracted.
 * @example parseGoldstoneOperator('⟨u_μ u^μ⟩⟨u_ν u^ν⟩').terms[0].mono.factors.length // 2
 */
export function parseGoldstoneOperator(text: string): Operator {
  const r = new Reader(normalize(text), text)
  if (r.done()) fail(text, 'the text is empty')
  let op: Operator
  if (r.take('i(')) {
    op = { iPower: 1, terms: readSum(r, ')') }
    r.expect(')', 'the closing ) of i(')
  } else if (r.peek() === 'i' && r.s[r.pos + 1] !== ' ') {
    r.pos++
    op = { iPower: 1, terms: readSum(r, null) }
  } else op = { iPower: 0, terms: readSum(r, null) }
  if (!r.done()) fail(text, `unexpected "${r.s.slice(r.pos, r.pos + 12)}"`)
  return op
}
