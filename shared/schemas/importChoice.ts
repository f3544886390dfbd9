import { z } from 'zod'
import './zodMessages'

// The part of a JSON export that import reads back: which operator sits in which column, at
// which place, and the tags and notes it carries (with their authors and dates). Whether a
// tag or note can be taken over is decided on the server; what cannot is listed in the reply.
const ImportTag = z
  .object({
    kind: z.string({ error: 'each tag needs a kind (text)' }).max(40, { error: 'a tag kind has at most 40 characters' }),
    label: z.string({ error: 'a tag label must be text' }).max(400, { error: 'a tag label has at most 400 characters' }).optional(),
    author: z.string({ error: 'an author must be text' }).max(200).nullable().optional(),
    authorId: z.number({ error: 'must be a number' }).int().nullable().optional(),
    createdAt: z.string({ error: 'must be a date as text' }).max(40).nullable().optional(),
  })
  .passthrough()

const ImportNote = z
  .object({
    body: z.string({ error: 'each note needs its text (body)' }).max(20_000, { error: 'a note has at most 20000 characters' }),
    author: z.string({ error: 'an author must be text' }).max(200).nullable().optional(),
    authorId: z.number({ error: 'must be a number' }).int().nullable().optional(),
    createdAt: z.string({ error: 'must be a date as text' }).max(40).optional(),
  })
  .passthrough()

const ImportOperator = z
  .object({
    text: z.string().max(400),
    column: z.enum(['kept', 'set_aside'], { error: 'must be "kept" or "set_aside"' }),
    position: z.number({ error: 'must be the place in the column, a whole number from 0' }).int().min(0).max(1_000_000).optional(),
    tags: z.array(ImportTag).max(200, { error: 'at most 200 tags per operator' }).optional(),
    notes: z.array(ImportNote).max(1000, { error: 'at most 1000 notes per operator' }).optional(),
  })
  .passthrough()
const ImportClass = z.object({ key: z.string().max(200), operators: z.array(ImportOperator).max(5000) }).passthrough()

export const IMPORT_MAX_BYTES = 8 * 1024 * 1024

// The top level is strict (the keys of a JSON export); inner objects may carry more.
export const ImportChoiceSchema = z
  .object({
    format: z.literal('scalewright-basis', { error: 'must be "scalewright-basis": this file is not a Scalewright basis export' }),
    formatVersion: z.literal(1, { error: 'must be 1, the only version this server reads' }),
    orders: z.array(z.object({ order: z.number().int(), classes: z.array(ImportClass).max(5000) }).passthrough()).max(64),
    theory: z.unknown().optional(),
    countingRule: z.string().optional(),
    note: z.string().optional(),
    exportedAt: z.string().optional(),
  })
  .strict()

export type ImportChoice = z.infer<typeof ImportChoiceSchema>
export type ImportedOperator = z.infer<typeof ImportOperator>
