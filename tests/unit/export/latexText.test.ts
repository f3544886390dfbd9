import { describe, it, expect } from 'vitest'
import { latexText } from '../../../server/engine/export/latexText'
import { compileLatex, HOSTILE_TEXTS, PDFLATEX } from '../../support/pdflatex'
import { existsSync } from 'node:fs'

// The LaTeX escaper of user text (issue 12, item 5). Special characters are those of the LaTeX
// manual (Lamport, "LaTeX: A Document Preparation System", 2nd ed., 1994, §2.2 and §3.2);
// accent commands from the same; the Unicode mapping is common practice.
describe('latexText', () => {
  it.each([
    ['\\', '\\textbackslash{}'],
    ['{}', '\\{\\}'],
    ['$ & # % _', '\\$ \\& \\# \\% \\_'],
    ['^ ~', '\\textasciicircum{} \\textasciitilde{}'],
    ['a < b > c | d', 'a \\textless{} b \\textgreater{} c \\textbar{} d'],
    ['"quoted"', '\\textquotedbl{}quoted\\textquotedbl{}'],
    ['\\input{/etc/passwd}', '\\textbackslash{}input\\{/etc/passwd\\}'],
    ['^^5c', '\\textasciicircum{}\\textasciicircum{}5c'],
  ])('prints the special characters of %j', (input, expected) => {
    expect(latexText(input)).toBe(expected)
  })

  it.each([
    ['μ → e γ', '\\ensuremath{\\mu} \\ensuremath{\\rightarrow} e \\ensuremath{\\gamma}'],
    ['µ (micro sign)', '\\ensuremath{\\mu} (micro sign)'],
    ['ΔΩ Α', '\\ensuremath{\\Delta}\\ensuremath{\\Omega} \\ensuremath{\\mathrm{A}}'],
    ['± × ≤ ≥ ≠ ≈ ∞', '\\ensuremath{\\pm} \\ensuremath{\\times} \\ensuremath{\\leq} \\ensuremath{\\geq} \\ensuremath{\\neq} \\ensuremath{\\approx} \\ensuremath{\\infty}'],
    ['10⁻³ m²', '10\\ensuremath{^{-3}} m\\ensuremath{^{2}}'],
    ['ψ₁₂', '\\ensuremath{\\psi}\\ensuremath{_{12}}'],
    ['Müller Ångström Čech façade naïve', 'M\\"{u}ller \\r{A}ngstr\\"{o}m \\v{C}ech fa\\c{c}ade na\\"{\\i}ve'],
    ['Łódź Straße Øresund', "\\L{}\\'{o}d\\'{z} Stra\\ss{}e \\O{}resund"],
    ['ά', '\\ensuremath{\\alpha}'],
    ['– — … “x”', "-- --- \\ldots{} ``x''"],
    ['汉 😀', '[U+6C49] [U+1F600]'],
  ])('maps %j to LaTeX', (input, expected) => {
    expect(latexText(input)).toBe(expected)
  })

  it('turns every line break and other white space into one space, and drops control characters', () => {
    expect(latexText('a\nb\r\nc\rd\u2028e\u2029f\u0085g\u000bh\u000ci\tj')).toBe('a b c d e f g h i j')
    expect(latexText('x\u0000y\u0007z\u200bw')).toBe('xyzw')
    for (const text of HOSTILE_TEXTS) expect(latexText(text)).not.toMatch(/[\n\r\u2028\u2029\u0085\u000b\u000c]/)
  })

  it('leaves no TeX character of the input active: what remains after its own commands is plain text', () => {
    const math = /\\ensuremath\{(?:[^{}]|\{[^{}]*\})*\}/g
    const words =
      /\\(?:textbackslash|textasciicircum|textasciitilde|textless|textgreater|textbar|textquotedbl|ldots|ss|ae|AE|oe|OE|o|O|l|L|i|j|dj|DJ|dh|DH|th|TH|ng|NG|textbullet|S|P|textcopyright|textregistered|texttrademark|texteuro|pounds|guillemotleft|guillemotright|textperthousand)\{\}/g
    const escapes = /\\[{}$&#%_]/g
    const accents = /\\["'`^~=.rHvcdkbu]\{(?:\\[ij])?/g
    for (const text of HOSTILE_TEXTS) {
      const out = latexText(text)
      const rest = out
        .replace(math, '')
        .replace(words, '')
        .replace(escapes, '')
        .replace(accents, '')
        .replace(/\\[ij](?=\})/g, '')
      expect(rest, `${JSON.stringify(text)} → ${out}`).not.toMatch(/[\\$&#%^_~]/)
    }
  })

  it('every hostile text compiles with pdflatex inside a document, printing, never running', () => {
    expect(existsSync(PDFLATEX), 'pdflatex from Debian (texlive-latex-base) is needed; .ci/run installs it').toBe(true)
    const body = HOSTILE_TEXTS.map((t) => `${latexText(t)}\\par`).join('\n')
    const doc = `\\documentclass{article}\n\\usepackage[T1]{fontenc}\n\\usepackage{lmodern}\n\\usepackage{amsmath,amssymb}\n\\begin{document}\n${body}\n\\end{document}\n`
    const compiled = compileLatex(doc)
    expect(compiled.ok, compiled.log.slice(-3000)).toBe(true)
    expect(compiled.log).not.toContain('/etc/passwd')
    expect(compiled.log).not.toMatch(/runsystem/)
  })
})
