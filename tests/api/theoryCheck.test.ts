import { describe, it, expect, beforeAll } from 'vitest'
import { ApiClient, signedUpClient, messageOf } from '../support/client'
import { rowCounts } from '../support/db'
import smeft from '../../shared/presets/smeft.json'

// POST /api/theory-check: the editor's live validation and gauge-anomaly check.
let client: ApiClient
const clone = () => JSON.parse(JSON.stringify(smeft))

beforeAll(async () => {
  client = (await signedUpClient('checker')).client
})

describe('POST /api/theory-check', () => {
  // The Standard Model's fermions cancel every gauge anomaly, generation by generation:
  // Bouchiat, Iliopoulos, Meyer, Phys. Lett. B 38 (1972) 519; Georgi & Glashow, Phys. Rev. D 6 (1972) 429.
  it('the SMEFT preset is anomaly free', async () => {
    const res = await client.post('/api/theory-check', { theory: smeft })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    expect(res.body).toMatchObject({ ok: true, issues: '', anomalies: [] })
    // colour^3, colour^2 hypercharge, weak^2 hypercharge, weak Witten, hypercharge^3, gravity^2 hypercharge
    expect(res.body.checked).toBe(6)
  })

  // Without the right-handed electron (Y = -1, three generations) the hypercharge sums lose its
  // left-handed conjugate (Y = +1): Y^3 = -3·1^3 = -3 and gravity^2 Y = -3·1 = -3; the SU(N)^2 Y
  // conditions do not involve the colour and weak singlet e. Same sources as above.
  it('the preset minus the field "e" lists the failing anomalies with exact sums', async () => {
    const theory = clone()
    theory.fields = theory.fields.filter((f: { name: string }) => f.name !== 'e')
    const res = await client.post('/api/theory-check', { theory })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
    expect(res.body.ok).toBe(false)
    expect(res.body.anomalies).toEqual([
      { name: 'hypercharge^3', sum: '-3', ok: false },
      { name: 'gravity^2 hypercharge', sum: '-3', ok: false },
    ])
    expect(res.body.issues).toBe('hypercharge^3: sum -3 (must vanish)\ngravity^2 hypercharge: sum -3 (must vanish)')
  })

  // One extra SU(2) doublet of left-handed fermions makes the number of doublets odd (12 + 1):
  // Witten, Phys. Lett. B 117 (1982) 324. A colour- and hypercharge-neutral doublet touches no other condition.
  it('an odd number of SU(2) doublets fails the Witten condition', async () => {
    const theory = clone()
    theory.fields.push({ name: 'N', lorentz: 'left-weyl', reps: { weak: [1] } })
    const res = await client.post('/api/theory-check', { theory })
    expect(res.body.anomalies).toEqual([{ name: 'weak Witten', sum: '13', ok: false }])
    expect(res.body.issues).toBe('weak Witten: 13 is odd (must be even)')
  })

  it('a malformed theory is refused with 400 naming the field and the key at fault, and writes nothing', async () => {
    const theory = clone()
    theory.fields[5].charges.hypercharge = '1/2x'
    const before = await rowCounts()
    const res = await client.post('/api/theory-check', { theory })
    expect(res.status).toBe(400)
    expect(messageOf(res)).toBe('Field 6 "H", charge under hypercharge: a charge is a rational written "p/q" or an integer, e.g. "1/6"')
    expect(await rowCounts()).toEqual(before)
  })

  it('a theory that breaks a cross-field rule is refused with the schema message', async () => {
    const theory = clone()
    theory.fields.push({ name: 'Z', lorentz: 'field-strength', gaugeOf: 'hypercharge' })
    const res = await client.post('/api/theory-check', { theory })
    expect(res.status).toBe(400)
    expect(messageOf(res)).toBe('Field 10 "Z", gauge group of the field strength: hypercharge already has a field strength')
  })

  it('a missing theory is refused with 400 naming it', async () => {
    const res = await client.post('/api/theory-check', {})
    expect(res.status).toBe(400)
    expect(messageOf(res)).toBe('Theory is required: a theory file (a JSON object)')
  })

  it('needs an account', async () => {
    const res = await new ApiClient().post('/api/theory-check', { theory: smeft })
    expect(res.status).toBe(401)
    expect(messageOf(res)).toBe('Sign in to continue')
  })
})

// Couplings name kept order-0 operators (shared/schemas/couplings.ts); the check resolves them
// against the order-0 basis and refuses one the basis does not have, naming it.
describe('POST /api/theory-check with couplings', () => {
  const toy = {
    name: 'singlet',
    frame: 'relativistic',
    groups: [],
    fields: [
      { name: 'H', lorentz: 'scalar' },
      { name: 'S', lorentz: 'scalar', real: true, mass: { symbol: 'M' } },
    ],
    couplings: [{ class: 'S H H*', symbol: 'kappa' }],
  }

  it('couplings on kept operators pass', async () => {
    const res = await client.post('/api/theory-check', { theory: toy })
    expect(res.status, JSON.stringify(res.body)).toBe(200)
  })

  it('a coupling on an operator the basis does not have is refused with 422 naming it, and writes nothing', async () => {
    const before = await rowCounts()
    const res = await client.post('/api/theory-check', { theory: { ...toy, couplings: [{ class: 'H H*', operator: 'mass S S', symbol: 'm2' }] } })
    expect(res.status).toBe(422)
    expect(messageOf(res)).toBe('Coupling "m2": "mass S S" is not an operator of this class; the class "H H*" keeps mass H H*')
    expect(await rowCounts()).toEqual(before)
  })
})
