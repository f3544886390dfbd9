import { describe, expect, it } from 'vitest'
import preset from '../../../shared/presets/heavy-vexonium.json'
import { symmetricCandidates } from '../../../server/engine/heavy/orderSpace'
import { relationStructures } from '../../../server/engine/heavy/candidates'
import { expandStructure } from '../../../server/engine/heavy/structure'
import { QuotientSpace } from '../../../server/engine/heavy/quotient'
import { enumerateHeavyTheory } from '../../../server/engine/heavy'
import { parseTheory } from '../../../server/engine/theory/parseTheory'

describe('the gauge-field symbol with 0, 1, 2 insertions is faithful through 1/m³', () => {
  const cands = symmetricCandidates(3).map((c) => c.element)
  const rels = relationStructures(4)
    .map((s) => expandStructure(s))
    .filter((e) => e.size > 0)
  it('dropping the two-insertion sector loses E² and B² (rank 5 < 7); adding a third sector changes nothing (common practice: field strengths first appear at n = their number)', () => {
    expect(new QuotientSpace(cands, rels, { sectors: [0, 1], seed: 5 }).dimension).toBe(5)
    expect(new QuotientSpace(cands, rels, { sectors: [0, 1, 2], seed: 5 }).dimension).toBe(7)
    expect(new QuotientSpace(cands, rels, { sectors: [0, 1, 2, 3], seed: 5 }).dimension).toBe(7)
  })
  it('the result does not depend on the random points (two seeds, same greedy basis)', () => {
    const a = new QuotientSpace(cands, rels, { seed: 1 })
    const b = new QuotientSpace(cands, rels, { seed: 2 })
    expect(a.basis).toEqual(b.basis)
    expect(a.relationRank).toBe(b.relationRank)
  })
})

describe('whole-theory entry point', () => {
  it('the vexonium preset gives 2, 2, 7 bilinears and 2 four-fermion operators (Manohar, Phys. Rev. D 56 (1997) 230; Bodwin, Braaten, Lepage, Phys. Rev. D 51 (1995) 1125)', () => {
    const r = enumerateHeavyTheory(parseTheory(preset))
    expect(r.orders.map((o) => o.count)).toEqual([2, 2, 7])
    expect(r.fourFermion).toHaveLength(2)
  })
  it('a relativistic theory is refused with the frame named', () => {
    expect(() => enumerateHeavyTheory({ frame: 'relativistic', groups: [] })).toThrow('This theory uses the relativistic frame; heavy-particle operators need the heavy-particle frame')
    expect(() => enumerateHeavyTheory({ frame: 'heavy', groups: [] })).toThrow('A theory in the heavy-particle frame needs its heavy particle')
  })
})
