import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, type World } from '../support/fixtures'
import { messageOf } from '../support/client'
import smeft from '../../shared/presets/smeft.json'

// The running of a theory's own gauge couplings through its tower, against the built server
// and a real PostgreSQL: what the page starts from (GET) and the running itself (POST).
let world: World

/** A dark U(1) X with a complex scalar S of charge 1 and a Dirac fermion chi of charge 1. */
const DARK = {
  name: 'Dark sector',
  frame: 'relativistic',
  groups: [{ name: 'X', type: 'U1', gauge: true }],
  fields: [
    { name: 'S', lorentz: 'scalar', charges: { X: '1' } },
    { name: 'chi', lorentz: 'left-weyl', charges: { X: '1' } },
    { name: 'chiR', lorentz: 'right-weyl', charges: { X: '1' } },
    { name: 'Ad', lorentz: 'field-strength', gaugeOf: 'X' },
  ],
}
const RUN = { loops: 1, muFromGeV: 1, alpha: { X: 0.01 }, plotFromGeV: 0.1, plotToGeV: 1e6 }

async function newTheory(definition: object) {
  const r = await world.owner.client.post(`/api/groups/${world.slug}/theories`, { definition })
  expect(r.status, JSON.stringify(r.body)).toBe(201)
  return r.body.theory.id as number
}
async function integrateOut(id: number, fields: string[], value: number, unit = 'GeV') {
  const r = await world.byRole.editor.client.post(`/api/theories/${id}/integrate-out`, { fields, scale: { value, unit } })
  expect(r.status, JSON.stringify(r.body)).toBe(201)
  return r.body.theory.id as number
}

beforeAll(async () => {
  world = await buildWorld()
})

describe("the running of a tower's gauge couplings", () => {
  let parent: number
  let child: number
  beforeAll(async () => {
    parent = await newTheory(DARK)
    child = await integrateOut(parent, ['S'], 1, 'TeV')
  })

  it('GET: the chain through the tower, the matter with its masses and placeholder inputs, for every member', async () => {
    const r = await world.byRole.viewer.client.get(`/api/theories/${child}/gauge-running`)
    expect(r.status, JSON.stringify(r.body)).toBe(200)
    expect(r.body.chain).toEqual([
      { id: parent, name: 'Dark sector', thresholdGeV: null },
      { id: child, name: r.body.chain[1].name, thresholdGeV: 1000 },
    ])
    expect(r.body.groups).toEqual([{ name: 'X', label: 'U(1)', abelian: true }])
    expect(r.body.multiplets.map((m: { name: string; massGeV: number }) => [m.name, m.massGeV])).toEqual([
      ['chi', 0],
      ['chiR', 0],
      ['S', 1000],
    ])
    expect(r.body.defaults.alpha).toEqual({ X: 0.01 })
    expect(r.body.defaults.source).toMatch(/^Placeholder inputs/)
    expect(r.body.problem).toBeNull()
    // From the parent the tower continues down through its only child: the same chain.
    const fromParent = await world.byRole.viewer.client.get(`/api/theories/${parent}/gauge-running`)
    expect(fromParent.body.chain.map((c: { id: number }) => c.id)).toEqual([parent, child])
  })

  it('POST: one segment per range with exact b (4/3 below the scalar, 5/3 above: by hand from Machacek & Vaughn 1983), the threshold in the table', async () => {
    const r = await world.byRole.viewer.client.post(`/api/theories/${child}/gauge-running`, RUN)
    expect(r.status, JSON.stringify(r.body)).toBe(200)
    expect(r.body.segments.map((s: { lowGeV: number | null; highGeV: number | null; oneLoop: string[] }) => [s.lowGeV, s.highGeV, s.oneLoop[0]])).toEqual([
      [null, 1000, '4/3'],
      [1000, null, '5/3'],
    ])
    const row = r.body.table.find((t: { label: string }) => t.label === 'threshold of S')
    // One loop: α⁻¹(1 TeV) = 100 − (4/3) ln(1000)/2π.
    expect(row.alphaInverse[0]).toBeCloseTo(100 - ((4 / 3) * Math.log(1000)) / (2 * Math.PI), 9)
    expect(r.body.stops).toEqual([])
    expect(r.body.curve.length).toBeGreaterThan(50)
  })

  it("POST: a Landau pole inside the range is named in the physicist's words", async () => {
    const r = await world.byRole.viewer.client.post(`/api/theories/${child}/gauge-running`, { ...RUN, alpha: { X: 0.3 }, plotToGeV: 1e30 })
    expect(r.status).toBe(200)
    expect(r.body.stops).toHaveLength(1)
    expect(r.body.stops[0].message).toMatch(/^g_X grows beyond 4π above μ ≈ .* GeV: perturbation theory fails there/)
  })

  it('a theory with two lower branches says which page to open', async () => {
    const other = await integrateOut(parent, ['chi', 'chiR'], 5, 'TeV')
    const r = await world.byRole.viewer.client.get(`/api/theories/${parent}/gauge-running`)
    expect(r.body.chain.map((c: { id: number }) => c.id)).toEqual([parent])
    expect(r.body.note).toMatch(/^“Dark sector” has 2 theories below it .*; open the couplings page of the one whose thresholds the running should cross\.$/)
    const down = await world.byRole.viewer.client.get(`/api/theories/${other}/gauge-running`)
    expect(down.body.multiplets.map((m: { name: string; massGeV: number }) => [m.name, m.massGeV])).toEqual([
      ['S', 0],
      ['chi', 5000],
      ['chiR', 5000],
    ])
  })
})

describe('a tower the running cannot use', () => {
  it('is reported as a problem on the page, naming what to fix', async () => {
    const top = await newTheory({ ...DARK, name: 'Dark with an edited child' })
    const below = await integrateOut(top, ['S'], 1, 'TeV')
    const current = await world.byRole.editor.client.get(`/api/theories/${below}`)
    const definition = { ...current.body.theory.definition, groups: [...DARK.groups, { name: 'C', type: 'SU', n: 3, gauge: true }] }
    const edit = await world.byRole.editor.client.patch(`/api/theories/${below}`, { definition, version: current.body.theory.version })
    expect(edit.status, JSON.stringify(edit.body)).toBe(200)
    const r = await world.byRole.viewer.client.get(`/api/theories/${below}/gauge-running`)
    expect(r.status).toBe(200)
    expect(r.body.problem).toMatch(/and the theory above it, “Dark with an edited child”, have different gauge groups; the running through a tower needs the same gauge groups on every step\.$/)
    expect(r.body.defaults).toBeNull()
    const run = await world.byRole.viewer.client.post(`/api/theories/${below}/gauge-running`, RUN)
    expect(run.status).toBe(422)
    expect(messageOf(run)).toContain('have different gauge groups')
  })
})

describe('the Standard Model preset', () => {
  it('suggests PDG-based inputs at M_Z and gives b = (−7, −19/6, 41/6), B_YY = 199/18 (Machacek & Vaughn 1983; from memory)', async () => {
    const id = await newTheory({ ...smeft, name: 'SM for running' })
    const inputs = await world.byRole.viewer.client.get(`/api/theories/${id}/gauge-running`)
    expect(inputs.body.defaults.muFromGeV).toBe(91.188)
    expect(inputs.body.defaults.alpha.colour).toBe(0.118)
    // α_2 = α̂/sin²θ̂ with α̂⁻¹ = 127.93, sin²θ̂ = 0.23129 (PDG 2024; from memory): ≈ 0.03380.
    expect(inputs.body.defaults.alpha.weak).toBeCloseTo(0.0338, 4)
    const { source: _s, ...defaults } = inputs.body.defaults
    const r = await world.byRole.viewer.client.post(`/api/theories/${id}/gauge-running`, { ...defaults, muToGeV: 1e16 })
    expect(r.status, JSON.stringify(r.body)).toBe(200)
    expect(r.body.segments[0].oneLoop).toEqual(['-7', '-19/6', '41/6'])
    expect(r.body.segments[0].twoLoop[2][2]).toBe('199/18')
    expect(r.body.table.map((t: { label: string }) => t.label)).toEqual(['input scale', 'chosen scale'])
    expect(r.body.assumptions.some((a: string) => a.includes('Yukawa'))).toBe(true)
  })
})

describe('bad input changes nothing and is answered in words', () => {
  it('schema errors are 400 naming the field; inputs the theory cannot take are 422 from the engine', async () => {
    const id = await newTheory({ ...DARK, name: 'Dark for errors' })
    const post = (body: unknown) => world.byRole.viewer.client.post(`/api/theories/${id}/gauge-running`, body)
    const loops = await post({ ...RUN, loops: 3 })
    expect(loops.status).toBe(400)
    expect(messageOf(loops)).toContain('Loops in β must be 1 or 2')
    const range = await post({ ...RUN, plotFromGeV: 10, plotToGeV: 1 })
    expect(range.status).toBe(400)
    expect(messageOf(range)).toContain('Lowest plotted scale must be below the highest plotted scale')
    const strong = await post({ ...RUN, alpha: { X: 20 } })
    expect(strong.status).toBe(400)
    expect(messageOf(strong)).toContain('α of X must be below 4π to be perturbative')
    const unknown = await post({ ...RUN, alpha: { X: 0.01, Z: 0.1 } })
    expect(unknown.status).toBe(422)
    expect(messageOf(unknown)).toContain('Z is not a running gauge group of this theory (those are X).')
    const missing = await post({ ...RUN, alpha: {} })
    expect(missing.status).toBe(422)
    expect(messageOf(missing)).toContain('Give α_X at 1 GeV: every gauge coupling of the theory needs a starting value.')
  })

  it('outsiders are refused: 401 signed out, 403 for a stranger (GET; the POST is in the exhaustive role test)', async () => {
    expect((await world.anonymous.get(`/api/theories/${world.theoryId}/gauge-running`)).status).toBe(401)
    expect((await world.stranger.client.get(`/api/theories/${world.theoryId}/gauge-running`)).status).toBe(403)
  })
})
