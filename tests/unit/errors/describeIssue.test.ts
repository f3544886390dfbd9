import { describe, it, expect } from 'vitest'
import { describeIssue } from '../../../shared/schemas/describeZodError'

// The place of a problem goes in front of its message in the form's words; only a Latin first
// letter is capitalised, so a symbol keeps its meaning (a capital alpha "Α" is not α).
describe('describeIssue', () => {
  it("puts the place in the user's words in front of a predicate", () => {
    expect(describeIssue({ path: ['muFromGeV'], message: 'is a number of GeV' })).toBe('Scale of the inputs is a number of GeV')
    expect(describeIssue({ path: ['plotFromGeV'], message: 'must be below the highest plotted scale' })).toBe('Lowest plotted scale must be below the highest plotted scale')
  })
  it('keeps a Greek symbol in front as it is', () => {
    expect(describeIssue({ path: ['alpha', 'X'], message: 'must be positive' })).toBe('α of X must be positive')
    expect(describeIssue({ path: ['alpha', 'X'], message: 'must be positive' })).not.toMatch(/^Α/)
  })
})
