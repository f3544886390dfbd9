import { z } from 'zod'
import './zodMessages'

// The part of a JSON export that import reads back: which operator sits in which column.
const ImportOperator = z.object({
  text: z.string().max(400),
  column: z.enum(['kept', 'set_aside'], { error: 'must be "kept" or "set_aside"' }),
}).passthrough()
const ImportClass = z.object({ key: z.string().max(200), operators: z.array(ImportOperator).max(5000) }).passthrough()

export const IMPORT_MAX_BYTES = 8 * 1024 * 1024

// The top level is strict (the keys of a JSON export); inner objects may carry more.
export const ImportChoiceSchema = z.object({
  format: z.literal('scalewright-basis', { error: 'must be "scalewright-basis": this file is not a Scalewright basis export' }),
  formatVersion: z.literal(1, { error: 'must be 1, the only version this server reads' }),
  orders: z.array(z.object({ order: z.number().int(), classes: z.array(ImportClass).max(5000) }).passthrough()).max(64),
  theory: z.unknown().optional(),
  countingRule: z.string().optional(),
  note: z.string().optional(),
  exportedAt: z.string().optional(),
}).strict()
