import { describe, expect, it } from 'vitest'
import { combinationText, mentionsCombination, readCombination } from '../../../server/engine/basis/combinationText'

// The written form of Hermitian and parity combinations (common practice: "O + h.c.").
describe('combination texts', () => {
  it('reads back what it writes, outermost first', () => {
    const hc = combinationText('<12>[34]', 'h.c.', -1)
    expect(hc).toBe('(<12>[34]) - h.c.')
    const p = combinationText(hc, 'P', 1)
    expect(p).toBe('((<12>[34]) - h.c.) + P')
    expect(readCombination(p)).toEqual({ kind: 'P', sign: 1, inner: hc })
    expect(readCombination(hc)).toEqual({ kind: 'h.c.', sign: -1, inner: '<12>[34]' })
  })

  it('leaves plain input syntax alone and notices a stray h.c. or P', () => {
    expect(readCombination('<12>[34] + <13>[24]')).toBeNull()
    expect(mentionsCombination('<12>[34] + h.c.')).toBe(true)
    expect(mentionsCombination('(<12>) + P')).toBe(true)
    expect(mentionsCombination('<12>[34]')).toBe(false)
  })
})
