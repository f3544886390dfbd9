import { describe, expect, it } from 'vitest'
import { classKeyOfCounts, classKeyTex, countsOfClassKey, formatClassKey, readClassKey } from '../../../server/engine/theory/classKey'
import { buildTheoryModel } from '../../../server/engine/theory/model'
import { blocksFromClassKey } from '../../../server/engine/rules'
import { basisSpecies } from '../../../server/engine/basis/species'
import { parseClassKey } from '../../../server/engine/basis/classKey'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { findPreset } from '../../../shared/presets/index'

// The one class-key module, read and written the same way by counting, bases, rules and TeX.
// Format: common practice for class labels (Grzadkowski et al., JHEP 10 (2010) 085), with the
// chiral halves of field strengths written G_L, G_R.
const smeft = parseTheory(findPreset('smeft')!.theory)
const model = buildTheoryModel(smeft)

const KEYS = ['D^2 H^2 H*^2', 'G_L^3', 'Q Q* u u*', 'D L L* H H*', 'L^2 H^2', 'H H* W_L^2', 'D^4 H^2 H*^2']

describe('class keys', () => {
  it('every engine reads a key to the same content, and writes it back unchanged', () => {
    const species = basisSpecies(smeft)
    for (const key of KEYS) {
      const { counts, derivatives } = countsOfClassKey(model, key)
      expect(classKeyOfCounts(model, counts, derivatives)).toBe(key)
      const cls = parseClassKey(species, key, 1)
      expect(cls.key).toBe(key)
      expect(cls.k).toBe(derivatives)
      expect(cls.legs.map((p) => p.label)).toEqual(model.species.flatMap((s, i) => new Array<string>(counts[i]!).fill(s.label)))
      const blocks = blocksFromClassKey(key)
      expect(Object.values(blocks).reduce((a, b) => a + b, 0)).toBe(derivatives + counts.reduce((a, b) => a + b, 0))
    }
  })

  it('puts a key written in another order into theory order', () => {
    const { counts, derivatives } = countsOfClassKey(model, 'H* D H D')
    expect(classKeyOfCounts(model, counts, derivatives)).toBe('D^2 H H*')
    expect(
      formatClassKey(1, [
        { label: 'H', power: 0 },
        { label: 'e', power: 3 },
      ]),
    ).toBe('D e^3')
  })

  it('refuses what it cannot read, naming the token or the field', () => {
    expect(() => readClassKey('')).toThrow('The class is empty; name its fields, e.g. "D^2 H^2 H*^2"')
    expect(() => readClassKey('H^0')).toThrow('Cannot read "H^0" in the class "H^0"; write a class as fields with powers')
    expect(() => readClassKey('H^-1 H*')).toThrow('Cannot read "H^-1"')
    expect(() => readClassKey('2H')).toThrow('Cannot read "2H"')
    expect(() => countsOfClassKey(model, 'H^2 phi^2')).toThrow('The class "H^2 phi^2" names "phi", which is not a field of this theory')
    expect(() => parseClassKey(basisSpecies(smeft), 'H H*')).toThrow('The class "H H*" has fewer than 3 fields; an operator class needs at least 3')
  })

  it('writes TeX (never throws): upright long names, chiral halves as subscripts, conjugation and powers as superscripts', () => {
    expect(classKeyTex('D^2 H^2 H*^2')).toBe('D^{2}\\,H^{2}\\,H^{*2}')
    expect(classKeyTex('G_L^3')).toBe('G_{L}^{3}')
    expect(classKeyTex('psi1* eR')).toBe('\\mathrm{psi1}^{*}\\,\\mathrm{eR}')
    expect(classKeyTex('psi* psi (1/m^2)')).toBe('\\mathrm{psi}^{*}\\,\\mathrm{psi}\\,(1/m^2)') // a heavy-frame key: the unreadable part as written
  })
})
