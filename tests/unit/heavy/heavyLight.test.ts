import { describe, expect, it } from 'vitest'
import { enumerateHeavy } from '../../../server/engine/heavy'
import { enumerateHeavyLight, type HeavyLightInput } from '../../../server/engine/heavy/heavyLight'
import { lightFields, type TheoryFieldLike } from '../../../server/engine/heavy/lightFields'
import type { LightCombo } from '../../../server/engine/heavy/lightStructure'
import { EngineInputError } from '../../../server/engine/errors'

const qed = [{ name: 'QED', type: 'U1', gauge: true }]
const electron: TheoryFieldLike[] = [
  { name: 'A', lorentz: 'field-strength', gaugeOf: 'QED' },
  { name: 'eL', lorentz: 'left-weyl', charges: { QED: '-1' } },
  { name: 'eR', lorentz: 'right-weyl', charges: { QED: '-1' } },
]
const muon = (over: Partial<HeavyLightInput> = {}): HeavyLightInput => ({
  particle: 'mu',
  heavy: { reps: {}, charges: { QED: '-1' } },
  fields: electron,
  groups: qed,
  maxOrder: 2,
  parity: true,
  timeReversal: true,
  ...over,
})
const tauOf = (c: LightCombo | undefined) => c![0]!.s.tau

describe('heavy–light contact operators: a heavy lepton or nucleus with light electrons', () => {
  it('a left- and a right-handed field with the same charges form one light Dirac fermion (common practice)', () => {
    const { fields, unpaired } = lightFields(electron, qed)
    expect(fields.map((f) => [f.name, f.kind, f.parts])).toEqual([['e', 'dirac', ['eL', 'eR']]])
    expect(unpaired).toEqual([])
  })
  it('1/m²: four P-, T-even operators (ψ†ψ)(ēe), (ψ†ψ)(ēγ⁰e), (ψ†σψ)·(ēγγ₅e), (ψ†σψ)·(ēΣe) (hand derivation: rotation scalars of ψ†{1,σ}ψ times the sixteen Dirac bilinears, common practice)', () => {
    const r = enumerateHeavyLight(muon())
    expect(r.classes.map((c) => [c.key, c.count, c.realParameters])).toEqual([['mu* mu e e* (1/m^2)', 4, 4]])
  })
  it('of these, the two that keep the light chirality are those of Hill, Lee, Paz, Solon, Phys. Rev. D 87 (2013) 053017 (b₁ (ψ†ψ)(ēγ⁰e), b₂ (ψ†σψ)·(ēγγ₅e), from memory); the other two flip it', () => {
    const basis = enumerateHeavyLight(muon()).classes[0]!.basis
    const keeping = basis.filter((b) => [0, 1].includes(tauOf(b.lightCombo)!))
    expect(keeping.map((b) => b.latex)).toEqual(['(\\mu^\\dagger \\mu) (\\bar{e} \\gamma^0 e)/m^{2}', '(\\mu^\\dagger \\sigma^{i} \\mu) (\\bar{e} \\gamma^{i}\\gamma_5 e)/m^{2}'])
  })
  it('without P and T every Hermitian rotation scalar counts: 1×4 (scalars ē{1,γ⁰,γ₅,γ⁰γ₅}e) + 1×4 (vectors) = 8 (hand derivation, common practice)', () => {
    expect(enumerateHeavyLight(muon({ parity: false, timeReversal: false })).classes[0]!.count).toBe(8)
  })
  it('a Weyl fermion without a partner is named as left out, not silently dropped', () => {
    const nu: TheoryFieldLike[] = [...electron, { name: 'nuL', lorentz: 'left-weyl' }]
    expect(enumerateHeavyLight(muon({ fields: nu })).unpaired).toEqual(['nuL'])
    const full = enumerateHeavy({ heavy: { particle: { name: 'mu', charges: { QED: '-1' } }, gaugeGroup: 'QED', maxOrder: 2 }, groups: qed, fields: nu })
    expect(full.heavyLightNote).toContain('Left out: nuL')
    expect(full.heavyLight.map((c) => c.count)).toEqual([4])
  })
})

describe('a static heavy source and a light real scalar', () => {
  const scalar = (maxOrder: number, parity = true): HeavyLightInput => ({
    particle: 'N',
    heavy: { reps: {}, charges: {} },
    fields: [{ name: 'phi', lorentz: 'scalar', real: true }],
    groups: [],
    maxOrder,
    parity,
    timeReversal: true,
  })
  it('order 0: ψ†ψφ; order 1: ψ†ψφ² (hand derivation, common practice)', () => {
    expect(enumerateHeavyLight(scalar(1)).classes.map((c) => [c.key, c.count])).toEqual([
      ['N* N phi (1/m^0)', 1],
      ['N* N phi phi (1/m^1)', 1],
    ])
  })
  it('a true scalar has no P-even σ·∇φ coupling; without P (a pseudoscalar such as the pion) ψ†σ·∇φψ appears at order 1 (common practice: the axial pion–nucleon coupling)', () => {
    const withP = enumerateHeavyLight(scalar(1)).classes.filter((c) => c.order === 1 && c.content === 'phi')
    expect(withP).toEqual([])
    const noP = enumerateHeavyLight(scalar(1, false)).classes.find((c) => c.order === 1 && c.content === 'phi')!
    expect(noP.count).toBe(1)
    expect(noP.basis[0]!.latex).toContain('\\sigma^{i}')
  })
})

describe('colour: a heavy quark with a light quark', () => {
  const su3 = [{ name: 'C', type: 'SU', n: 3, gauge: true }]
  const quark: TheoryFieldLike[] = [
    { name: 'qL', lorentz: 'left-weyl', reps: { C: [1, 0] } },
    { name: 'qR', lorentz: 'right-weyl', reps: { C: [1, 0] } },
  ]
  const input: HeavyLightInput = { particle: 'Q', heavy: { reps: { C: [1, 0] }, charges: {} }, fields: quark, groups: su3, maxOrder: 2, parity: true, timeReversal: true }
  it('two colour structures (1⊗1 and T^a⊗T^a, i.e. δδ and crossed δδ) double the four spin structures: 8 at 1/m² (common practice: 3⊗3̄⊗3⊗3̄ has two singlets)', () => {
    expect(enumerateHeavyLight(input).classes.map((c) => c.count)).toEqual([8])
  })
  it('an adjoint light scalar is refused with the field named', () => {
    const adj: TheoryFieldLike[] = [{ name: 'S8', lorentz: 'scalar', real: true, reps: { C: [1, 1] } }]
    expect(() => enumerateHeavyLight({ ...input, fields: adj })).toThrow(EngineInputError)
    expect(() => enumerateHeavyLight({ ...input, fields: adj })).toThrow('Light field S8 sits in [1,1] of C; heavy–light operators support only singlets, fundamentals and antifundamentals')
  })
})
