import { describe, expect, it } from 'vitest'
import { goldstoneBasis, type GoldstoneOrderBasis } from '../../../server/engine/goldstone/explicit/goldstoneBasis'

const p4 = (N: number | 'general') => goldstoneBasis({ N, sources: true, maxOrder: 4, minOrder: 4 }).byOrder[0]!
const rewriteOf = (o: GoldstoneOrderBasis, text: string) => Object.fromEntries(o.alternatives.find((a) => a.text === text)!.rewrite!.map((t) => [t.text, t.coefficient]))

describe('explicit p⁴ bases, tally-checked against the Hilbert series (two independent methods)', () => {
  const three = p4(3)

  it('N = 3: ten L_i and H1, H2 as twelve kept operators, every letter class at its Hilbert count (Gasser & Leutwyler, Nucl. Phys. B 250 (1985) 465)', () => {
    expect([three.rank, three.hilbert, three.tallyOk, three.kept.length]).toEqual([12, 12, true, 12])
    expect(three.contact).toEqual({ hilbert: 2, rank: 2, kept: 2 })
    expect(three.classes.every((c) => c.tallyOk)).toBe(true)
  })

  it('N = 2: l1 … l7 and h1, h2, h3 (Gasser & Leutwyler, Ann. Phys. 158 (1984) 142)', () => {
    const two = p4(2)
    expect([two.rank, two.hilbert, two.tallyOk, two.kept.length]).toEqual([10, 10, true, 10])
    expect(two.contact).toMatchObject({ hilbert: 3, rank: 3 })
  })

  it('general N: L0 … L10, H1, H2 (Bijnens, Colangelo, Ecker, Ann. Phys. 280 (2000) 100)', () => {
    const general = p4('general')
    expect([general.rank, general.hilbert, general.tallyOk]).toEqual([13, 13, true])
    expect(general.kept.map((k) => k.text)).toContain('⟨u_μ u^μ⟩⟨u_ν u^ν⟩')
  })

  it('N = 3: the Cayley–Hamilton relation that removes L0 (Gasser & Leutwyler, Nucl. Phys. B 250 (1985) 465; Bijnens, Colangelo, Ecker 2000)', () => {
    expect(rewriteOf(three, '⟨u_μ u^μ⟩⟨u_ν u^ν⟩')).toEqual({ '⟨u_μ u_ν u^μ u^ν⟩': '2', '⟨u_μ u^μ u_ν u^ν⟩': '4', '⟨u_μ u_ν⟩⟨u^μ u^ν⟩': '-2' })
  })

  it('N = 3: the equation of motion ∇_μu^μ = (i/2)(χ− − ⟨χ−⟩/N) with integration by parts trades ⟨χ−⟩² (common practice: Gasser & Leutwyler 1985)', () => {
    expect(rewriteOf(three, '⟨χ−⟩⟨χ−⟩')).toEqual({ '⟨χ− χ−⟩': '3', 'i⟨u_μ ∇^μ χ−⟩': '-6' })
  })

  it('source identities: ⟨f+²⟩ + ⟨f−²⟩ = 2⟨F_L²⟩ + 2⟨F_R²⟩ and ⟨χ+²⟩ − ⟨χ−²⟩ = 4⟨χχ†⟩ (common practice: f± = u F_L u† ± u† F_R u, χ± = u†χu† ± uχ†u)', () => {
    expect(rewriteOf(three, '⟨f+_μν f+^μν⟩')).toEqual({ '⟨F_R_μν F_R^μν⟩ + ⟨F_L_μν F_L^μν⟩': '2', '⟨f−_μν f−^μν⟩': '-1' })
    expect(rewriteOf(three, '⟨χ+ χ+⟩')).toEqual({ '⟨χ χ†⟩': '4', '⟨χ− χ−⟩': '1' })
  })

  it("refuses orders above p⁶ with a message in the user's terms", () => {
    expect(() => goldstoneBasis({ N: 3, sources: true, maxOrder: 8 })).toThrow('explicit bases are built up to p^6; the highest order asked for is p^8 (the count goes further)')
  })

  it('stops when the run is cancelled', () => {
    expect(() => goldstoneBasis({ N: 3, sources: true, maxOrder: 4, signal: { aborted: true } })).toThrow('cancelled')
  })
})

describe('explicit p⁶ basis, N = 2', () => {
  it('52 + 4 normal-parity and 5 odd-parity terms: 61 kept, tally-checked, each set-aside operator rewritten exactly (Bijnens, Colangelo, Ecker, Ann. Phys. 280 (2000) 100, less the redundant term of Haefeli, Ivanov, Schmid, Ecker, arXiv:0705.0576 (2007), from memory; Bijnens, Girlanda, Talavera, Eur. Phys. J. C 23 (2002) 539)', () => {
    const o = goldstoneBasis({ N: 2, sources: true, maxOrder: 6, minOrder: 6 }).byOrder[0]!
    expect([o.rank, o.hilbert, o.tallyOk]).toEqual([61, 61, true])
    expect([o.kept.filter((k) => k.parity === 'even').length, o.kept.filter((k) => k.parity === 'odd').length]).toEqual([56, 5])
    expect(o.contact).toMatchObject({ hilbert: 4, rank: 4, kept: 4 })
    expect(o.alternatives.every((a) => a.rewrite!.length > 0)).toBe(true)
  }, 600_000)
})

describe('the kept choice follows the priorities', () => {
  it('N = 3, p⁴: asking for ⟨u·u⟩² first keeps it and sets aside a term it replaces by Cayley–Hamilton (Gasser & Leutwyler, Nucl. Phys. B 250 (1985) 465)', () => {
    const o = goldstoneBasis({ N: 3, sources: true, maxOrder: 4, minOrder: 4, keep: { 'p^4': ['⟨u_μ u^μ⟩⟨u_ν u^ν⟩'] } }).byOrder[0]!
    expect(o.kept.map((k) => k.text)).toContain('⟨u_μ u^μ⟩⟨u_ν u^ν⟩')
    expect([o.rank, o.tallyOk]).toEqual([12, true])
    const partners = ['⟨u_μ u_ν u^μ u^ν⟩', '⟨u_μ u^μ u_ν u^ν⟩', '⟨u_μ u_ν⟩⟨u^μ u^ν⟩']
    expect(partners.filter((t) => o.kept.some((k) => k.text === t))).toHaveLength(2)
  })
})
