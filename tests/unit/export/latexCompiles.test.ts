import { describe, it, expect } from 'vitest'
import { buildBasis, type BasisReport } from '../../../server/engine/basis/buildBasis'
import { assembleExport } from '../../../server/engine/export/boardExport'
import { toLatex } from '../../../server/engine/export/toLatex'
import { toCsv, csvField } from '../../../server/engine/export/toCsv'
import { findPreset } from '../../../shared/presets/index'
import { compileLatex, HOSTILE_TEXTS } from '../../support/pdflatex'
import { commentText } from '../../../server/engine/export/commentText'
import { parseCsv } from '../../support/csv'
import { storedRows } from '../../support/basisExport'

// The LaTeX export of real bases, with hostile user text in every place a user writes one
// (theory name, tags, the basis note, notes' authors), compiles with Debian's pdflatex in both
// notations; the CSV export neutralises cells a spreadsheet would run (issue 12, item 5).

/** The export of an engine-built basis, as the app assembles it, with hostile text everywhere. */
function hostileExport(report: BasisReport) {
  const { classes, operators } = storedRows(report)
  return assembleExport({
    theory: { name: HOSTILE_TEXTS[0]!, definition: {} },
    countingRule: HOSTILE_TEXTS[2]!,
    note: HOSTILE_TEXTS[1]!,
    exportedAt: '2026-12-03T00:00:00.000Z',
    classes,
    operators,
    tags: operators.flatMap((op, i) => [{ operatorId: op.id, kind: 'custom', label: HOSTILE_TEXTS[i % HOSTILE_TEXTS.length]! }]),
    notes: operators.slice(0, 3).map((op, i) => ({ operatorId: op.id, authorName: "=cmd|' /C calc'!A0", body: HOSTILE_TEXTS[i]!, createdAt: '2026-12-01T00:00:00Z' })),
  })
}

describe('the LaTeX export of real bases compiles with pdflatex', () => {
  it.each([
    ['qed', 8],
    ['scalar-qed', 8],
    ['smeft', 6],
  ] as const)('%s up to dimension %i, both notations, hostile text included', (preset, maxDim) => {
    const data = hostileExport(buildBasis(findPreset(preset)!.theory, { maxDim, nf: 1 }))
    for (const dirac of [false, true]) {
      const tex = toLatex(data, { dirac })
      expect(tex).toMatch(/^% Scalewright basis export: Photons \\textbackslash\{\}input/)
      expect(tex.split('\n').filter((l) => /\\(input|write18|immediate)/.test(l))).toEqual([])
      const compiled = compileLatex(tex)
      expect(compiled.ok, `${preset} dirac=${dirac}\n${compiled.log.slice(-3000)}`).toBe(true)
      expect(compiled.log).not.toContain('(/etc/passwd') // TeX logs a file it opens as "(name"; printed text may show the name
    }
  })
})

describe('paper-ready LaTeX (issue 17, item 4)', () => {
  // SMEFT with N_f = 1: 84 real parameters at dimension 6 (Henning, Lu, Melia & Murayama,
  // JHEP 08 (2017) 016; Grzadkowski, Iskrzynski, Misiak & Rosiek, JHEP 10 (2010) 085 for the
  // operators) and 993 at dimension 8 (Li, Ren, Shu, Xiao, Yu & Zheng, Phys. Rev. D 104 (2021)
  // 015026; Murphy, JHEP 10 (2020) 174). Hundreds of rows must flow over pages, in article and
  // in amsart (a journal class in Debian's texlive-latex-base; revtex needs texlive-publishers).
  const smeft8 = hostileExport(buildBasis(findPreset('smeft')!.theory, { maxDim: 8, nf: 1 }))

  it.each(['article', 'amsart'])('SMEFT to dimension 8 compiles in %s, one longtable per order, over several pages', (documentClass) => {
    const tex = toLatex(smeft8).replace('\\documentclass{article}', `\\documentclass{${documentClass}}`)
    expect(tex.match(/\\begin\{longtable\}/g)).toHaveLength(smeft8.orders.filter((o) => o.classes.some((c) => c.operators.length)).length)
    expect(tex).not.toContain('\\begin{table}')
    const compiled = compileLatex(tex)
    expect(compiled.ok, compiled.log.slice(-3000)).toBe(true)
    const pages = Number(/Output written on export\.pdf \((\d+) pages?/.exec(compiled.log.replace(/\n/g, ''))?.[1] ?? 0)
    expect(pages).toBeGreaterThan(10)
    expect(compiled.log).not.toMatch(/Overfull \\hbox \((\d{3,}|[3-9]\d)\.\d+pt too wide\)/) // nothing runs 30pt or more off the page
  })

  it('the real parameters the tables list are those of the basis (84 at dimension 6, 993 at dimension 8)', () => {
    const sum = (dim: number) =>
      smeft8.orders
        .find((o) => o.dimension === dim)!
        .classes.flatMap((c) => c.operators)
        .reduce((s, o) => s + o.realParameters, 0)
    expect([sum(6), sum(8)]).toEqual([84, 993])
  })

  it('header comments stay one readable line: Unicode kept, nothing TeX could run', () => {
    expect(commentText('χ† creates the antiparticle;\nψ, μ → ∞')).toBe('χ† creates the antiparticle; ψ, μ → ∞')
    expect(commentText('x\r\n\\write18{id}')).toBe('x \\textbackslash{}write18{id}')
    const tex = toLatex({ ...smeft8, countingRule: '1/m', note: "χ creates the antiparticle (in the particle's representation)\nψ† σ·B ψ" })
    expect(tex).toContain("% Conventions: χ creates the antiparticle (in the particle's representation)")
    expect(tex).toContain('% Conventions: ψ† σ·B ψ')
  })
})

describe('the CSV export', () => {
  it.each([
    ['=1+1', "'=1+1"],
    ['+1', "'+1"],
    ['-2+3', "'-2+3"],
    ['@SUM(A1)', "'@SUM(A1)"],
    ['\tx', "'\tx"],
    ['\rx', '"\'\rx"'],
    ['plain', 'plain'],
    ['a=b', 'a=b'],
    ['=a,b', '"\'=a,b"'],
  ])('neutralises %j as %j', (input, expected) => {
    expect(csvField(input)).toBe(expected)
  })

  it('writes numbers as numbers, negative ones included', () => {
    expect(csvField(-2)).toBe('-2')
    expect(csvField(0)).toBe('0')
    expect(csvField(true)).toBe('true')
  })

  it('no cell of a real export starts with = + - @, a tab or a carriage return', () => {
    const rows = parseCsv(toCsv(hostileExport(buildBasis(findPreset('qed')!.theory, { maxDim: 6, nf: 1 }))))
    expect(rows.flat().filter((c) => /^[=+\-@\t\r]/.test(c))).toEqual([])
    expect(rows.some((r) => r.at(-1)!.startsWith("'=cmd|"))).toBe(true)
  })
})
