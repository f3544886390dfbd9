import { z } from 'zod'

/** A list of operators, typed as papers print them, to check against one order of a stored basis. */
export const ListCheckSchema = z
  .object({
    order: z
      .number({ error: 'is required: choose the order to check (dimension − 4)' })
      .int({ error: 'must be a whole number' })
      .min(1, { error: 'must be at least 1 (order 0 has two-field terms without a contact amplitude)' })
      .max(4, { error: 'must be at most 4: a check rebuilds every class of the order' }),
    operators: z.string({ error: 'is required: paste one operator per line' }).max(100_000, { error: 'must have at most 100,000 characters' }),
    aliases: z.record(z.string().min(1).max(40), z.string().min(1).max(40), { error: 'must map a paper\'s names to field names, e.g. {"phi": "H"}' }).optional(),
  })
  .strict()

export type ListCheckRequest = z.infer<typeof ListCheckSchema>
