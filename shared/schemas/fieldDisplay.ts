/**
 * A field's display form: how papers print it (φ, χ_L, \bar{N}, \tilde{\nu}_R), beside its
 * plain name, which stays ASCII for files, keys and typed input. The display form is set in
 * math mode by the board (KaTeX) and by the LaTeX export (pdflatex), so it is limited to what
 * both read the same way and what cannot act on a document: letters and digits, Greek letters
 * (as Unicode or as commands), sub- and superscripts, primes, braces, and a short list of
 * accents and font commands. Anything else is refused with the characters named.
 */

const GREEK_LOWER = 'alpha beta gamma delta epsilon zeta eta theta iota kappa lambda mu nu xi o pi rho varsigma sigma tau upsilon phi chi psi omega'.split(' ')
const GREEK_UPPER = 'A B Gamma Delta E Z H Theta I K Lambda M N Xi O Pi P - Sigma T Upsilon Phi X Psi Omega'.split(' ')

function greekTable(names: string[], first: number): [string, string][] {
  return names.flatMap((name, k): [string, string][] => (name === '-' ? [] : [[String.fromCharCode(first + k), name.length > 1 ? `\\${name}` : name === 'o' ? 'o' : `\\mathrm{${name}}`]]))
}

/** Unicode letters and signs a display form may hold, with the TeX each is set as. */
const UNICODE_TEX: Record<string, string> = {
  ...Object.fromEntries(greekTable(GREEK_LOWER, 0x3b1)),
  ...Object.fromEntries(greekTable(GREEK_UPPER, 0x391)),
  ϕ: '\\phi',
  ϵ: '\\epsilon',
  ϑ: '\\vartheta',
  µ: '\\mu',
  '†': '\\dagger',
  '′': '\\prime',
  '∗': '*',
  '⁰': '^{0}',
  '¹': '^{1}',
  '²': '^{2}',
  '³': '^{3}',
  '⁺': '^{+}',
  '⁻': '^{-}',
  '₀': '_{0}',
  '₁': '_{1}',
  '₂': '_{2}',
  '₃': '_{3}',
  ᴸ: '^{L}',
  ᴿ: '^{R}',
}

/** Commands a display form may use: Greek letters, accents and upright/bold/calligraphic letters. */
const COMMANDS = new Set([
  ...GREEK_LOWER.filter((n) => n.length > 1),
  'varepsilon',
  'vartheta',
  'varphi',
  'varrho',
  'varpi',
  ...GREEK_UPPER.filter((n) => n.length > 1),
  'bar',
  'overline',
  'tilde',
  'widetilde',
  'hat',
  'widehat',
  'check',
  'dot',
  'ddot',
  'vec',
  'mathrm',
  'mathit',
  'mathbf',
  'mathcal',
  'mathsf',
  'bm',
  'prime',
  'dagger',
  'ast',
])

const MAX_DISPLAY = 40

/**
 * Why a display form cannot be used, in the user's words, or null when it can.
 * @example displayProblem('\\bar{N}') // null
 * @example displayProblem('\\input{x}') // 'uses \\input, which ...'
 */
export function displayProblem(display: string): string | null {
  if (display.trim() === '') return 'is empty; leave it out to print the plain name'
  if (display.length > MAX_DISPLAY) return `is longer than ${MAX_DISPLAY} characters`
  const unknown = [...new Set([...display].filter((ch) => !/[A-Za-z0-9_^{}\\' +\-*,()]/.test(ch) && UNICODE_TEX[ch] === undefined))]
  if (unknown.length) return `holds ${unknown.map((ch) => `"${ch}"`).join(', ')}, which a display form cannot print; use letters, digits, Greek letters, _ ^ { } and accents such as \\bar{N}`
  for (const m of display.matchAll(/\\([A-Za-z]+|.)/g)) {
    if (!COMMANDS.has(m[1]!)) return `uses \\${m[1]}, which a display form cannot print; use Greek letters (\\phi), accents (\\bar, \\tilde, \\hat) or \\mathrm`
  }
  let depth = 0
  for (const ch of display) {
    depth += ch === '{' ? 1 : ch === '}' ? -1 : 0
    if (depth < 0) return 'closes a brace "}" that was never opened'
  }
  if (depth !== 0) return 'opens a brace "{" that is never closed'
  if (/[_^]\s*$/.test(display) || /[_^]\s*[_^]/.test(display)) return 'has a "_" or "^" with nothing after it'
  return null
}

/**
 * The TeX of a field as the board and the export set it: its display form (Unicode mapped to
 * commands), else its plain name, upright when longer than one letter (so "phi" never reads
 * as p·h·i), italic when one letter (H, Q, u as papers print them). Braced, so a power or a
 * dagger can follow it.
 * @example fieldTex('phi') // "\\mathrm{phi}"
 * @example fieldTex('chi_L') // "\\mathrm{chi}_{\\mathrm{L}}"
 * @example fieldTex('phi', 'φ') // "{\\phi}"
 * @example fieldTex('NR', '\\bar{N}') // "{\\bar{N}}"
 */
export function fieldTex(name: string, display?: string): string {
  if (display !== undefined && displayProblem(display) === null) {
    return `{${[...display]
      .map((ch) => (UNICODE_TEX[ch] !== undefined ? `${UNICODE_TEX[ch]}${/^\\[A-Za-z]+$/.test(UNICODE_TEX[ch]) ? ' ' : ''}` : ch))
      .join('')
      .trim()}}`
  }
  if (name.length === 1) return name
  const [head, ...rest] = name.split('_').filter(Boolean)
  const upright = (part: string) => `\\mathrm{${part}}`
  return rest.length ? `{${upright(head!)}_{${rest.map(upright).join('')}}}` : upright(head!)
}

/**
 * Field name → TeX (display form or upright name) for every field of a theory file, for
 * classKeyTex; a file without fields (or not yet valid) gives an empty table.
 * @example fieldTexTable({ fields: [{ name: 'phi', display: 'φ' }] }) // { phi: "{\\phi}" }
 */
export function fieldTexTable(theory: unknown): Record<string, string> {
  const fields = (theory as { fields?: unknown } | null | undefined)?.fields
  if (!Array.isArray(fields)) return {}
  return Object.fromEntries(
    fields.flatMap((f: { name?: unknown; display?: unknown }) => (typeof f?.name === 'string' ? [[f.name, fieldTex(f.name, typeof f.display === 'string' ? f.display : undefined)]] : [])),
  )
}
