/**
 * Tokens of operators as papers print them, in LaTeX ("H^\dagger H W^I_{\mu\nu}") and in
 * plain text or Unicode ("H† H W^I_μν", "(qbar γ^μ q)"). Every token keeps its position in
 * the typed text so that errors can point at it.
 */
import { EngineInputError } from '../errors'

export type TokenKind = 'word' | 'number' | 'sym' | 'end'

export interface Token {
  kind: TokenKind
  /** Normalised text: a LaTeX command without its backslash maps to the same word as its Unicode letter. */
  text: string
  pos: number
  /** The characters as typed. */
  raw: string
}

/** Unicode letters and signs → the words the parser reads (LaTeX command names). */
const UNICODE: Record<string, string> = {
  α: 'alpha',
  β: 'beta',
  γ: 'gamma',
  δ: 'delta',
  ε: 'epsilon',
  ϵ: 'epsilon',
  μ: 'mu',
  ν: 'nu',
  ρ: 'rho',
  σ: 'sigma',
  τ: 'tau',
  λ: 'lambda',
  κ: 'kappa',
  φ: 'phi',
  ϕ: 'phi',
  ψ: 'psi',
  χ: 'chi',
  η: 'eta',
  ξ: 'xi',
  ω: 'omega',
  π: 'pi',
  θ: 'theta',
  ζ: 'zeta',
  Φ: 'Phi',
  Σ: 'Sigma',
  '∂': 'partial',
  '□': 'Box',
  '†': 'dagger',
  '⟨': 'langle',
  '⟩': 'rangle',
  '−': '-',
  '·': 'cdot',
  '×': 'times',
}
/** LaTeX commands that mean the same as another one. */
const SYNONYM: Record<string, string> = {
  varphi: 'phi',
  varepsilon: 'epsilon',
  epsilon: 'epsilon',
  overline: 'bar',
  widetilde: 'tilde',
  bar: 'bar',
  dag: 'dagger',
  left: '',
  right: '',
  big: '',
  Big: '',
  bigg: '',
  Bigg: '',
  bigl: '',
  bigr: '',
  Bigl: '',
  Bigr: '',
  ',': '',
  ';': '',
  '!': '',
  quad: '',
  qquad: '',
  cdot: '',
  times: '',
  mathrm: '',
  text: '',
  rm: '',
  mathcal: '',
  mathbf: '',
  boldsymbol: '',
}
/** Combining marks typed after a letter: macron/overline = bar, tilde, dagger-like. */
const COMBINING: Record<string, string> = { '\u0304': 'bar', '\u0305': 'bar', '\u0303': 'tilde' }

const SYMBOLS = new Set(['^', '_', '{', '}', '(', ')', '[', ']', '+', '-', '*', '/', '<', '>', '|', "'", '.'])

/**
 * Split typed text into tokens.
 * @example tokenize("H^\\dagger H").map(t => t.text) // ["H", "^", "dagger", "H", "end"]
 * Throws EngineInputError at a character no operator uses.
 */
export function tokenize(typed: string): Token[] {
  // Decompose accented letters (Ã → A + combining tilde, ē → e + combining macron).
  const text = typed.normalize('NFD')
  const out: Token[] = []
  let i = 0
  const push = (kind: TokenKind, t: string, pos: number, raw: string): void => {
    out.push({ kind, text: t, pos, raw })
  }
  while (i < text.length) {
    const ch = text[i]!
    if (/\s/.test(ch) || ch === '$' || ch === '&') {
      i++
      continue
    }
    if (ch === '\\') {
      const m = /^\\([A-Za-z]+|.)/.exec(text.slice(i))
      const name = m ? m[1]! : ''
      const word = name in SYNONYM ? SYNONYM[name]! : name
      if (word === 'overleftrightarrow' || word === 'lr') push('word', 'Dboth', i, m![0])
      else if (word !== '') push(/^[A-Za-z]+$/.test(word) ? 'word' : 'sym', word, i, m![0])
      i += m ? m[0].length : 1
      continue
    }
    if (ch in COMBINING) {
      push('word', `post-${COMBINING[ch]}`, i, ch)
      i++
      continue
    }
    if (ch in UNICODE) {
      const w = UNICODE[ch]!
      push(w === '-' ? 'sym' : 'word', w, i, ch)
      i++
      continue
    }
    const num = /^\d+/.exec(text.slice(i))
    if (num) {
      push('number', num[0], i, num[0])
      i += num[0].length
      continue
    }
    const word = /^[A-Za-z]+/.exec(text.slice(i))
    if (word) {
      push('word', word[0], i, word[0])
      i += word[0].length
      continue
    }
    if (SYMBOLS.has(ch)) {
      push('sym', ch, i, ch)
      i++
      continue
    }
    throw new EngineInputError(
      'readOperator',
      `The character "${ch}" at position ${i + 1} of "${text}" is not part of an operator; write fields, derivatives (D_\\mu, \\partial_\\mu), matrices (\\gamma^\\mu, \\sigma^{\\mu\\nu}, T^A, \\tau^I), \\varepsilon, brackets and numbers`,
    )
  }
  out.push({ kind: 'end', text: '', pos: text.length, raw: '' })
  return out
}
