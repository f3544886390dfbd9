import { z } from 'zod'
import './zodMessages'
import { TheorySchema } from './theory'

// Requests that carry a theory file; the file itself is validated by TheorySchema.
export const TheoryCreateSchema = z.object({ definition: TheorySchema }).strict()

export const TheoryUpdateSchema = z
  .object({
    definition: TheorySchema,
    version: z.number({ error: 'is required (it guards against lost updates)' }).int({ error: 'must be a whole number' }).positive({ error: 'must be positive' }),
  })
  .strict()

const NoteSchema = z.string({ error: 'is required: write the note' }).trim().min(1, { error: 'is empty: write the note' }).max(10_000, { error: 'must have at most 10000 characters' })

// Notes are capped so that one member cannot bloat a board (every note is part of its data).
export const NOTES_PER_TARGET = 100 // on one operator, or on the theory itself
export const NOTES_PER_AUTHOR = 500 // by one member on one theory

export const AnnotationCreateSchema = z
  .object({
    body: NoteSchema,
    operatorId: z.number().int().positive().optional(),
  })
  .strict()

export const AnnotationUpdateSchema = z
  .object({
    body: NoteSchema,
  })
  .strict()
