import { describe, expect, it } from 'vitest'
import { GoldstoneFrameSchema } from '../../../shared/schemas/goldstoneFrame'
import { TheorySchema } from '../../../shared/schemas/theory'

const block = { coset: 'chiral', N: 3, sources: { scalar: true, vector: true }, maxOrder: 6 }
const theory = (extra: Record<string, unknown>) => ({ name: 'pions', frame: 'goldstone', groups: [], fields: [], goldstone: block, ...extra })
const messages = (r: { success: boolean; error?: { issues: { message: string }[] } }) => r.error?.issues.map((i) => i.message) ?? []

describe('GoldstoneFrameSchema (common practice: schema validation)', () => {
  it('accepts SU(N)×SU(N)/SU(N) and O(N+1)/O(N) blocks, N = "general", the θ term and the names', () => {
    expect(GoldstoneFrameSchema.safeParse(block).success).toBe(true)
    expect(GoldstoneFrameSchema.safeParse({ ...block, coset: 'orthogonal', N: 'general', theta: true, decayConstant: 'f', goldstoneName: 'pi' }).success).toBe(true)
  })

  it('refuses N outside its range and odd or too high orders, saying what to change', () => {
    expect(messages(GoldstoneFrameSchema.safeParse({ ...block, N: 1 }))).toEqual(['Goldstone frame: N must be from 2 to 12 (or "general") for the chiral coset, but N = 1'])
    expect(GoldstoneFrameSchema.safeParse({ ...block, coset: 'orthogonal', N: 1 }).success).toBe(true)
    expect(messages(GoldstoneFrameSchema.safeParse({ ...block, maxOrder: 5 }))).toEqual(['Goldstone frame: the highest chiral order is an even power of p from 2 to 14, but maxOrder = 5'])
    expect(messages(GoldstoneFrameSchema.safeParse({ ...block, maxOrder: 16 }))[0]).toContain('from 2 to 14')
    expect(messages(GoldstoneFrameSchema.safeParse({ ...block, sources: { scalar: 'yes', vector: true } }))[0]).toBe('sources.scalar is true or false (the sources s, p)')
    expect(GoldstoneFrameSchema.safeParse({ ...block, tensor: true }).success).toBe(false)
  })

  it('takes the singlet vector source on the chiral coset only', () => {
    const singlet = { scalar: true, vector: true, singletVector: true }
    expect(GoldstoneFrameSchema.safeParse({ ...block, sources: singlet }).success).toBe(true)
    expect(messages(GoldstoneFrameSchema.safeParse({ ...block, coset: 'orthogonal', sources: singlet }))).toEqual([
      'Goldstone frame: the singlet vector source belongs to the chiral coset SU(N)×SU(N)/SU(N); for O(N+1)/O(N) switch it off',
    ])
  })
})

describe('the goldstone block in a theory file', () => {
  it('goes with frame "goldstone" and only with it', () => {
    expect(TheorySchema.safeParse(theory({})).success).toBe(true)
    expect(messages(TheorySchema.safeParse(theory({ frame: 'relativistic' })))).toContain('a Goldstone block needs the Goldstone frame; choose that frame, or remove the block')
    expect(messages(TheorySchema.safeParse(theory({ goldstone: undefined })))).toContain('the Goldstone frame needs its Goldstone block (coset, N, sources, highest chiral order); declare it')
  })
})
