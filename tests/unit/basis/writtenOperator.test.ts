import { describe, expect, it } from 'vitest'
import { classBasis } from '../../../server/engine/basis/index'
import { typedFingerprint } from '../../../server/engine/board/typedOperator'
import smeftJson from './fixtures/smeft.json'
import type { Theory } from '../../../shared/schemas/theory'

const smeft = smeftJson as Theory
// Dimension-8 SMEFT classes whose kept operators the basis writes as Hermitian and parity
// combinations (texts like "(X) - h.c." and "((X) + h.c.) - P").
const CLASSES = ['D L L* H^2 H*^2', 'D^2 W_L W_R H H*']

// Consistency checks (common practice: "(X) ± h.c." is X plus or minus its conjugate, and
// "(Y) ± P" is Y plus or minus its parity image, exactly as the basis builds its columns).
describe('operators as a basis writes them', () => {
  for (const key of CLASSES) {
    it(`${key}: keeping the basis's own texts gives back the same kept operators`, () => {
      const b = classBasis(smeft, key)
      const texts = b.kept.map((k) => k.text)
      expect(texts.some((t) => t.includes('h.c.'))).toBe(true)
      // Priorities are keyed by the class's canonical key (the theory's field order).
      const again = classBasis(smeft, key, { priorities: { keep: { [b.key]: texts } } })
      expect(again.rank).toBe(b.rank)
      expect(again.kept.map((k) => k.text)).toEqual(texts)
      expect(again.kept.every((k) => k.source === 'kept')).toBe(true)
    })

    it(`${key}: a typed combination lands on the stored operator's values exactly`, () => {
      const b = classBasis(smeft, key)
      b.kept.forEach((k, i) => {
        const typed = typedFingerprint(smeft, key, k.text)
        expect(typed.values).toEqual(b.primes.map((pd) => pd.keptRows.map((row) => row[i]!)))
      })
    })
  }

  it('names the problem when a combination cannot be read or is not defined on the class', () => {
    expect(() => typedFingerprint(smeft, 'D L L* H^2 H*^2', '<13>[23]{g:2} + h.c.')).toThrow('write a combination as "(X) + h.c." or "(X) - P"')
    // H^2 H* L e* ... a class that is not its own conjugate has no "+ h.c." combination.
    expect(() => typedFingerprint(smeft, 'L e* H', '(<12>) + h.c.')).toThrow(/is not its own conjugate/)
  })
})
