/**
 * Text of users (theory names, tags, notes, display names) made safe for LaTeX: every
 * character TeX would act on is printed instead (backslash, braces, $ & # % _ ^ ~, and < > |
 * which the old font encoding prints as other glyphs); every kind of line break and other
 * white space becomes one space, so user text can never start a line, end a comment or open
 * a command; control characters are dropped. Common Unicode is mapped to LaTeX: Greek letters
 * and mathematical signs as math, super- and subscript digits as ^{..} and _{..}, accented
 * letters with LaTeX's accent commands (needs \usepackage[T1]{fontenc} for the Nordic and
 * Icelandic letters), and anything else unknown is written as its code point, [U+XXXX].
 * Common practice: the special characters are those of the LaTeX manual (Lamport, 1994).
 * @example latexText('μ → e γ at 100%') // "\ensuremath{\mu} \ensuremath{\rightarrow} e \ensuremath{\gamma} at 100\%"
 */
export function latexText(text: string): string {
  const chars = [...text.normalize('NFC')]
  let out = ''
  for (let i = 0; i < chars.length; i++) {
    const ch = chars[i]!
    const script = SUPER[ch] !== undefined ? SUPER : SUB[ch] !== undefined ? SUB : null
    if (!script) {
      out += single(ch)
      continue
    }
    let run = script[ch]!
    while (i + 1 < chars.length && script[chars[i + 1]!] !== undefined) run += script[chars[++i]!]!
    out += `\\ensuremath{${script === SUPER ? '^' : '_'}{${run}}}`
  }
  return out.replace(/ {2,}/g, ' ')
}

function single(ch: string): string {
  if (SPECIAL[ch] !== undefined) return SPECIAL[ch]
  if (/^[\t\n\v\f\r \u0085\u00a0\u1680\u2000-\u200a\u2028\u2029\u202f\u205f\u3000\ufeff]$/.test(ch)) return ' '
  if (/^[\u0000-\u001f\u007f-\u009f\u200b-\u200d\u2060]$/.test(ch)) return ''
  if (ch.charCodeAt(0) < 0x80) return ch
  if (MATH[ch] !== undefined) return `\\ensuremath{${MATH[ch]}}`
  if (TEXT[ch] !== undefined) return TEXT[ch]
  // An accented letter: its letter with LaTeX's accent commands; a non-Latin letter with a
  // mark (Greek with tonos) prints as the letter alone.
  const [base, ...marks] = [...ch.normalize('NFD')]
  if (marks.length && marks.every((m) => ACCENTS[m] !== undefined)) {
    if (/^[A-Za-z]$/.test(base!))
      return accented(
        base!,
        marks.map((m) => ACCENTS[m]!),
      )
    return single(base!)
  }
  if (ACCENTS[ch] !== undefined) return '' // a mark without a letter to sit on
  return `[U+${ch.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}]`
}

function accented(letter: string, marks: string[]): string {
  // Accents sit on the dotless i and j (\'{\i}), as in print.
  let body = letter === 'i' ? '\\i' : letter === 'j' ? '\\j' : letter
  for (const mark of marks) body = `${mark}{${body}}`
  return body
}

const SPECIAL: Record<string, string> = {
  '\\': '\\textbackslash{}',
  '{': '\\{',
  '}': '\\}',
  $: '\\$',
  '&': '\\&',
  '#': '\\#',
  '%': '\\%',
  _: '\\_',
  '^': '\\textasciicircum{}',
  '~': '\\textasciitilde{}',
  '<': '\\textless{}',
  '>': '\\textgreater{}',
  '|': '\\textbar{}',
  '"': '\\textquotedbl{}',
}

// Combining marks (after NFD) → LaTeX accent commands.
const ACCENTS: Record<string, string> = {
  '\u0300': '\\`',
  '\u0301': "\\'",
  '\u0302': '\\^',
  '\u0303': '\\~',
  '\u0304': '\\=',
  '\u0306': '\\u',
  '\u0307': '\\.',
  '\u0308': '\\"',
  '\u030a': '\\r',
  '\u030b': '\\H',
  '\u030c': '\\v',
  '\u0323': '\\d',
  '\u0327': '\\c',
  '\u0328': '\\k',
  '\u0331': '\\b',
}

const GREEK = 'alpha beta gamma delta varepsilon zeta eta theta iota kappa lambda mu nu xi o pi rho varsigma sigma tau upsilon varphi chi psi omega'.split(' ')
// Capitals from U+0391; the one gap (U+03A2) is "-"; those that look Latin print as upright Latin.
const GREEK_UPPER = 'A B Gamma Delta E Z H Theta I K Lambda M N Xi O Pi P - Sigma T Upsilon Phi X Psi Omega'.split(' ')

function greek(names: string[], first: number, tex: (name: string) => string): Record<string, string> {
  return Object.fromEntries(names.flatMap((name, k) => (name === '-' ? [] : [[String.fromCharCode(first + k), tex(name)]])))
}

const MATH: Record<string, string> = {
  ...greek(GREEK, 0x3b1, (name) => (name.length > 1 ? `\\${name}` : name)),
  ...greek(GREEK_UPPER, 0x391, (name) => (name.length > 1 ? `\\${name}` : `\\mathrm{${name}}`)),
  ϵ: '\\epsilon',
  ϑ: '\\vartheta',
  ϕ: '\\phi',
  ϖ: '\\varpi',
  ϱ: '\\varrho',
  µ: '\\mu',
  '±': '\\pm',
  '∓': '\\mp',
  '×': '\\times',
  '÷': '\\div',
  '·': '\\cdot',
  '−': '-',
  '≤': '\\leq',
  '≥': '\\geq',
  '≠': '\\neq',
  '≈': '\\approx',
  '≃': '\\simeq',
  '∼': '\\sim',
  '≡': '\\equiv',
  '∝': '\\propto',
  '≪': '\\ll',
  '≫': '\\gg',
  '∞': '\\infty',
  '→': '\\rightarrow',
  '←': '\\leftarrow',
  '↔': '\\leftrightarrow',
  '⇒': '\\Rightarrow',
  '⇐': '\\Leftarrow',
  '⇔': '\\Leftrightarrow',
  '↑': '\\uparrow',
  '↓': '\\downarrow',
  '∂': '\\partial',
  '∇': '\\nabla',
  '∑': '\\sum',
  '∏': '\\prod',
  '∫': '\\int',
  '√': '\\surd',
  '∈': '\\in',
  '∉': '\\notin',
  '⊂': '\\subset',
  '⊆': '\\subseteq',
  '∪': '\\cup',
  '∩': '\\cap',
  '⊗': '\\otimes',
  '⊕': '\\oplus',
  '†': '\\dagger',
  '‡': '\\ddagger',
  ℏ: '\\hbar',
  ℓ: '\\ell',
  '°': '^{\\circ}',
  '′': '\\prime',
  '⟨': '\\langle',
  '⟩': '\\rangle',
  '∀': '\\forall',
  '∃': '\\exists',
  '∅': '\\emptyset',
  '¬': '\\neg',
  '∧': '\\wedge',
  '∨': '\\vee',
  '⋯': '\\cdots',
  '□': '\\Box',
}

const TEXT: Record<string, string> = {
  ß: '\\ss{}',
  æ: '\\ae{}',
  Æ: '\\AE{}',
  œ: '\\oe{}',
  Œ: '\\OE{}',
  ø: '\\o{}',
  Ø: '\\O{}',
  ł: '\\l{}',
  Ł: '\\L{}',
  ı: '\\i{}',
  ȷ: '\\j{}',
  đ: '\\dj{}',
  Đ: '\\DJ{}',
  ð: '\\dh{}',
  Ð: '\\DH{}',
  þ: '\\th{}',
  Þ: '\\TH{}',
  ŋ: '\\ng{}',
  Ŋ: '\\NG{}',
  '–': '--',
  '—': '---',
  '‘': '`',
  '’': "'",
  '‚': ',',
  '“': '``',
  '”': "''",
  '„': ',,',
  '…': '\\ldots{}',
  '•': '\\textbullet{}',
  '§': '\\S{}',
  '¶': '\\P{}',
  '©': '\\textcopyright{}',
  '®': '\\textregistered{}',
  '™': '\\texttrademark{}',
  '€': '\\texteuro{}',
  '£': '\\pounds{}',
  '¿': '?`',
  '¡': '!`',
  '«': '\\guillemotleft{}',
  '»': '\\guillemotright{}',
  '‰': '\\textperthousand{}',
}

const SUPER: Record<string, string> = {
  '⁰': '0',
  '¹': '1',
  '²': '2',
  '³': '3',
  '⁴': '4',
  '⁵': '5',
  '⁶': '6',
  '⁷': '7',
  '⁸': '8',
  '⁹': '9',
  '⁺': '+',
  '⁻': '-',
  '⁼': '=',
  '⁽': '(',
  '⁾': ')',
  ⁿ: 'n',
  ⁱ: 'i',
}
const SUB: Record<string, string> = {
  '₀': '0',
  '₁': '1',
  '₂': '2',
  '₃': '3',
  '₄': '4',
  '₅': '5',
  '₆': '6',
  '₇': '7',
  '₈': '8',
  '₉': '9',
  '₊': '+',
  '₋': '-',
  '₌': '=',
  '₍': '(',
  '₎': ')',
}
