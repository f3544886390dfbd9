/**
 * Recursive-descent parser for operators as papers print them (grammar below), over the
 * tokens of tokens.ts. Field names are the theory's (exact, else one case-insensitive match,
 * else an alias such as φ → H given by the caller); a run of letters such as "qbar" or
 * "HH" is split into known names greedily.
 *
 *   sum     := [sign] term (sign term)* [sign "h.c."]
 *   term    := [number ["/" number] | \frac{a}{b}] item*
 *   item    := primary [^ power]
 *   primary := "(" item* ")" ["^\dagger"] | "⟨" item* "⟩" | \bar{field} | \tilde{field}
 *            | field postfix* | D_μ | ∂_μ | \overleftrightarrow{D}_μ | γ^μ | γ_5 | σ^{μν}
 *            | P_L | P_R | C | T^A | τ^I | λ^A | ε_{…} | δ_{…} | f^{ABC} | d^{ABC} | i
 *   postfix := ^\dagger | ^* | ^T | ^{indices} | _{indices} | combining bar or tilde
 */
import { EngineInputError } from '../errors'
import { neg, rat, type Rational } from '../exact/rational'
import { tokenize, type Token } from './tokens'
import { KEYWORDS, normaliseAliases, splitIndexWord, splitWords } from './words'
import { expandBox, expandBoth, markTransposed } from './expand'
import type { TheoryModel } from '../theory/model'
import type { FieldItem, Index, Item, MatrixItem, ParsedOperator, Term } from './ast'
import { conjugateItems } from './conjugate'

export interface ParseOptions {
  /** Field names of the theory. */
  fields: string[]
  /** Extra names for fields, e.g. { phi: "H", q: "Q" } (a paper's names for the theory's). */
  aliases?: Record<string, string>
}

class Parser {
  private toks: Token[]
  private at = 0
  /** Sign picked up inside the current term (a conjugated bracket with γ_5). */
  private sign = 1
  private pendingDerivs: { idx: Index }[] = []
  constructor(
    readonly text: string,
    readonly opts: ParseOptions,
  ) {
    this.opts = { ...opts, aliases: normaliseAliases(opts.aliases) }
    this.toks = splitWords(tokenize(text), (w) => this.resolve(w) !== null)
  }

  fail(t: Token, why: string): never {
    const near = this.text.slice(t.pos, t.pos + 12) || 'the end'
    throw new EngineInputError('readOperator', `At position ${t.pos + 1} of "${this.text}" (near "${near}"): ${why}`)
  }
  peek(o = 0): Token {
    return this.toks[Math.min(this.at + o, this.toks.length - 1)]!
  }
  next(): Token {
    return this.toks[this.at++]!
  }
  isSym(s: string, o = 0): boolean {
    const t = this.peek(o)
    return t.kind === 'sym' && t.text === s
  }
  isWord(s: string, o = 0): boolean {
    const t = this.peek(o)
    return t.kind === 'word' && t.text === s
  }
  expectSym(s: string, why: string): Token {
    if (!this.isSym(s)) this.fail(this.peek(), why)
    return this.next()
  }

  resolve(word: string): string | null {
    const { fields, aliases } = this.opts
    if (fields.includes(word)) return word
    if (aliases && word in aliases) return aliases[word]!
    if (KEYWORDS.includes(word)) return null
    const ci = fields.filter((f) => f.toLowerCase() === word.toLowerCase())
    return ci.length === 1 ? ci[0]! : null
  }

  parseSum(): ParsedOperator {
    const terms: Term[] = []
    let sign = 1
    if (this.isSym('+') || this.isSym('-')) sign = this.next().text === '-' ? -1 : 1
    for (;;) {
      if (this.isWord('h') && this.isSym('.', 1)) {
        this.next()
        this.next()
        if (!this.isWord('c')) this.fail(this.peek(), 'write the Hermitian conjugate as "h.c."')
        this.next()
        if (this.isSym('.')) this.next()
        if (terms.length === 0) this.fail(this.peek(), '"h.c." needs the operator before it')
        for (const t of terms.slice()) {
          const c = conjugateItems(t.items)
          terms.push({ ...t, coeff: sign * c.sign === 1 ? t.coeff : neg(t.coeff), iPower: -t.iPower, items: c.items })
        }
      } else {
        const t = this.parseTerm()
        terms.push(sign === 1 ? t : { ...t, coeff: neg(t.coeff) })
      }
      if (this.peek().kind === 'end') break
      if (!this.isSym('+') && !this.isSym('-')) this.fail(this.peek(), 'expected "+", "−" or the end of the operator')
      sign = this.next().text === '-' ? -1 : 1
    }
    return { text: this.text, terms }
  }

  parseTerm(): Term {
    const start = this.peek()
    let coeff: Rational = rat(1)
    if (this.peek().kind === 'number') {
      coeff = rat(BigInt(this.next().text))
      if (this.isSym('/')) {
        this.next()
        const d = this.next()
        if (d.kind !== 'number' || d.text === '0') this.fail(d, 'a fraction needs a non-zero whole denominator, e.g. 1/2')
        coeff = rat(coeff.num, BigInt(d.text))
      }
    } else if (this.isWord('frac')) {
      this.next()
      const a = this.braced('number')
      const b = this.braced('number')
      if (b === 0n) this.fail(start, 'a fraction needs a non-zero denominator')
      coeff = rat(a, b)
    }
    const state = { iPower: 0 }
    this.sign = 1
    const items = this.parseItems(['+', '-'], state)
    if (items.length === 0 && this.pendingDerivs.length === 0) this.fail(start, 'this term has no field; write fields such as H, \\bar{q} or W^I_{\\mu\\nu}')
    this.flushDerivs(start)
    return { coeff: this.sign === 1 ? coeff : neg(coeff), iPower: state.iPower, items, pos: start.pos }
  }

  braced(kind: 'number'): bigint {
    this.expectSym('{', 'expected "{" after \\frac')
    const t = this.next()
    if (t.kind !== kind) this.fail(t, 'expected a whole number inside \\frac{…}{…}')
    this.expectSym('}', 'expected "}"')
    return BigInt(t.text)
  }

  flushDerivs(t: Token): void {
    if (this.pendingDerivs.length > 0) this.fail(t, 'a derivative must be followed by the field it acts on, e.g. (D_\\mu H)')
  }

  /** Items up to a closing symbol (not consumed) or the end. */
  parseItems(stops: string[], state: { iPower: number }): Item[] {
    const items: Item[] = []
    for (;;) {
      const t = this.peek()
      if (t.kind === 'end' || (t.kind === 'sym' && stops.includes(t.text)) || this.isWord('rangle') || (this.isWord('h') && this.isSym('.', 1))) return items
      if (this.isWord('i') && this.resolve('i') === null) {
        this.next()
        state.iPower++
        continue
      }
      const got = this.parsePrimary(state)
      if (got === null) continue
      const power = this.parsePower()
      for (let r = 0; r < power; r++) items.push(r === 0 ? got : structuredClone(got))
    }
  }

  parsePower(): number {
    if (!this.isSym('^')) return 1
    const o = this.isSym('{', 1) ? 2 : 1
    const t = this.peek(o)
    if (t.kind !== 'number') return 1
    this.at += o + 1
    if (o === 2) this.expectSym('}', 'expected "}" after the power')
    const n = Number(t.text)
    if (n < 1 || n > 12) this.fail(t, `a power must be a whole number from 1 to 12, not ${n}`)
    return n
  }

  parsePrimary(state: { iPower: number }): Item | null {
    const t = this.peek()
    if (t.kind === 'sym' && (t.text === '(' || t.text === '[')) return this.parseGroup(t.text === '(' ? ')' : ']', false, state)
    if (this.isWord('langle')) return this.parseGroup('rangle', true, state)
    if ((this.isWord('tr') || this.isWord('Tr')) && this.isSym('(', 1)) {
      this.next()
      return this.parseGroup(')', true, state)
    }
    if (t.kind !== 'word') this.fail(t, `"${t.raw}" cannot start a factor here`)
    if (t.text === 'bar' || t.text === 'tilde') return this.parseAccent()
    if (t.text === 'Box' || t.text === 'square') {
      this.next()
      if (!this.isSym('(')) this.fail(t, '□ must be followed by a bracket, e.g. (H^\\dagger H)\\Box(H^\\dagger H), or write D^2 on a field')
      return { kind: 'matrix', which: 'Box', indices: [], pos: t.pos }
    }
    if ((t.text === 'D' && this.resolve('D') === null) || t.text === 'partial' || t.text === 'Dboth') return this.parseDerivative()
    const m = this.parseMatrixOrTensor()
    if (m) return m
    return this.parseField()
  }

  parseGroup(close: string, trace: boolean, state: { iPower: number }): Item {
    const open = this.next()
    const saved = this.pendingDerivs
    this.pendingDerivs = []
    const items = this.parseItems(close === 'rangle' ? [] : [close], state)
    if (this.isSym('+') || this.isSym('-')) this.fail(this.peek(), 'expand sums inside brackets into separate terms')
    this.flushDerivs(this.peek())
    if (close === 'rangle') {
      if (!this.isWord('rangle')) this.fail(this.peek(), 'expected "⟩" to close the trace')
      this.next()
    } else this.expectSym(close, `expected "${close}" to close the bracket opened at position ${open.pos + 1}`)
    this.pendingDerivs = saved
    let conj = false
    if (this.isSym('^') && this.isWord('T', 1)) {
      this.next()
      this.next()
      markTransposed(items)
    }
    while (this.isSym('^') && (this.isWord('dagger', 1) || this.isSym('*', 1) || (this.isSym('{', 1) && (this.isWord('dagger', 2) || this.isSym('*', 2))))) {
      this.next()
      const b = this.isSym('{')
      if (b) this.next()
      this.next()
      if (b) this.expectSym('}', 'expected "}"')
      conj = !conj
    }
    if (this.pendingDerivs.length > 0 && items.length > 0) this.fail(open, 'a derivative in front of a bracket is not read; put it on one field, e.g. (D_\\mu H)^\\dagger H')
    if (!conj) return { kind: 'group', items, trace, conj: false, pos: open.pos }
    const c = conjugateItems(items)
    if (c.sign === -1) this.sign = -this.sign
    return { kind: 'group', items: c.items, trace, conj: true, pos: open.pos }
  }

  parseAccent(): Item {
    const acc = this.next()
    const braced = this.isSym('{')
    if (braced) this.next()
    const inner = this.parseField()
    if (braced) this.expectSym('}', `expected "}" to close \\${acc.text}{…}`)
    this.parsePostfix(inner)
    if (acc.text === 'bar') inner.conj = !inner.conj
    else inner.tilde = true
    return inner
  }

  parseDerivative(): Item | null {
    const t = this.next()
    const both = t.text === 'Dboth'
    if (both && this.isSym('{')) {
      this.next()
      if (this.isWord('D')) this.next()
      this.expectSym('}', 'expected "}" after \\overleftrightarrow{D')
    }
    if (!both && this.isSym('^') && this.peek(1).kind === 'number' && this.peek(1).text === '2') {
      this.next()
      this.next()
      const name = `\u0001sq${t.pos}`
      this.pendingDerivs.push({ idx: { name, pos: t.pos } }, { idx: { name, pos: t.pos } })
      return null
    }
    const idx = this.indexLists()
    const vec = idx.filter((x) => !/^[A-Z]$/.test(x.name))
    const gen = idx.filter((x) => /^[A-Z]$/.test(x.name))
    if (vec.length !== 1) this.fail(t, 'a derivative needs one Lorentz index, e.g. D_\\mu or \\partial^\\mu')
    if (both) return { kind: 'matrix', which: 'Dboth', indices: [vec[0]!, ...gen], pos: t.pos }
    this.pendingDerivs.push({ idx: vec[0]! })
    return null
  }

  /** Index lists after ^ and _ (each one token or {…}). */
  indexLists(flags?: { dagger?: boolean; transpose?: boolean }): Index[] {
    const out: Index[] = []
    while (this.isSym('^') || this.isSym('_')) {
      // ^2 or ^{2} after a field or a derivative is a power, not an index.
      if (this.isSym('^') && (this.peek(1).kind === 'number' || (this.isSym('{', 1) && this.peek(2).kind === 'number' && this.isSym('}', 3)))) return out
      const sup = this.next().text === '^'
      const braced = this.isSym('{')
      if (braced) this.next()
      do {
        const t = this.next()
        if (t.kind === 'end') this.fail(t, 'an index list is not closed')
        if (sup && flags && (t.text === 'dagger' || t.text === '*' || t.text === '+')) {
          flags.dagger = !flags.dagger
          continue
        }
        if (sup && flags && t.text === 'T' && braced === false) {
          flags.transpose = true
          continue
        }
        if (t.kind === 'sym' && (t.text === ',' || t.text === "'")) continue
        if (t.kind === 'number') {
          out.push({ name: t.text, pos: t.pos })
          continue
        }
        if (t.kind !== 'word') this.fail(t, `"${t.raw}" is not an index; use letters such as \\mu, I, A, j`)
        for (const name of splitIndexWord(t.text)) out.push({ name, pos: t.pos })
      } while (braced && !this.isSym('}'))
      if (braced) this.next()
    }
    return out
  }

  parseMatrixOrTensor(): Item | null {
    const t = this.peek()
    const w = t.text
    if (this.resolve(w) !== null && !['gamma', 'sigma', 'tau', 'lambda', 'epsilon', 'delta'].includes(w)) {
      if (!((w === 'f' || w === 'd') && this.isUpperTriple())) return null
    }
    const matrix = (which: MatrixItem['which'], symbol?: MatrixItem['symbol']): Item => {
      this.next()
      const indices = this.indexLists()
      if (which === 'gen' && (indices.length !== 1 || !/^[A-Z]$/.test(indices[0]!.name))) this.fail(t, `the generator ${t.raw} needs one adjoint index, a capital letter, e.g. ${t.raw}^A`)
      if (which === 'gamma' && indices.length === 1 && indices[0]!.name === '5') return { kind: 'matrix', which: 'gamma5', indices: [], pos: t.pos }
      if (which === 'gamma' && indices.length !== 1) this.fail(t, 'γ needs one Lorentz index (γ^\\mu) or 5 (γ_5)')
      if (which === 'sigma' && indices.length === 1 && /^[A-Z]$/.test(indices[0]!.name)) return { kind: 'matrix', which: 'gen', symbol: 'tau', indices, pos: t.pos }
      if (which === 'sigma' && indices.length !== 2) this.fail(t, 'σ needs two Lorentz indices, σ^{\\mu\\nu}, or one adjoint index for a Pauli matrix, σ^I')
      return { kind: 'matrix', which, symbol, indices, pos: t.pos }
    }
    if (w === 'gamma') return matrix('gamma')
    if (w === 'sigma') return matrix('sigma')
    if (w === 'tau') return matrix('gen', 'tau')
    if (w === 'lambda' && this.isUpperNext()) return matrix('gen', 'lambda')
    if (w === 'T' && this.isUpperNext()) return matrix('gen', 'T')
    if (w === 'PL' || w === 'PR') {
      this.next()
      return { kind: 'matrix', which: w, indices: [], pos: t.pos }
    }
    if (w === 'P' && this.isSym('_', 1)) {
      this.next()
      const idx = this.indexLists()
      if (idx.length !== 1 || !['L', 'R'].includes(idx[0]!.name)) this.fail(t, 'write the chiral projectors as P_L and P_R')
      return { kind: 'matrix', which: idx[0]!.name === 'L' ? 'PL' : 'PR', indices: [], pos: t.pos }
    }
    if (w === 'C' && this.resolve('C') === null) {
      this.next()
      return { kind: 'matrix', which: 'C', indices: [], pos: t.pos }
    }
    if (w === 'epsilon' || w === 'delta' || ((w === 'f' || w === 'd') && this.isUpperTriple())) {
      this.next()
      const indices = this.indexLists()
      if (indices.length < 2) this.fail(t, `${t.raw} needs its indices, e.g. \\varepsilon_{jk}`)
      return { kind: 'tensor', which: w as 'epsilon' | 'delta' | 'f' | 'd', indices, pos: t.pos }
    }
    return null
  }

  isUpperNext(): boolean {
    const o = this.isSym('{', 2) ? 3 : 2
    return (this.isSym('^', 1) || this.isSym('_', 1)) && /^[A-Z]$/.test(this.peek(o).text)
  }
  isUpperTriple(): boolean {
    if (!this.isSym('^', 1) && !this.isSym('_', 1)) return false
    const t = this.isSym('{', 2) ? this.peek(3) : this.peek(2)
    return /^[A-Z]{3}$/.test(t.text) || (/^[A-Z]$/.test(t.text) && this.isSym('{', 2))
  }

  parseField(): FieldItem {
    const t = this.next()
    if (t.kind !== 'word') this.fail(t, `"${t.raw}" is not a field`)
    const name = this.resolve(t.text)
    if (name === null) this.fail(t, `"${t.raw}" is not a field of this theory (its fields are ${this.opts.fields.join(', ')})`)
    const item: FieldItem = { kind: 'field', name, pos: t.pos, conj: false, tilde: false, transpose: false, indices: [], derivs: [] }
    this.parsePostfix(item)
    this.applyDerivs(item)
    return item
  }

  parsePostfix(item: FieldItem): void {
    for (;;) {
      if (this.isWord('post-bar') || this.isWord('bar')) {
        if (this.isWord('bar') && this.isSym('{', 1)) return
        this.next()
        item.conj = !item.conj
        continue
      }
      if (this.isWord('post-tilde')) {
        this.next()
        item.tilde = true
        continue
      }
      if (this.isWord('dagger')) {
        this.next()
        item.conj = !item.conj
        continue
      }
      if (this.isSym('*') && !(this.peek(1).kind === 'number')) {
        this.next()
        item.conj = !item.conj
        continue
      }
      if (this.isSym('^') || this.isSym('_')) {
        const flags = { dagger: false, transpose: false }
        const before = this.at
        item.indices.push(...this.indexLists(flags))
        if (flags.dagger) item.conj = !item.conj
        if (flags.transpose) item.transpose = true
        if (this.at === before) return
        continue
      }
      return
    }
  }

  applyDerivs(item: FieldItem): void {
    for (const d of this.pendingDerivs) item.derivs.push(d.idx)
    this.pendingDerivs = []
  }

  run(): ParsedOperator {
    return expandBoth(expandBox(this.parseSum()))
  }
}

export function parseOptions(model: TheoryModel, aliases?: Record<string, string>): ParseOptions {
  return { fields: [...new Set(model.species.map((s) => s.field))], aliases }
}

/**
 * Parse an operator printed as in papers.
 * @example parseNotation("H^\\dagger H W^I_{\\mu\\nu} W^{I\\mu\\nu}", { fields: ["H", "W"] }).terms.length // 1
 * Throws EngineInputError naming the position and the token that cannot be read.
 */
export function parseNotation(text: string, opts: ParseOptions): ParsedOperator {
  if (text.trim() === '') throw new EngineInputError('readOperator', 'The operator is empty; type it as printed, e.g. (H^\\dagger H)^3')
  return new Parser(text, opts).run()
}
