import { z } from 'zod'
import './zodMessages'
import { TheorySchema } from './theory'

// Size limits live here, so one request cannot ask the server for unbounded work.
export const MAX_RUN_DIMENSION = { count: 16, basis: 8 } as const

// How the greedy choice of kept operators is steered (explicit-basis runs).
export const RunPrioritiesSchema = z
  .object({
    derivativesOn: z
      .array(z.string().regex(/^[A-Za-z][A-Za-z0-9_]{0,15}\*?$/, { error: 'must be a field name, such as "H" or "H*"' }))
      .max(40)
      .optional(),
    preferHermitian: z.boolean({ error: 'must be true or false' }).optional(),
    keepFromBasis: z.number({ error: 'must be the number of a basis of this theory' }).int().positive().optional(),
  })
  .strict()

const FlavorsSchema = z
  .number({ error: 'must be a whole number from 1 to 6' })
  .int({ error: 'must be a whole number from 1 to 6' })
  .min(1, { error: 'must be at least 1' })
  .max(6, { error: 'must be at most 6' })

/** Highest power of 1/m of a heavy-frame run. */
export const MAX_HEAVY_ORDER = 4

export const RunCreateSchema = z
  .object({
    kind: z.enum(['count', 'basis'], { error: 'must be "count" or "basis"' }),
    maxDim: z
      .number({ error: 'must be a whole number (a mass dimension from 5 to 16)' })
      .int({ error: 'must be a whole number' })
      .min(5, { error: 'must be at least 5' })
      .max(16, { error: 'must be at most 16' })
      .optional(),
    // Order: the power of 1/m for a heavy-frame theory, dimension − 4 otherwise.
    maxOrder: z
      .number({ error: 'must be a whole number (the power of 1/m, or dimension − 4)' })
      .int({ error: 'must be a whole number' })
      .min(1, { error: 'must be at least 1' })
      .max(12, { error: 'must be at most 12' })
      .optional(),
    nf: FlavorsSchema.optional(),
    priorities: RunPrioritiesSchema.optional(),
  })
  .strict()
  .refine((r) => r.maxDim !== undefined || r.maxOrder !== undefined, {
    error: 'is required: give the maximum dimension, or the maximum order (the power of 1/m in the heavy frame, dimension − 4 otherwise)',
    path: ['maxDim'],
  })
  .refine((r) => r.maxDim === undefined || r.maxDim <= MAX_RUN_DIMENSION[r.kind], { error: 'must be at most 8 for an explicit basis (counts go up to 16)', path: ['maxDim'] })

export const QuickCountSchema = z
  .object({
    theory: TheorySchema,
    maxDim: z
      .number({ error: 'must be a whole number (a mass dimension from 5 to 8)' })
      .int({ error: 'must be a whole number' })
      .min(5, { error: 'must be at least 5' })
      .max(8, { error: 'must be at most 8 for a quick count; start a run for more' }),
    nf: FlavorsSchema.optional(),
  })
  .strict()
