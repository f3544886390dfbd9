/**
 * Scalewright's small input syntax for an operator of a class, written through its contact
 * amplitude. Legs are numbered 1..n in the class's canonical order (the order of the key).
 *
 *   expression := term (("+" | "-") term)*
 *   term       := [rational ["*"]] factor*          e.g.  -1/3 <12>[34]^2
 *   factor     := "<" i j ">" ["^" m]                angle bracket ⟨ij⟩
 *               | "[" i j "]" ["^" m]                square bracket [ij]
 *               | "s" i j ["^" m]                    Mandelstam s_ij = ⟨ij⟩[ji]
 *               | "{g:" K "}"                        gauge contraction number K (0-based, as
 *                                                    listed by the class); may be omitted
 *                                                    when the class has only one
 *   i j        := two digits ("<12>") or two integers with a comma or space ("<1,12>")
 *
 * Example (four photons F_L^2 F_R^2): "<12>^2[34]^2". Every term must carry the legs'
 * helicity weights; the surplus of λ_i, λ̃_i pairs on leg i is its number of derivatives
 * and must add up to the class's k. A term with no factor is a constant (k = 0 scalars).
 */
import { EngineInputError } from '../errors'
import { parseRational, mul as ratMul, rat, type Rational } from '../exact/rational'
import type { OperatorClass } from './classKey'
import type { LorentzStructure } from './lorentzStructures'

export interface ParsedTerm {
  coeff: Rational
  lorentz: LorentzStructure
  gaugeIndex: number
}

const TOKEN = /\s*(?:(<|\[)\s*(\d+)\s*[, ]?\s*(\d+)?\s*(>|\])|s\s*_?\s*(\d)(\d)|\{\s*g\s*:\s*(\d+)\s*\}|(\d+(?:\s*\/\s*\d+)?)|(\*)|(\^)\s*(\d+))/y

function splitTerms(text: string): { sign: 1 | -1; body: string }[] {
  const out: { sign: 1 | -1; body: string }[] = []
  let depth = 0
  let start = 0
  let sign: 1 | -1 = 1
  for (let i = 0; i <= text.length; i++) {
    const ch = text[i]
    if (ch === '<' || ch === '[' || ch === '{') depth++
    if (ch === '>' || ch === ']' || ch === '}') depth--
    if (i === text.length || (depth === 0 && (ch === '+' || ch === '-') && !/\^\s*$/.test(text.slice(0, i)))) {
      const body = text.slice(start, i).trim()
      if (body !== '') out.push({ sign, body })
      else if (i !== 0 && i !== text.length) throw new EngineInputError('parseOperatorText', `"${text}" has an empty term near position ${i}; remove the extra sign, or write the missing term`)
      sign = ch === '-' ? -1 : 1
      start = i + 1
    }
  }
  return out
}

function parseTerm(text: string, body: string, n: number, nGauge: number): { coeff: Rational; angle: [number, number][]; square: [number, number][]; gaugeIndex: number } {
  let coeff = rat(1)
  const angle: [number, number][] = []
  const square: [number, number][] = []
  let gaugeIndex = -1
  let last: { lists: [number, number][][]; pair: [number, number]; sgn: Rational } | null = null
  TOKEN.lastIndex = 0
  while (TOKEN.lastIndex < body.length) {
    const at = TOKEN.lastIndex
    const m = TOKEN.exec(body)
    if (!m || m.index !== at)
      throw new EngineInputError(
        'parseOperatorText',
        `Cannot read "${body.slice(at).trim()}" in "${text}"; write brackets such as <12>, [34] or s13, powers such as ^2, fractions such as 1/2 and gauge contractions such as {g:0}`,
      )
    if (m[1] !== undefined || m[5] !== undefined) {
      const isS = m[5] !== undefined
      let [a, b] = isS ? [m[5]!, m[6]!] : [m[2]!, m[3]]
      if (b === undefined) {
        if (a.length !== 2) throw new EngineInputError('parseOperatorText', `The bracket "${m[0].trim()}" in "${text}" needs two legs, e.g. <12> or <1,12>`)
        ;[a, b] = [a[0]!, a[1]!]
      }
      const i = Number(a) - 1
      const j = Number(b) - 1
      if (i === j || i < 0 || j < 0 || i >= n || j >= n)
        throw new EngineInputError('parseOperatorText', `The bracket "${m[0].trim()}" in "${text}" needs two different legs from 1 to ${n} (the class has ${n} fields)`)
      if (!isS && (m[1] === '<') !== (m[4] === '>'))
        throw new EngineInputError('parseOperatorText', `The bracket "${m[0].trim()}" in "${text}" mixes angle and square brackets; close < with > and [ with ]`)
      const pair: [number, number] = i < j ? [i, j] : [j, i]
      const flip = i < j ? rat(1) : rat(-1)
      // s_ij = ⟨ij⟩[ji] = −⟨ij⟩[ij]
      const lists = isS ? [angle, square] : [m[1] === '<' ? angle : square]
      const sgn = isS ? rat(-1) : flip
      for (const l of lists) l.push(pair)
      coeff = ratMul(coeff, sgn)
      last = { lists, pair, sgn }
    } else if (m[7] !== undefined) {
      gaugeIndex = Number(m[7])
      if (gaugeIndex >= nGauge) throw new EngineInputError('parseOperatorText', `The gauge contraction {g:${gaugeIndex}} in "${text}" does not exist; this class has ${nGauge}, numbered from {g:0}`)
    } else if (m[8] !== undefined) {
      coeff = ratMul(coeff, parseRational(m[8].replace(/\s+/g, '')))
    } else if (m[10] !== undefined) {
      if (!last) throw new EngineInputError('parseOperatorText', `In "${text}", a power "^" must follow a bracket, e.g. <12>^2`)
      for (let r = 1; r < Number(m[11]); r++) {
        for (const l of last.lists) l.push(last.pair)
        coeff = ratMul(coeff, last.sgn)
      }
      last = null
    }
  }
  if (gaugeIndex < 0) {
    if (nGauge !== 1)
      throw new EngineInputError('parseOperatorText', `The term "${body.trim()}" in "${text}" needs a gauge contraction: this class has ${nGauge}, so add one of {g:0} … {g:${nGauge - 1}}`)
    gaugeIndex = 0
  }
  return { coeff, angle, square, gaugeIndex }
}

/**
 * Parse an operator written in the syntax above for the given class.
 * @example parseOperatorText(cls, "<12>^2[34]^2") // one term, coefficient 1
 * Throws EngineInputError naming the bad fragment (wrong helicity weight, bad leg, …).
 */
export function parseOperatorText(c: OperatorClass, text: string, nGauge: number): ParsedTerm[] {
  const n = c.legs.length
  const terms = splitTerms(text)
  if (terms.length === 0) throw new EngineInputError('parseOperatorText', 'The operator is empty; type it in the input syntax, e.g. <12>[34]')
  return terms.map(({ sign, body }) => {
    const t = parseTerm(text, body, n, nGauge)
    const derivs = c.legs.map((p, i) => {
      const a = t.angle.filter((e) => e.includes(i)).length - p.angles
      const s = t.square.filter((e) => e.includes(i)).length - p.squares
      if (a !== s || a < 0)
        throw new EngineInputError(
          'parseOperatorText',
          `The term "${body.trim()}" gives leg ${i + 1} (${p.label}) ${a + p.angles} angle and ${s + p.squares} square spinors; this field needs ${p.angles} and ${p.squares}, plus one of each per derivative on it`,
        )
      return a
    })
    const k = derivs.reduce((x, y) => x + y, 0)
    if (k !== c.k) throw new EngineInputError('parseOperatorText', `The term "${body.trim()}" has ${k} derivatives, but the class ${c.key} has ${c.k}`)
    return { coeff: sign === 1 ? t.coeff : ratMul(t.coeff, rat(-1)), lorentz: { derivs, angle: t.angle, square: t.square }, gaugeIndex: t.gaugeIndex }
  })
}

/**
 * The text form of one bracket monomial (inverse of parsing, coefficient 1).
 * @example formatLorentz({derivs:[0,0,0,0], angle:[[0,1],[0,1]], square:[[2,3],[2,3]]}, null) // "<12>^2[34]^2"
 */
export function formatLorentz(l: LorentzStructure, gaugeIndex: number | null): string {
  const part = (pairs: [number, number][], open: string, close: string): string[] => {
    const counts = new Map<string, number>()
    for (const [i, j] of pairs) counts.set(`${i + 1},${j + 1}`, (counts.get(`${i + 1},${j + 1}`) ?? 0) + 1)
    return [...counts].map(([k, m]) => {
      const [i, j] = k.split(',')
      const legs = i!.length === 1 && j!.length === 1 ? `${i}${j}` : `${i},${j}`
      return `${open}${legs}${close}${m > 1 ? `^${m}` : ''}`
    })
  }
  const s = [...part(l.angle, '<', '>'), ...part(l.square, '[', ']')].join('')
  const g = gaugeIndex === null ? '' : `{g:${gaugeIndex}}`
  return s + g || '1'
}
