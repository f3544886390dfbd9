import { describe, it, expect } from 'vitest'
import { planImport, type StoredOperator } from '../../../server/utils/board/importPlan'
import { matchAuthor, planAnnotations } from '../../../server/utils/board/importAnnotations'
import type { ImportChoice } from '../../../shared/schemas/importChoice'

// Planning an import from a JSON export: matching, places, what changed, what is left out.
const rows: StoredOperator[] = [
  { id: 1, order: 2, class_key: 'A', text: 'a1', column: 'kept', position: 0 },
  { id: 2, order: 2, class_key: 'B', text: 'b1', column: 'kept', position: 3 }, // a gap in positions
  { id: 3, order: 2, class_key: 'A', text: 'a2', column: 'set_aside', position: 0 },
  { id: 4, order: 2, class_key: 'B', text: 'b2', column: 'set_aside', position: 1 },
]
type Op = { text: string; column: 'kept' | 'set_aside'; position?: number; tags?: any[]; notes?: any[] }
const file = (classes: Record<string, Op[]>): ImportChoice => ({
  format: 'scalewright-basis',
  formatVersion: 1,
  orders: [{ order: 2, classes: Object.entries(classes).map(([key, operators]) => ({ key, operators })) }],
})

describe('planning an import', () => {
  it("places the file's operators by their position, the others after them as stored, and counts real changes only", () => {
    const same = planImport(
      rows,
      file({
        A: [
          { text: 'a1', column: 'kept', position: 0 },
          { text: 'a2', column: 'set_aside', position: 0 },
        ],
        B: [
          { text: 'b1', column: 'kept', position: 1 },
          { text: 'b2', column: 'set_aside', position: 1 },
        ],
      }),
    )
    expect(same).toMatchObject({ columnChanges: 0, reordered: 0, notInFile: 0 })
    const swapped = planImport(rows, file({ B: [{ text: 'b1', column: 'kept', position: 0 }] }))
    if ('refused' in swapped) throw new Error(swapped.refused)
    expect(swapped.final.get(2)).toEqual({ column: 'kept', position: 0 })
    expect(swapped.final.get(1)).toEqual({ column: 'kept', position: 1 })
    expect(swapped).toMatchObject({ columnChanges: 0, reordered: 2, notInFile: 3 })
    const moved = planImport(rows, file({ A: [{ text: 'a2', column: 'kept' }] }))
    if ('refused' in moved) throw new Error(moved.refused)
    expect(moved.final.get(3)).toEqual({ column: 'kept', position: 0 })
    expect(moved.columnChanges).toBe(1)
  })

  it('refuses unknown and repeated operators, naming them as the board does', () => {
    expect(planImport(rows, file({ A: [{ text: 'zz', column: 'kept' }] }))).toEqual({ refused: expect.stringContaining('order 2, class A: "zz"') })
    expect(
      planImport(
        rows,
        file({
          A: [
            { text: 'a1', column: 'kept' },
            { text: 'a1', column: 'set_aside' },
          ],
        }),
      ),
    ).toEqual({ refused: expect.stringContaining('more than once: order 2, class A: "a1"') })
  })
})

describe('tags and notes of an imported file', () => {
  const members = new Map([
    [7, 'Ilse Marrow'],
    [8, 'Quentin'],
    [9, 'Quentin'],
  ])
  it('an author is the member with the same account and name, or the one member of that name; else a name kept as text', () => {
    expect(matchAuthor(members, 'Ilse Marrow', 7)).toEqual({ id: 7, name: null })
    expect(matchAuthor(members, 'Ilse Marrow', null)).toEqual({ id: 7, name: null })
    expect(matchAuthor(members, 'Someone Else', 7)).toEqual({ id: null, name: 'Someone Else' })
    expect(matchAuthor(members, 'Quentin', undefined)).toEqual({ id: null, name: 'Quentin' }) // two members of that name
  })
  it('says which tags and notes are left out, and why', () => {
    const plan = planImport(
      rows,
      file({
        A: [
          {
            text: 'a1',
            column: 'kept',
            tags: [{ kind: 'loop' }, { kind: 'custom' }, { kind: 'sparkly', label: 'x' }],
            notes: [{ body: ' ', createdAt: '2026-01-01T00:00:00Z' }, { body: 'ok', author: 'Ilse Marrow', authorId: 7, createdAt: '2026-01-02T00:00:00Z' }, { body: 'no date' }],
          },
        ],
      }),
    )
    if ('refused' in plan) throw new Error(plan.refused)
    const out = planAnnotations(plan.entries, members)
    expect(out.tags.map((t) => t.kind)).toEqual(['loop'])
    expect(out.notes).toEqual([{ operatorId: 1, body: 'ok', author: { id: 7, name: null }, createdAt: new Date('2026-01-02T00:00:00Z'), what: 'note "ok" by Ilse Marrow' }])
    expect(out.leftOut.map((l) => l.reason)).toEqual([
      'a custom tag needs a label',
      expect.stringContaining('"sparkly" is not a tag kind here'),
      'the note is empty',
      expect.stringContaining('missing or not a date'),
    ])
  })
})
