import { beforeAll, describe, expect, it } from 'vitest'
import { judgeList, listCoordinates, type ListCoordinates } from '../../../server/engine/notation/index'
import smeftJson from '../basis/fixtures/smeft.json'
import type { Theory } from '../../../shared/schemas/theory'
import { WARSAW, WARSAW_ALIASES } from './warsawTable'

const smeft = smeftJson as Theory
const texts = WARSAW.map(([, t]) => t)
// A Fierz partner: for one flavour (l̄^j γ_μ l^k)(l̄^k γ^μ l^j) = Q_ll, and the SU(2) completeness
// relation τ^I_{ab} τ^I_{cd} = 2δ_{ad}δ_{cb} − δ_{ab}δ_{cd} then gives (l̄ τ^I γ_μ l)(l̄ τ^I γ^μ l) = Q_ll,
// which is why the table lists no triplet Q_ll (Fierz identity and SU(2) completeness: common practice).
const FIERZ_TRIPLET = '(\\bar l\\tau^I\\gamma_\\mu l)(\\bar l\\tau^I\\gamma^\\mu l)'
const FIERZ_SWAPPED = '(\\bar l^j\\gamma_\\mu l^k)(\\bar l^k\\gamma^\\mu l^j)'

let data: ListCoordinates
beforeAll(() => {
  data = listCoordinates(smeft, 6, [...texts, FIERZ_TRIPLET, FIERZ_SWAPPED], { aliases: WARSAW_ALIASES })
}, 600_000)
const warsaw = texts.map((_, i) => i)

describe('the Warsaw basis typed as printed (Grzadkowski, Iskrzyński, Misiak, Rosiek, JHEP 10 (2010) 085, arXiv:1008.4884, Table 2 and the B-violating operators of §3), dimension 6, one flavour', () => {
  it('is complete and independent: 84 real parameters, every class of the order reached with its full rank', () => {
    const r = judgeList(data, warsaw)
    expect(r.required).toBe(84) // Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016 (Hilbert series, Nf = 1)
    expect(r.rank).toBe(84)
    expect(r.missing).toEqual([])
    expect(r.redundant).toEqual([])
    expect(r.complete && r.independent).toBe(true)
    expect(r.classes.filter((c) => c.rank !== c.required)).toEqual([])
  })
  it('the bosonic operators are Hermitian and the ψ²Xφ, ψ²φ³, scalar four-fermion and B-violating ones are not (the table adds their h.c.)', () => {
    const herm = Object.fromEntries(WARSAW.map(([n], i) => [n, data.entries[i]!.hermitian]))
    for (const n of ['Q_G', 'Q_Wtilde', 'Q_phi', 'Q_phiD', 'Q_phiWB', 'Q_phil3', 'Q_qq3', 'Q_ud8']) expect(herm[n], n).toBe(true)
    for (const n of ['Q_ephi', 'Q_uG', 'Q_phiud', 'Q_ledq', 'Q_lequ3', 'Q_duq']) expect(herm[n], n).toBe(false)
  })
  it("removing any one operator leaves it incomplete, and the missing direction lies in that operator's classes", () => {
    for (const drop of warsaw) {
      const r = judgeList(
        data,
        warsaw.filter((i) => i !== drop),
      )
      expect(r.complete, WARSAW[drop]![0]).toBe(false)
      const touched = new Set(data.entries[drop]!.own.map((c, j) => (c.num !== 0n ? data.columns[j]!.cls : '')).filter(Boolean))
      expect(r.missing.length, WARSAW[drop]![0]).toBeGreaterThan(0)
      for (const m of r.missing)
        expect(touched.has(m.class) || data.entries[drop]!.conj.some((c, j) => c.num !== 0n && data.columns[j]!.cls === m.class), `${WARSAW[drop]![0]} → ${m.class}`).toBe(true)
    }
  })
  it('adding the Fierz partner of Q_ll makes the list redundant with the relation (l̄τ^Iγl)(l̄τ^Iγl) = 1·Q_ll', () => {
    const ll = texts.indexOf('(\\bar l\\gamma_\\mu l)(\\bar l\\gamma^\\mu l)')
    for (const extra of [texts.length, texts.length + 1]) {
      const r = judgeList(data, [...warsaw, extra])
      expect(r.complete).toBe(true)
      expect(r.independent).toBe(false)
      expect(r.redundant).toEqual([{ operator: data.entries[extra]!.line, relation: [{ operator: texts[ll], coefficient: '1' }] }])
    }
  })
})
