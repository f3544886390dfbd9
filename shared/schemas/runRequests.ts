import { z } from 'zod'
import { TheorySchema } from './theory'

// Size limits live here, so one request cannot ask the server for unbounded work.
export const MAX_RUN_DIMENSION = { count: 16, basis: 8 } as const

// How the greedy choice of kept operators is steered (explicit-basis runs).
export const RunPrioritiesSchema = z.object({
  derivativesOn: z.array(z.string().regex(/^[A-Za-z][A-Za-z0-9_]{0,15}\*?$/, { error: 'priorities.derivativesOn: field names such as "H" or "H*"' })).max(40).optional(),
  preferHermitian: z.boolean({ error: 'priorities.preferHermitian must be true or false' }).optional(),
  keepFromBasis: z.number({ error: 'priorities.keepFromBasis: a basis id' }).int().positive().optional(),
}, { error: 'priorities must be an object' }).strict()

/** Highest power of 1/m of a heavy-frame run. */
export const MAX_HEAVY_ORDER = 4

export const RunCreateSchema = z.object({
  kind: z.enum(['count', 'basis'], { error: 'kind must be "count" or "basis"' }),
  maxDim: z.number({ error: 'maxDim: a whole number of mass dimension is required' }).int({ error: 'maxDim must be a whole number' })
    .min(5, { error: 'maxDim must be at least 5' }).max(16, { error: 'maxDim must be at most 16' }).optional(),
  // Order: the power of 1/m for a heavy-frame theory, dimension − 4 otherwise.
  maxOrder: z.number({ error: 'maxOrder: a whole number is required' }).int({ error: 'maxOrder must be a whole number' })
    .min(1, { error: 'maxOrder must be at least 1' }).max(12, { error: 'maxOrder must be at most 12' }).optional(),
  nf: z.number({ error: 'nf must be a number' }).int({ error: 'nf must be a whole number' }).min(1, { error: 'nf must be at least 1' }).max(6, { error: 'nf must be at most 6' }).optional(),
  priorities: RunPrioritiesSchema.optional(),
}).strict()
  .refine((r) => r.maxDim !== undefined || r.maxOrder !== undefined, { error: 'give maxDim (mass dimension) or maxOrder (order: power of 1/m in the heavy frame, dimension − 4 otherwise)', path: ['maxDim'] })
  .refine((r) => r.maxDim === undefined || r.maxDim <= MAX_RUN_DIMENSION[r.kind], { error: 'maxDim: an explicit basis run goes up to dimension 8', path: ['maxDim'] })

export const QuickCountSchema = z.object({
  theory: TheorySchema,
  maxDim: z.number({ error: 'maxDim: a whole number is required' }).int().min(5, { error: 'maxDim must be at least 5' })
    .max(8, { error: 'maxDim: quick counts go up to dimension 8; start a run for more' }),
  nf: z.number().int().min(1, { error: 'nf must be at least 1' }).max(6, { error: 'nf must be at most 6' }).optional(),
}).strict()
