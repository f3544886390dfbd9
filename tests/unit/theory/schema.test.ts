import { readdirSync, readFileSync } from 'node:fs'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { PRESETS } from '../../../shared/presets/index'
import { TheorySchema } from '../../../shared/schemas/theory'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { EngineInputError } from '../../../server/engine/errors'

const base = () => ({
  name: 'example',
  frame: 'relativistic' as const,
  groups: [
    { name: 'colour', type: 'SU', n: 3, gauge: true },
    { name: 'weak', type: 'SU', n: 2, gauge: true },
    { name: 'Y', type: 'U1', gauge: true },
    { name: 'Bno', type: 'U1', gauge: false },
    { name: 'P2', type: 'Z', n: 2, gauge: false },
  ],
  fields: [
    { name: 'Q', lorentz: 'left-weyl', reps: { colour: [1, 0], weak: [1] }, charges: { Y: '1/6' }, flavors: 3 },
    { name: 'H', lorentz: 'scalar', reps: { weak: [1] }, charges: { Y: '1/2' } },
    { name: 'phi', lorentz: 'scalar', real: true } as Record<string, unknown>,
    { name: 'G', lorentz: 'field-strength', gaugeOf: 'colour' },
  ] as Record<string, unknown>[],
})

const errorOf = (input: unknown): string => {
  try {
    parseTheory(input)
  } catch (e) {
    expect(e).toBeInstanceOf(EngineInputError)
    return (e as Error).message
  }
  throw new Error('expected a validation error')
}

describe('theory schema', () => {
  it('accepts the example theory of the file format (with maxOrder, description, countingRules)', () => {
    const t = parseTheory({ ...base(), maxOrder: 8, description: 'test', countingRules: [{ name: 'EFT', kind: 'massRatio' }] })
    expect(t.fields.map((f) => f.name)).toEqual(['Q', 'H', 'phi', 'G'])
    expect(parseTheory(JSON.stringify(base())).groups).toHaveLength(5)
  })

  it('every shipped preset is valid and listed with a title and description', () => {
    const dir = join(__dirname, '../../../shared/presets')
    const files = readdirSync(dir).filter((f) => f.endsWith('.json'))
    expect(files.length).toBeGreaterThanOrEqual(6)
    for (const f of files) expect(TheorySchema.safeParse(JSON.parse(readFileSync(join(dir, f), 'utf8'))).success).toBe(true)
    for (const p of PRESETS) {
      expect(p.title.length).toBeGreaterThan(0)
      expect(p.description.length).toBeGreaterThan(0)
      expect(() => parseTheory(p.theory)).not.toThrow()
    }
    expect(PRESETS.map((p) => p.id).slice(0, 6)).toEqual(['smeft', 'real-scalar', 'photons', 'qed', 'scalar-qed', 'qcd-like'])
    expect(files.length).toBe(PRESETS.length) // every preset file is listed
  })

  it('names the field and key at fault', () => {
    const t = base()
    t.fields[2] = { name: 'phi', lorentz: 'scalar', real: true, charges: { Y: '1/3' } }
    expect(errorOf(t)).toBe('Field 3 "phi", charge under Y: a real scalar must have zero U(1) charges, but this one is 1/3')
    t.fields[2] = { name: 'phi', lorentz: 'scalar', real: true, reps: { weak: [1] } }
    // the doublet of SU(2) is pseudoreal (Slansky, Phys. Rep. 79 (1981) 1, Table 11)
    expect(errorOf(t)).toBe('Field 3 "phi", representation under weak: a real scalar must sit in a real representation, but [1] is pseudoreal')
    t.fields[2] = { name: 'phi', lorentz: 'scalar', real: true, reps: { colour: [1, 0] } }
    expect(errorOf(t)).toBe('Field 3 "phi", representation under colour: a real scalar must sit in a real representation, but [1,0] is complex')
  })

  it('a real scalar needs the PRODUCT of the reality indicators to be +1 (Slansky, Phys. Rep. 79 (1981) 1, §4: indicators multiply on tensor products)', () => {
    const custodial = {
      name: 'custodial',
      frame: 'relativistic',
      groups: [
        { name: 'SU2L', type: 'SU', n: 2, gauge: true },
        { name: 'SU2R', type: 'SU', n: 2, gauge: false },
        { name: 'SU3c', type: 'SU', n: 3, gauge: true },
      ],
      fields: [{ name: 'Phi', lorentz: 'scalar', real: true, reps: { SU2L: [1], SU2R: [1] } } as Record<string, unknown>],
    }
    // (2,2): pseudoreal × pseudoreal = real, the custodial-symmetric Higgs bidoublet
    expect(parseTheory(custodial).fields[0]!.real).toBe(true)
    // (2,3): pseudoreal × real = pseudoreal
    custodial.fields[0] = { name: 'Phi', lorentz: 'scalar', real: true, reps: { SU2L: [1], SU2R: [2] } }
    expect(errorOf(custodial)).toBe('Field 1 "Phi", representation under SU2L: a real scalar must sit in a real representation, but [1] is pseudoreal')
    // (2,2,8): still real; (2,2,3): complex
    custodial.fields[0] = { name: 'Phi', lorentz: 'scalar', real: true, reps: { SU2L: [1], SU2R: [1], SU3c: [1, 1] } }
    expect(() => parseTheory(custodial)).not.toThrow()
    custodial.fields[0] = { name: 'Phi', lorentz: 'scalar', real: true, reps: { SU2L: [1], SU2R: [1], SU3c: [1, 0] } }
    expect(errorOf(custodial)).toContain('but [1,0] is complex')
  })

  it('rejects bad references and shapes', () => {
    const cases: [(t: ReturnType<typeof base>) => void, string][] = [
      [(t) => (t.fields[0]!.reps = { SU5: [1, 0, 0, 0] }), 'Field 1 "Q", representation under SU5: the theory has no symmetry named "SU5"; declare it, or remove this entry'],
      [(t) => (t.fields[0]!.reps = { colour: [1] }), 'Field 1 "Q", representation under colour: SU(3) takes 2 Dynkin labels, but [1] has 1'],
      [(t) => (t.fields[0]!.charges = { P2: '1/2' }), 'Field 1 "Q", charge under P2: a Z_2 charge is a whole number (counted mod 2), but got 1/2'],
      [(t) => (t.fields[0]!.charges = { weak: '1' }), 'Field 1 "Q", charge under weak: weak is SU(2), which takes Dynkin labels, not a charge'],
      [(t) => (t.fields[3]!.gaugeOf = 'Bno'), 'Field 4 "G", gauge group of the field strength: Bno is a global symmetry (not gauged) and has no field strength'],
      [(t) => delete t.fields[3]!.gaugeOf, 'Field 4 "G", gauge group of the field strength is required: choose the gauge group whose field strength this is'],
      [(t) => (t.fields[1]!.gaugeOf = 'Y'), 'Field 2 "H", gauge group of the field strength: only a field strength belongs to a gauge group'],
      [(t) => (t.fields[1]!.name = 'Q'), 'Field 2 "Q", name is already the name of another field'],
      [(t) => (t.fields[0]!.real = true), 'Field 1 "Q", real: only a scalar can be declared real'],
      [(t) => (t.groups[0]!.n = 9), 'Symmetry 1 "colour", n: SU(n) needs n from 2 to 8, but n = 9'],
      [(t) => t.fields.push({ name: 'G2', lorentz: 'field-strength', gaugeOf: 'colour' }), 'Field 5 "G2", gauge group of the field strength: colour already has a field strength'],
    ]
    for (const [edit, message] of cases) {
      const t = base()
      edit(t)
      expect(errorOf(t)).toContain(message)
    }
  })

  it('enforces the size limits (n of SU(N) 2..8, 40 fields, 32 groups, flavors 1..6, name pattern)', () => {
    const t = base()
    t.fields[0]!.flavors = 7
    expect(errorOf(t)).toBe('Field 1 "Q", flavors must be at most 6')
    const many = base()
    many.fields = Array.from({ length: 41 }, (_, i) => ({ name: `s${i}`, lorentz: 'scalar' }))
    expect(errorOf(many)).toBe('Fields may list at most 40 entries')
    const groups = base()
    groups.groups = Array.from({ length: 33 }, (_, i) => ({ name: `U${i}`, type: 'U1', gauge: true }))
    expect(errorOf(groups)).toBe('Symmetries may list at most 32 entries')
    const name = base()
    name.fields[1]!.name = '2H'
    expect(errorOf(name)).toBe('Field 2 "2H", name: a name is a letter followed by up to 15 letters, digits or "_"')
    expect(errorOf('{ not json')).toMatch(/^The theory file is not valid JSON \(.+\); check its brackets, commas and quotes$/)
  })
})

describe('Lorentz kinds in words', () => {
  it('accepts the four words and refuses the old letters, naming the word to write', () => {
    const t = base()
    expect(parseTheory(t).fields.map((f) => f.lorentz)).toEqual(['left-weyl', 'scalar', 'scalar', 'field-strength'])
    const cases: [string, string][] = [
      ['S', '"S" is the old one-letter spelling; write "scalar" (the other Lorentz kinds are "left-weyl", "right-weyl", "field-strength")'],
      ['L', '"L" is the old one-letter spelling; write "left-weyl" (the other Lorentz kinds are "scalar", "right-weyl", "field-strength")'],
      ['R', '"R" is the old one-letter spelling; write "right-weyl" (the other Lorentz kinds are "scalar", "left-weyl", "field-strength")'],
      ['F', '"F" is the old one-letter spelling; write "field-strength" (the other Lorentz kinds are "scalar", "left-weyl", "right-weyl")'],
    ]
    for (const [letter, message] of cases) {
      const old = base()
      old.fields[1]!.lorentz = letter
      expect(errorOf(old)).toBe(`Field 2 "H", Lorentz kind: ${message}`)
    }
  })

  it('names the four words for anything else, and when the key is missing', () => {
    const t = base()
    t.fields[1]!.lorentz = 'vector'
    expect(errorOf(t)).toBe('Field 2 "H", Lorentz kind: "vector" is not a Lorentz kind; write one of "scalar", "left-weyl", "right-weyl", "field-strength"')
    delete t.fields[1]!.lorentz
    expect(errorOf(t)).toBe('Field 2 "H", Lorentz kind is required: write one of "scalar", "left-weyl", "right-weyl", "field-strength"')
  })
})
