import { expect, it } from 'vitest'
import { checkOperatorList } from '../../../server/engine/notation/index'
import { SMALL_THEORY } from '../../support/fixtures'
import type { Theory } from '../../../shared/schemas/theory'

// Scalar QED at dimension 6: (φ†φ)³, φ†φ F F, φ†φ F F̃ and ONE φ⁴D² operator: for an SU(2) singlet the
// two structures of the Warsaw table (Grzadkowski et al., JHEP 10 (2010) 085) fall together; the class
// count 1 is the Hilbert series' (Henning, Lu, Melia, Murayama, JHEP 08 (2017) 016).
const LIST = [
  '(\\phi^\\dagger\\phi)^3',
  '(\\phi^\\dagger\\phi)\\Box(\\phi^\\dagger\\phi)',
  '(\\phi^\\dagger D^\\mu\\phi)^*(\\phi^\\dagger D_\\mu\\phi)',
  '\\phi^\\dagger\\phi A_{\\mu\\nu}A^{\\mu\\nu}',
  'φ† φ Ã_{μν} A^{μν}',
]
it('scalar QED at dimension 6 typed as printed is complete, the second φ⁴D² operator redundant; without (φ†φ)³ it misses the sextic class', () => {
  const r = checkOperatorList(SMALL_THEORY as Theory, 6, LIST)
  expect([r.complete, r.independent, r.rank, r.required]).toEqual([true, false, 4, 4])
  expect(r.redundant.map((x) => [x.operator, x.relation.map((t) => t.operator)])).toEqual([[LIST[2], [LIST[1]]]])
  const less = checkOperatorList(SMALL_THEORY as Theory, 6, [LIST[1]!, ...LIST.slice(3)])
  expect(less.complete).toBe(false)
  expect(less.missing.map((m) => m.class)).toEqual(['phi^3 phi*^3'])
})
