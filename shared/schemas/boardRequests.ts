import { z } from 'zod'

export const MoveSchema = z.object({
  column: z.enum(['kept', 'set_aside'], { error: 'column must be "kept" or "set_aside"' }),
  position: z.number({ error: 'position: a whole number is required' }).int({ error: 'position must be a whole number' }).min(0, { error: 'position must be 0 or more' }).max(100_000),
  version: z.number({ error: 'version: the operator version you saw is required' }).int().positive({ error: 'version must be positive' }),
}).strict()

export const TAG_KINDS = ['threshold', 'tree', 'loop', 'cp-odd', 'b-violating', 'custom'] as const
export const TAG_TITLES: Record<(typeof TAG_KINDS)[number], string> = {
  'threshold': 'threshold',
  'tree': 'tree-generated',
  'loop': 'loop-generated',
  'cp-odd': 'CP-odd',
  'b-violating': 'baryon-number violating',
  'custom': 'custom',
}

export const TagCreateSchema = z.object({
  kind: z.enum(TAG_KINDS, { error: `kind must be one of ${TAG_KINDS.join(', ')}` }),
  label: z.string({ error: 'label must be text' }).trim().max(120, { error: 'label: at most 120 characters' }).optional(),
}).strict().superRefine((t, ctx) => {
  if ((t.kind === 'threshold' || t.kind === 'custom') && !t.label) {
    ctx.addIssue({ code: 'custom', path: ['label'], message: t.kind === 'threshold' ? 'label: name the heavy field whose integration shifts this coefficient' : 'label: a custom tag needs a text' })
  }
})

/** The text a threshold tag shows, for the heavy field it names. */
export function thresholdText(field: string): string {
  return `coefficient shifts when ${field} is integrated out`
}

export const TypedRewriteSchema = z.object({
  classKey: z.string({ error: 'classKey: the class of the operator is required' }).min(1, { error: 'classKey: the class of the operator is required' }).max(200),
  text: z.string({ error: 'text: the operator is required' }).trim().min(1, { error: 'text: the operator is empty' }).max(2000, { error: 'text: at most 2000 characters' }),
}).strict()
