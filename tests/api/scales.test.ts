import { describe, it, expect, beforeAll } from 'vitest'
import { buildWorld, addBasis, type World, DIRAC_AND_SCALAR } from '../support/fixtures'
import { rowCounts, testDb } from '../support/db'
import { messageOf } from '../support/client'

// Scale ladders, towers (integrate out), set-aside-below and the running-coupling routes,
// against the built server and a real PostgreSQL.
let world: World

const LADDER = {
  scales: [
    { name: 'E', value: '10', unit: 'GeV' },
    { name: 'M', value: '1', unit: 'TeV' },
    { name: 'R', value: '1', unit: 'fm' },
  ],
  parameters: [{ name: 'eps', numerator: 'E', denominator: 'M' }],
  precisionTarget: 1e-3,
  orders: [0, 1, 2, 3],
}
const DEMO_LIKE = DIRAC_AND_SCALAR

async function newTheory(definition: object) {
  const r = await world.owner.client.post(`/api/groups/${world.slug}/theories`, { definition })
  expect(r.status, JSON.stringify(r.body)).toBe(201)
  return r.body.theory.id as number
}
const put = (who: keyof World['byRole'], theoryId: number, body: unknown) => world.byRole[who].client.request('PUT', `/api/theories/${theoryId}/scales`, body)

beforeAll(async () => {
  world = await buildWorld()
})

describe('scale ladder: save, read, version conflict', () => {
  it('an editor saves a new ladder; every member reads it with the computed estimates', async () => {
    const id = await newTheory({ ...DEMO_LIKE, name: 'Ladder theory' })
    const empty = await world.byRole.viewer.client.get(`/api/theories/${id}/scales`)
    expect(empty.status).toBe(200)
    expect(empty.body).toMatchObject({ ladder: null, version: 0, computed: null })
    const saved = await put('editor', id, { ladder: LADDER, version: 0 })
    expect(saved.status, JSON.stringify(saved.body)).toBe(200)
    expect(saved.body.version).toBe(1)
    const read = await world.byRole.viewer.client.get(`/api/theories/${id}/scales`)
    expect(read.body.version).toBe(1)
    expect(read.body.ladder).toEqual(LADDER)
    const c = read.body.computed
    // ħc = 197.3269804 MeV fm (CODATA 2018): a length of 1 fm is the energy 197.3269804 MeV.
    expect(c.scales.find((s: any) => s.name === 'R').valueMeV).toBeCloseTo(197.3269804, 7)
    expect(c.scales.map((s: any) => s.name)).toEqual(['M', 'E', 'R']) // highest energy first
    // ε = E/M = 10 GeV / 1 TeV = 1/100 exactly; order n is estimated as ε^n (common practice, naive dimensional analysis).
    expect(c.parameters[0]).toMatchObject({ name: 'eps', exact: '1/100' })
    expect(c.orders.map((o: any) => [o.order, o.exactEstimate, o.belowTarget])).toEqual([
      [0, '1', false],
      [1, '1/100', false],
      [2, '1/10000', true],
      [3, '1/1000000', true],
    ])
  })

  it('derived scales: the Rydberg energy ½ m_e α² is 13.605693122994 eV (CODATA 2018)', async () => {
    const id = await newTheory({ ...DEMO_LIKE, name: 'Hydrogen ladder' })
    const hydrogen = {
      scales: [{ name: 'me', value: '0.51099895000', unit: 'MeV' }],
      parameters: [{ name: 'alpha', numerator: '1', denominator: '137.035999084' }],
      derived: [{ name: 'Ry', from: 'me', factor: '1/2', powers: { alpha: 2 }, unit: 'eV' }],
      orders: [0, 1, 2],
    }
    const res = await put('editor', id, { ladder: hydrogen, version: 0 })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    const ry = res.body.computed.derived[0]
    expect(Math.abs(ry.value / 13.605693122994 - 1)).toBeLessThan(1e-9) // CODATA 2018 inputs are consistent to ~1e-10
    expect(ry.unit).toBe('eV')
    expect(ry.exactMeV).toMatch(/^\d+\/\d+$/) // exact, since every input was printed text
  })

  it('a stale version is refused with 409 naming the newer version, and nothing changes', async () => {
    const id = await newTheory({ ...DEMO_LIKE, name: 'Ladder conflict' })
    expect((await put('editor', id, { ladder: LADDER, version: 0 })).status).toBe(200)
    const twice = await put('owner', id, { ladder: LADDER, version: 0 })
    expect(twice.status).toBe(409)
    expect(messageOf(twice)).toContain('now version 1')
    const changed = { ...LADDER, precisionTarget: 1e-5 }
    expect((await put('editor', id, { ladder: changed, version: 1 })).status).toBe(200)
    const stale = await put('owner', id, { ladder: { ...LADDER, precisionTarget: 0.5 }, version: 1 })
    expect(stale.status).toBe(409)
    expect(messageOf(stale)).toMatch(/now version 2.*you edited version 1/)
    const read = await world.owner.client.get(`/api/theories/${id}/scales`)
    expect(read.body.ladder.precisionTarget).toBe(1e-5)
  })

  it('a ladder the engine cannot compute is a 422 naming the parameter, and nothing is written', async () => {
    const id = await newTheory({ ...DEMO_LIKE, name: 'Ladder bad' })
    const before = await rowCounts()
    const res = await put('editor', id, { ladder: { ...LADDER, parameters: [{ name: 'x', numerator: 'E', denominator: '2' }] }, version: 0 })
    expect(res.status).toBe(422)
    expect(messageOf(res)).toContain('Expansion parameter "x" mixes a scale with a plain number')
    const unknown = await put('editor', id, { ladder: { ...LADDER, scales: [{ name: 'E', value: '1', unit: 'parsec' }] }, version: 0 })
    expect(unknown.status).toBe(400)
    expect(messageOf(unknown)).toBe('Scale 1 "E", unit must be one of eV, keV, MeV, GeV, TeV, fm, pm, nm, m')
    expect(await rowCounts()).toEqual(before)
  })
})

describe('integrate out: towers', () => {
  it('removes the Dirac fermion at its threshold: child without eL, eR, parent link, threshold tag on the U(1) kinetic term', async () => {
    const parentId = await newTheory(DEMO_LIKE)
    const res = await world.byRole.editor.client.post(`/api/theories/${parentId}/integrate-out`, { fields: ['eL', 'eR'], scale: { name: 'me', value: 0.51099895, unit: 'MeV' } })
    expect(res.status, JSON.stringify(res.body)).toBe(201)
    const child = res.body.theory
    expect(child.parentId).toBe(parentId)
    expect(child.groupId).toBe(world.groupId)
    expect(child.definition.fields.map((f: any) => f.name)).toEqual(['S', 'A'])
    expect(child.threshold).toMatchObject({ name: 'me', scale: 0.51099895, unit: 'MeV', removedFields: ['eL', 'eR'] })
    expect(res.body.generatedClasses.some((g: any) => g.loop === 'one-loop' && /Euler–Heisenberg/.test(g.description))).toBe(true)
    const rows = await testDb()('threshold_tags').where({ theory_id: child.id }).orderBy('field')
    expect(rows.map((r) => [r.term, r.field])).toEqual([
      ['kinetic term of QED', 'eL'],
      ['kinetic term of QED', 'eR'],
    ])
    // Each Weyl fermion of charge Q adds (2/3) Q² to b in μ de/dμ = b e³/16π² (Machacek & Vaughn, Nucl. Phys. B 222 (1983) 83);
    // a Dirac electron gives 4/3, i.e. β(e) = e³/12π² (Peskin & Schroeder 1995, §12.2).
    expect(rows.map((r) => r.details.betaShift)).toEqual(['2/3', '2/3'])

    const tower = await world.byRole.viewer.client.get(`/api/theories/${child.id}/tower`)
    expect(tower.status).toBe(200)
    expect(tower.body.nodes.map((n: any) => [n.id, n.depth])).toEqual([
      [parentId, 0],
      [child.id, 1],
    ])
    const node = tower.body.nodes[1]
    expect(node.thresholdTags).toHaveLength(2)
    // Euler–Heisenberg: (2α²/45m⁴)[(E²−B²)² + 7(E·B)²] (Heisenberg & Euler, Z. Phys. 98 (1936) 714).
    const eh = node.matching.find((m: any) => m.id === 'euler-heisenberg')
    expect(eh.source).toContain('Z. Phys. 98 (1936) 714')
    expect(eh.forms[0].terms.map((t: any) => t.coefficient)).toEqual(['2/45 α^2 Q^4 / m^4', '14/45 α^2 Q^4 / m^4'])
    expect(node.matching.map((m: any) => m.id)).toContain('uehling')
    expect(tower.body.nodes[0].matching).toEqual([])
  })

  it('a neutral scalar shifts no kinetic term and brings no matching result', async () => {
    const parentId = await newTheory({ ...DEMO_LIKE, name: 'Scalar only removed' })
    const res = await world.owner.client.post(`/api/theories/${parentId}/integrate-out`, { fields: ['S'], scale: { value: 2, unit: 'TeV' } })
    expect(res.status).toBe(201)
    expect(res.body.thresholdTags).toEqual([])
    const tower = await world.owner.client.get(`/api/theories/${res.body.theory.id}/tower`)
    expect(tower.body.nodes[1].matching).toEqual([])
  })

  it('half of a Dirac pair is a 422 giving the reason and the partner; the scales read offers the partners; nothing is written', async () => {
    const parentId = await newTheory({ ...DEMO_LIKE, name: 'Half a Dirac pair' })
    const before = await rowCounts()
    const half = await world.owner.client.post(`/api/theories/${parentId}/integrate-out`, { fields: ['eL'], scale: { value: 1, unit: 'TeV' } })
    expect(half.status).toBe(422)
    expect(messageOf(half)).toContain('eL cannot be integrated out without a partner')
    expect(messageOf(half)).toContain('Integrate out eL, eR together.')
    expect(await rowCounts()).toEqual(before)
    const scales = await world.byRole.viewer.client.get(`/api/theories/${parentId}/scales`)
    expect(scales.body.massPartners).toEqual({ eL: ['eR'], eR: ['eL'] })
  })

  it('unknown fields are a 422 naming them; a repeated step is a 409; nothing is written', async () => {
    const parentId = await newTheory({ ...DEMO_LIKE, name: 'Twice removed' })
    const before = await rowCounts()
    const bad = await world.owner.client.post(`/api/theories/${parentId}/integrate-out`, { fields: ['chi'], scale: { value: 1, unit: 'TeV' } })
    expect(bad.status).toBe(422)
    expect(messageOf(bad)).toContain('has no field "chi"')
    const strength = await world.owner.client.post(`/api/theories/${parentId}/integrate-out`, { fields: ['A'], scale: { value: 1, unit: 'TeV' } })
    expect(strength.status).toBe(422)
    expect(messageOf(strength)).toContain('gauge field strength')
    expect(await rowCounts()).toEqual(before)
    expect((await world.owner.client.post(`/api/theories/${parentId}/integrate-out`, { fields: ['S'], scale: { value: 1, unit: 'TeV' } })).status).toBe(201)
    const again = await world.owner.client.post(`/api/theories/${parentId}/integrate-out`, { fields: ['S'], scale: { value: 1, unit: 'TeV' } })
    expect(again.status).toBe(409)
    expect(messageOf(again)).toContain('already has a theory named')
  })
})

describe('set aside the orders below the precision target', () => {
  it('moves exactly the kept operators of the orders whose estimate is below the target, in one step', async () => {
    const theoryId = await newTheory({
      name: 'Board for targets',
      frame: 'relativistic',
      groups: [{ name: 'U', type: 'U1', gauge: true }],
      fields: [
        { name: 'phi', lorentz: 'scalar', charges: { U: '1' } },
        { name: 'A', lorentz: 'field-strength', gaugeOf: 'U' },
      ],
    })
    const { basisId } = await addBasis({ ...world, theoryId }) // order 2: the engine's kept operators and alternatives
    const db = testDb()
    const extra = [1, 1, 3].map((order, i) => ({
      basis_id: basisId,
      order,
      class_key: `X${order}`,
      column: 'kept',
      position: i,
      text: `O${order}_${i}`,
      latex: 'O',
      structure: '{}',
      hermitian: true,
      real_parameters: 1,
    }))
    await db('operators').insert(extra)
    const basisBefore = await db('bases').where({ id: basisId }).first('version')
    const before2 = await db('operators').where({ basis_id: basisId, order: 2 }).orderBy(['column', 'position'])
    const aside2 = before2.filter((o) => o.column === 'set_aside').sort((a, b) => a.position - b.position)
    const kept2 = before2.filter((o) => o.column === 'kept').sort((a, b) => a.position - b.position)
    const noLadder = await world.byRole.editor.client.post(`/api/bases/${basisId}/set-aside-below`, { target: 1e-3 })
    expect(noLadder.status).toBe(409)
    expect(messageOf(noLadder)).toContain('no scale ladder')
    expect((await put('editor', theoryId, { ladder: LADDER, version: 0 })).status).toBe(200)

    // ε = 1/100: order 1 ≈ 1e-2 stays, orders 2 (1e-4) and 3 (1e-6) are below 1e-3 (common practice, ε^n estimates).
    const res = await world.byRole.editor.client.post(`/api/bases/${basisId}/set-aside-below`, { target: 1e-3 })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    expect(res.body.orders).toEqual([2, 3])
    expect(res.body.count).toBe(kept2.length + 1)
    const ops = await db('operators').where({ basis_id: basisId }).orderBy(['order', 'column', 'position'])
    const byOrder = (o: number) => ops.filter((x) => x.order === o).map((x) => [x.text, x.column, x.position, x.version])
    expect(byOrder(1)).toEqual([
      ['O1_0', 'kept', 0, 1],
      ['O1_1', 'kept', 1, 1],
    ])
    // Already set aside: unchanged, first; then the formerly kept ones in their order, versions bumped.
    expect(byOrder(2)).toEqual([...aside2.map((o, i) => [o.text, 'set_aside', i, o.version]), ...kept2.map((o, i) => [o.text, 'set_aside', aside2.length + i, o.version + 1])])
    expect(byOrder(3)).toEqual([['O3_2', 'set_aside', 0, 2]])
    expect((await db('bases').where({ id: basisId }).first('version')).version).toBeGreaterThan(basisBefore.version)
    const board = await world.byRole.viewer.client.get(`/api/bases/${basisId}`)
    expect(board.body.coverage['phi^3 phi*^3']).toEqual({ rank: 0, required: 1, complete: false })

    const again = await world.byRole.editor.client.post(`/api/bases/${basisId}/set-aside-below`, { target: 1e-3 })
    expect(again.body.count).toBe(0)
    const viewer = await world.byRole.viewer.client.post(`/api/bases/${basisId}/set-aside-below`, { target: 0.5 })
    expect(viewer.status).toBe(403)
  })
})

describe('running couplings', () => {
  const BC = [
    { name: 'c', mass: 1.273, kind: 'msbar' },
    { name: 'b', mass: 4.183, kind: 'msbar' },
    { name: 't', mass: 172.57, kind: 'pole' },
  ]

  it('α_s(m_τ) from α_s(M_Z) = 0.1180 lies within the τ-decay value 0.314 ± 0.014 (PDG 2024 QCD review; from memory, as the engine tests cite)', async () => {
    // Inputs: α_s(M_Z) = 0.1180, M_Z = 91.188 GeV, m_c(m_c) = 1.273, m_b(m_b) = 4.183 GeV (PDG 2024); m_τ = 1.77693 GeV (PDG 2024).
    const res = await world.stranger.client.post('/api/running/qcd', { alphaS: 0.118, muFrom: 91.188, muTo: 1.77693, loops: 4, thresholds: BC })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    expect(res.body.result.nfTo).toBe(4)
    expect(Math.abs(res.body.result.alphaS - 0.314)).toBeLessThanOrEqual(0.014)
    expect(res.body.caution).toBe('estimates and leading-order formulas; check against the literature for precision work')
    expect(res.body.result.computed.length).toBeGreaterThan(0)
    expect(res.body.curve.length).toBeGreaterThan(50)
    const mus = res.body.curve.map((p: any) => p.mu)
    // The plotted curve runs upward in μ (the engine's trace may repeat a threshold mass up to rounding, 1 ulp).
    for (let i = 1; i < mus.length; i++) expect(mus[i], `point ${i}`).toBeGreaterThanOrEqual(mus[i - 1] * (1 - 1e-12))
    expect(res.body.crossings.map((c: any) => c.name).sort()).toEqual(['b', 'c', 't'])
  })

  it('α(M_Z)^-1 ≈ 128.9 on shell with Δα_had^(5) = 0.02766 as input (PDG electroweak review; from memory)', async () => {
    const res = await world.stranger.client.post('/api/running/qed', { muTo: 91.188, deltaAlphaHad5: 0.02766 })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    expect(Math.abs(res.body.atZ.onShell.alphaInverse - 128.9)).toBeLessThanOrEqual(0.06)
    expect(res.body.atZ.inputs.deltaAlphaHad5.value).toBe(0.02766)
    // Leading logs of e, μ, τ alone: α⁻¹(M_Z) ≈ 132.2 (Peskin & Schroeder 1995, §7.5 formula; engine test value).
    expect(Math.abs(res.body.run.alphaInverse - 132.2)).toBeLessThan(0.05)
    expect(res.body.fermions.map((f: any) => f.name)).toEqual(['e', 'mu', 'tau'])
  })

  it('bad inputs: 400 naming the field; a Landau pole is a 422 with the engine message', async () => {
    const big = await world.stranger.client.post('/api/running/qcd', { alphaS: 0.118, muFrom: 91.188, muTo: 1e9, loops: 4, thresholds: BC })
    expect(big.status).toBe(400)
    expect(messageOf(big)).toBe('Wanted scale μ must be at most 100000 GeV')
    const loops = await world.stranger.client.post('/api/running/qcd', { alphaS: 0.118, muFrom: 91.188, muTo: 2, loops: 5, thresholds: BC })
    expect(loops.status).toBe(400)
    expect(messageOf(loops)).toBe('Loops in β must be 1, 2, 3 or 4')
    const pole = await world.stranger.client.post('/api/running/qcd', { alphaS: 0.5, muFrom: 2, muTo: 0.5, loops: 1, thresholds: [], lightFlavours: 3 })
    expect(pole.status).toBe(422)
    expect(messageOf(pole)).toMatch(
      /^α_s grows beyond the perturbative range below μ = [\d.]+ GeV \(running from μ = 2 GeV to 0\.5 GeV with 3 active flavours, towards the Landau pole\); choose a higher scale, or a smaller α_s$/,
    )
    expect((await world.anonymous.post('/api/running/qed', { muTo: 91.188 })).status).toBe(401)
    expect((await world.anonymous.get('/api/running/defaults')).status).toBe(401)
  })
})
