import { z } from 'zod'
import { TheorySchema } from './theory'

// Requests that carry a theory file; the file itself is validated by TheorySchema.
export const TheoryCreateSchema = z.object({ definition: TheorySchema }).strict()

export const TheoryUpdateSchema = z.object({
  definition: TheorySchema,
  version: z.number({ error: 'version: the version you edited is required (it guards against lost updates)' }).int().positive(),
}).strict()

export const AnnotationCreateSchema = z.object({
  body: z.string({ error: 'body: the note text is required' }).trim().min(1, { error: 'body: the note is empty' }).max(10_000, { error: 'body: at most 10000 characters' }),
  operatorId: z.number().int().positive().optional(),
}).strict()

export const AnnotationUpdateSchema = z.object({
  body: z.string({ error: 'body: the note text is required' }).trim().min(1, { error: 'body: the note is empty' }).max(10_000, { error: 'body: at most 10000 characters' }),
}).strict()
