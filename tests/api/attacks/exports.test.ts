import { describe, it, expect, beforeAll } from 'vitest'
import { ApiClient } from '../../support/client'
import { buildWorld, addBasis, SMALL_THEORY, type World } from '../../support/fixtures'
import { testDb } from '../../support/db'
import { compileLatex, HOSTILE_TEXTS } from '../../support/pdflatex'
import { parseCsv } from '../../support/csv'

// Export injection (issue 12, item 5). A theory name with a newline put \input{/etc/passwd} or
// \write18{...} on its own line of the LaTeX export (also through a share link); μ, <, > and
// backslashes in tags broke pdflatex; a CSV cell made of a display name and a note became a
// live spreadsheet formula.
let world: World
let basisId: number
let shareToken: string
const THEORY_NAME = 'Photons\n\\input{/etc/passwd}'
const FORMULA_NAME = '=HYPERLINK("http://evil.test","click")'

beforeAll(async () => {
  world = await buildWorld()
  const basis = await addBasis(world)
  basisId = basis.basisId
  const theory = await world.owner.client.get(`/api/theories/${world.theoryId}`)
  const renamed = await world.owner.client.patch(`/api/theories/${world.theoryId}`, { definition: { ...SMALL_THEORY, name: THEORY_NAME }, version: theory.body.theory.version })
  expect(renamed.status, JSON.stringify(renamed.body)).toBe(200)
  for (const [i, label] of HOSTILE_TEXTS.entries()) {
    const op = i % 2 ? basis.operatorIds.photon : basis.operatorIds.derivative
    const res = await world.byRole.commenter.client.post(`/api/operators/${op}/tags`, { kind: 'custom', label: label.slice(0, 120) })
    expect(res.status, `${label}: ${JSON.stringify(res.body)}`).toBe(201)
  }
  await testDb()('users').where({ id: world.byRole.commenter.id }).update({ display_name: FORMULA_NAME })
  for (const body of ['-2+3', '@SUM(A1:A9)', '=1+1', '\tindented', 'plain text']) {
    expect((await world.byRole.commenter.client.post(`/api/theories/${world.theoryId}/annotations`, { body, operatorId: basis.operatorIds.photon })).status).toBe(201)
  }
  shareToken = (await world.owner.client.post(`/api/theories/${world.theoryId}/share-links`, {})).body.link.token
})

function expectSafeLatex(tex: string) {
  // No TeX command of a user's text survives: backslashes in user text are printed, not run.
  expect(tex).not.toMatch(/\\input\{|\\write18|\\immediate|\\catcode|\^\^5c/)
  for (const line of tex.split('\n')) {
    expect(line, 'a line of the export starts with user text').not.toMatch(/^(Photons|x|line|separator|next)\b/)
  }
  const compiled = compileLatex(tex)
  expect(compiled.ok, compiled.log.slice(-3000)).toBe(true)
  expect(compiled.log).not.toContain('(/etc/passwd') // TeX logs a file it opens as "(name"; an overfull-box line may print the text itself
  expect(compiled.log).not.toMatch(/runsystem/)
}

describe('LaTeX export', () => {
  it('prints hostile names and tags as text, and compiles with pdflatex', async () => {
    const res = await world.byRole.viewer.client.get(`/api/bases/${basisId}/export?format=latex`)
    expect(res.status).toBe(200)
    const tex = String(res.body)
    expectSafeLatex(tex)
    expect(tex).toContain('Photons \\textbackslash{}input\\{/etc/passwd\\}')
    expect(tex).toContain('\\ensuremath{\\mu}')
  })

  it('the same through a share link', async () => {
    const res = await new ApiClient().get(`/api/share/${shareToken}/export?format=latex`)
    expect(res.status).toBe(200)
    expectSafeLatex(String(res.body))
  })
})

describe('CSV export', () => {
  it('no cell starts with = + - @, a tab or a carriage return', async () => {
    const res = await world.byRole.viewer.client.get(`/api/bases/${basisId}/export?format=csv`)
    expect(res.status).toBe(200)
    const rows = parseCsv(String(res.body))
    const cells = rows.flat()
    const live = cells.filter((c) => /^[=+\-@\t\r]/.test(c))
    expect(live, 'cells a spreadsheet would run').toEqual([])
    const notes = rows.find((r) => r.at(-1)!.includes('HYPERLINK'))!.at(-1)!
    expect(notes.startsWith('\'=HYPERLINK("http://evil.test","click"): -2+3')).toBe(true)
  })
})
