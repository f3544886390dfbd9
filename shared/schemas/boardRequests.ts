import { z } from 'zod'
import './zodMessages'

export const MoveSchema = z
  .object({
    column: z.enum(['kept', 'set_aside'], { error: 'must be "kept" or "set_aside"' }),
    position: z.number({ error: 'must be a whole number (0 for the top of the column)' }).int({ error: 'must be a whole number' }).min(0, { error: 'must be 0 or more' }).max(100_000),
    version: z.number({ error: 'must be the version of the operator you saw (a whole number); reload the board' }).int().positive({ error: 'must be positive' }),
  })
  .strict()

export const TAG_KINDS = ['threshold', 'tree', 'loop', 'cp-odd', 'b-violating', 'custom'] as const
export const TAG_TITLES: Record<(typeof TAG_KINDS)[number], string> = {
  threshold: 'threshold',
  tree: 'tree-generated',
  loop: 'loop-generated',
  'cp-odd': 'CP-odd',
  'b-violating': 'baryon-number violating',
  custom: 'custom',
}

export const TagCreateSchema = z
  .object({
    kind: z.enum(TAG_KINDS, { error: `must be one of ${TAG_KINDS.join(', ')}` }),
    label: z.string({ error: 'must be text' }).trim().max(120, { error: 'must have at most 120 characters' }).optional(),
  })
  .strict()
  .superRefine((t, ctx) => {
    if ((t.kind === 'threshold' || t.kind === 'custom') && !t.label) {
      ctx.addIssue({
        code: 'custom',
        path: ['label'],
        message: t.kind === 'threshold' ? 'is required: name the heavy field whose integration shifts this coefficient' : 'is required: a custom tag needs a text',
      })
    }
  })

/** The text a threshold tag shows, for the heavy field it names. */
export function thresholdText(field: string): string {
  return `coefficient shifts when ${field} is integrated out`
}

export const TypedRewriteSchema = z
  .object({
    classKey: z.string({ error: 'is required: choose the class of the operator' }).min(1, { error: 'is required: choose the class of the operator' }).max(200),
    text: z.string({ error: 'is required: type the operator' }).trim().min(1, { error: 'is empty: type the operator' }).max(2000, { error: 'must have at most 2000 characters' }),
  })
  .strict()
