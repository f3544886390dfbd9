import { describe, it, expect } from 'vitest'
import { theoryToDraft, draftToTheory, issueKey, newField, newCoupling } from '../../../composables/theoryDraftModel'
import { newHeavy } from '../../../composables/theoryDraft/heavyBlock'
import { newGoldstone } from '../../../composables/theoryDraft/goldstoneBlock'
import { TheorySchema } from '../../../shared/schemas/theory'
import { PRESETS } from '../../../shared/presets/index'
import { checkAnomalies } from '../../../server/engine/theory/anomalies'

// The editor's form model must give back exactly the theory file it was loaded from, so that
// downloading an unchanged theory returns the saved file (common practice: lossless round trip).
describe('theory draft round trip', () => {
  for (const preset of PRESETS) {
    it(`preset ${preset.id}: file → draft → file is the same file`, () => {
      const { theory, issues } = draftToTheory(theoryToDraft(preset.theory))
      expect(issues).toEqual([])
      expect(theory).toEqual(JSON.parse(JSON.stringify(preset.theory)))
      expect(TheorySchema.safeParse(theory).success).toBe(true)
    })
  }

  it('renaming a group keeps the labels and charges of the roster on it', () => {
    const d = theoryToDraft(PRESETS.find((p) => p.id === 'smeft')!.theory)
    d.groups[2]!.name = 'Hyper'
    const { theory } = draftToTheory(d)
    const fields = theory.fields as Array<{ name: string; charges?: Record<string, string>; gaugeOf?: string }>
    expect(fields.find((f) => f.name === 'Q')!.charges).toEqual({ Hyper: '1/6' })
    expect(fields.find((f) => f.name === 'B')!.gaugeOf).toBe('Hyper')
  })

  it('removing a group drops its column from every field', () => {
    const d = theoryToDraft(PRESETS.find((p) => p.id === 'smeft')!.theory)
    d.groups.splice(0, 1) // colour
    const { theory } = draftToTheory(d)
    const q = (theory.fields as Array<{ name: string; reps?: Record<string, number[]> }>).find((f) => f.name === 'Q')!
    expect(q.reps).toEqual({ weak: [1] })
  })
})

describe('the new group kinds in the editor', () => {
  it('SO(n), Sp(n), E6 and finite groups: Dynkin labels and irrep names survive file → draft → file; n only where the kind takes one', () => {
    const file = {
      name: 'kinds',
      frame: 'relativistic',
      groups: [
        { name: 'G', type: 'SO', n: 10, gauge: true },
        { name: 'S', type: 'Sp', n: 4, gauge: false },
        { name: 'E', type: 'E6', gauge: false },
        { name: 'F', type: 'A4', gauge: false },
        { name: 'T', type: 'Tprime', gauge: false },
      ],
      fields: [
        { name: 'psi', lorentz: 'left-weyl', reps: { G: [0, 0, 0, 0, 1], F: '3', T: "2''" }, flavors: 3 },
        { name: 'h', lorentz: 'scalar', reps: { S: [1, 0], E: [1, 0, 0, 0, 0, 0], F: "1'" } },
        { name: 'X', lorentz: 'field-strength', gaugeOf: 'G' },
      ],
    }
    const d = theoryToDraft(file)
    expect(d.fields[0]!.reps[d.groups[3]!.uid]).toBe('3')
    const { theory, issues } = draftToTheory(d)
    expect(issues).toEqual([])
    expect(theory).toEqual(file)
    expect(TheorySchema.safeParse(theory).success).toBe(true)
    d.groups[2]!.n = '6'
    expect(draftToTheory(d).theory.groups).toEqual(file.groups) // E6 takes no n: the typed n is not written
  })
})

describe('typed text that is not a number', () => {
  it('bad Dynkin labels and flavors are reported at their input and left out of the file', () => {
    const d = theoryToDraft(PRESETS.find((p) => p.id === 'smeft')!.theory)
    d.fields[0]!.reps[d.groups[0]!.uid] = '1,x'
    d.fields[1]!.flavors = 'three'
    d.maxOrder = '8.5'
    const { theory, issues } = draftToTheory(d)
    expect(issues.map((i) => issueKey(i.path))).toEqual(['maxOrder', 'fields.0.reps.colour', 'fields.1.flavors'])
    expect(issues[1]!.message).toBe('Dynkin labels are whole numbers separated by commas, e.g. "1,0", but got "1,x"')
    expect(issues[2]!.message).toBe('must be a whole number from 1 to 6, not "three"')
    expect((theory.fields as Array<{ reps?: unknown }>)[0]!.reps).toEqual({ weak: [1] })
  })

  it('a bad charge reaches the schema, whose message is keyed to that input', () => {
    const d = theoryToDraft(PRESETS.find((p) => p.id === 'smeft')!.theory)
    d.fields[5]!.charges[d.groups[2]!.uid] = '1/2x'
    const r = TheorySchema.safeParse(draftToTheory(d).theory)
    expect(r.success).toBe(false)
    expect(r.error!.issues.map((i) => issueKey(i.path))).toEqual(['fields.5.charges.hypercharge'])
    expect(r.error!.issues[0]!.message).toBe('a charge is a rational written "p/q" or an integer, e.g. "1/6"')
  })

  it('a field strength without a gauge group is named by the schema', () => {
    const d = theoryToDraft({ name: 'x', frame: 'relativistic', groups: [], fields: [] })
    const f = newField()
    f.name = 'A'
    f.lorentz = 'field-strength'
    d.fields.push(f)
    const r = TheorySchema.safeParse(draftToTheory(d).theory)
    expect(r.error!.issues.map((i) => [issueKey(i.path), i.message])).toEqual([['fields.0.gaugeOf', 'is required: choose the gauge group whose field strength this is']])
  })

  it('a file that is not an object is refused with a message', () => {
    expect(() => theoryToDraft([1, 2])).toThrow('a theory file is a JSON object')
  })
})

describe('what the editor sends to the anomaly check', () => {
  // Hypercharge anomalies of one SM generation cancel: Bouchiat, Iliopoulos, Meyer,
  // Phys. Lett. B 38 (1972) 519. Without e (Y = -1, three flavors) the Y^3 and
  // gravity^2 Y sums are 3·(-(+1)^3) = -3 and 3·(-(+1)) = -3 (left-handed conjugate of e has Y = +1).
  it('the SMEFT roster from the editor cancels; without e it fails Y^3 and gravity^2 Y by -3', () => {
    const d = theoryToDraft(PRESETS.find((p) => p.id === 'smeft')!.theory)
    expect(checkAnomalies(TheorySchema.parse(draftToTheory(d).theory))).toEqual([])
    d.fields.splice(4, 1)
    expect(checkAnomalies(TheorySchema.parse(draftToTheory(d).theory))).toEqual([
      { name: 'hypercharge^3', sum: '-3', ok: false },
      { name: 'gravity^2 hypercharge', sum: '-3', ok: false },
    ])
  })
})

describe('the heavy particle in the form', () => {
  const vexonium = () => theoryToDraft(PRESETS.find((p) => p.id === 'heavy-vexonium')!.theory)

  it('renaming the gauge group keeps the coupling and the charge on it', () => {
    const d = vexonium()
    d.groups[0]!.name = 'Dark'
    const { theory, issues } = draftToTheory(d)
    expect(issues).toEqual([])
    expect(theory.heavy).toMatchObject({ gaugeGroup: 'Dark', particle: { name: 'psi', charges: { Dark: '1' } } })
    expect(TheorySchema.safeParse(theory).success).toBe(true)
  })

  it('an empty antiparticle leaves it out; a relativistic frame leaves the block out', () => {
    const d = vexonium()
    d.heavy!.antiparticle = ' '
    expect(draftToTheory(d).theory.heavy).not.toHaveProperty('antiparticle')
    d.frame = 'relativistic'
    expect(draftToTheory(d).theory).not.toHaveProperty('heavy')
    d.frame = 'heavy' // switching back restores what was typed
    expect(draftToTheory(d).theory.heavy).toMatchObject({ particle: { name: 'psi' }, maxOrder: 3 })
  })

  it('a new block couples "psi" to the first gauge group; typing errors are keyed to their inputs', () => {
    const d = theoryToDraft({
      name: 'h',
      frame: 'heavy',
      groups: [
        { name: 'G', type: 'U1', gauge: false },
        { name: 'C', type: 'SU', n: 3, gauge: true },
      ],
      fields: [],
    })
    d.heavy = newHeavy(d.groups)
    expect(draftToTheory(d).theory.heavy).toEqual({ particle: { name: 'psi' }, gaugeGroup: 'C', maxOrder: 2 })
    d.heavy.reps[d.groups[1]!.uid] = '1,x'
    d.heavy.maxOrder = ''
    d.heavy.gaugeGroup = ''
    const { issues } = draftToTheory(d)
    expect(issues.map((i) => [issueKey(i.path), i.message])).toEqual([
      ['heavy.particle.reps.C', 'Dynkin labels are whole numbers separated by commas, e.g. "1,0", but got "1,x"'],
      ['heavy.gaugeGroup', 'choose the gauge group the heavy particle couples to'],
      ['heavy.maxOrder', 'choose the highest power of 1/m (1 to 4)'],
    ])
  })

  it('the P and T switches survive the form: written only when switched off (common practice: schema round trip)', () => {
    const d = theoryToDraft({
      ...PRESETS.find((p) => p.id === 'heavy-vexonium')!.theory,
      heavy: { particle: { name: 'psi', charges: { Xd: '1' } }, gaugeGroup: 'Xd', maxOrder: 2, imposeParity: false },
    })
    expect([d.heavy!.parity, d.heavy!.timeReversal]).toEqual([false, true])
    expect(draftToTheory(d).theory.heavy).toMatchObject({ imposeParity: false })
    expect(draftToTheory(d).theory.heavy).not.toHaveProperty('imposeTimeReversal')
    d.heavy!.parity = true
    expect(draftToTheory(d).theory.heavy).not.toHaveProperty('imposeParity')
  })

  it('a schema problem of the block is keyed to its input', () => {
    const d = vexonium()
    d.heavy!.particle = 'Ad' // the dark photon's name
    const r = TheorySchema.safeParse(draftToTheory(d).theory)
    expect(r.error!.issues.map((i) => [issueKey(i.path), i.message])).toEqual([['heavy.particle.name', 'is already the name of a field of the roster; choose another name than "Ad"']])
  })
})

describe('the Goldstone block in the form (common practice: lossless form model)', () => {
  const umbral = () => theoryToDraft(PRESETS.find((p) => p.id === 'umbral-pions')!.theory)

  it('a relativistic frame leaves the block out; a new block is three flavors with all sources to p⁴', () => {
    const d = umbral()
    d.frame = 'relativistic'
    expect(draftToTheory(d).theory.goldstone).toBeUndefined()
    d.frame = 'goldstone'
    d.goldstone = newGoldstone()
    expect(draftToTheory(d).theory.goldstone).toEqual({ coset: 'chiral', N: 3, sources: { scalar: true, vector: true }, maxOrder: 4 })
  })

  it("typing errors are keyed to their inputs; the schema's range checks too", () => {
    const d = umbral()
    d.goldstone!.N = 'three'
    d.goldstone!.maxOrder = ''
    expect(draftToTheory(d).issues.map((i) => [issueKey(i.path), i.message])).toEqual([
      ['goldstone.N', 'N is a whole number or "general", but got "three"'],
      ['goldstone.maxOrder', 'choose the highest chiral order (an even power of p, 2 to 14)'],
    ])
    d.goldstone!.N = '1'
    d.goldstone!.maxOrder = '6'
    const r = TheorySchema.safeParse(draftToTheory(d).theory)
    expect(r.error!.issues.map((i) => [issueKey(i.path), i.message])).toEqual([['goldstone.N', 'Goldstone frame: N must be from 2 to 12 (or "general") for the chiral coset, but N = 1']])
  })
})

// Couplings and mass symbols (shared/schemas/couplings.ts) pass through the form unchanged
// (common practice: lossless round trip of the file); an empty mass row writes nothing.
describe('couplings and masses in the draft', () => {
  const file = {
    name: 'singlet',
    frame: 'relativistic',
    groups: [],
    fields: [
      { name: 'H', lorentz: 'scalar' },
      { name: 'S', lorentz: 'scalar', real: true, mass: { symbol: 'M', value: { number: '2', unit: 'TeV' } } },
    ],
    couplings: [
      { class: 'S H H*', symbol: 'kappa', value: { number: '1.5', unit: 'TeV' } },
      { class: 'H H*', operator: 'mass H H*', symbol: 'm2', description: 'the light mass term' },
    ],
  }

  it('file → draft → file is the same file, and the schema accepts it', () => {
    const { theory, issues } = draftToTheory(theoryToDraft(file))
    expect(issues).toEqual([])
    expect(theory).toEqual(file)
    expect(TheorySchema.safeParse(theory).success).toBe(true)
  })

  it('a new coupling row and an emptied mass leave no trace; a bad value is keyed to its coupling', () => {
    const draft = theoryToDraft(file)
    draft.fields[1]!.mass = { symbol: '', number: '', unit: '' }
    draft.couplings.push({ ...newCoupling(), class: 'H^2 H*^2', symbol: 'lambda', number: 'one' })
    const { theory } = draftToTheory(draft)
    expect((theory.fields as { mass?: unknown }[])[1]!.mass).toBeUndefined()
    const r = TheorySchema.safeParse(theory)
    expect(r.success).toBe(false)
    expect(r.error!.issues.map((i) => issueKey(i.path))).toEqual(['couplings.2.value'])
  })
})
