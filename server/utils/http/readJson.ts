import type { H3Event } from 'h3'
import { readCappedText } from './cappedBody'
import type { ZodType } from 'zod'
import { fail } from './apiHandler'
import { describeZodError } from '../../../shared/schemas/describeZodError'
import { nulPlace, nulMessage } from './nulText'

export const MAX_BODY_BYTES = 512 * 1024

/**
 * Read the JSON body (counted as it streams in, see cappedBody.ts; 413 before more than the cap
 * is held) and validate it with a zod schema. Malformed JSON → 400, oversized → 413, a NUL
 * character in any text → 400, schema failure → 400 naming each field at fault in the user's
 * words (the body supplies the names of list entries, e.g. field 3 "phi"). Nothing is written
 * before this.
 */
export async function readJson<T>(event: H3Event, schema: ZodType<T>, maxBytes = MAX_BODY_BYTES): Promise<T> {
  const raw = await readCappedText(event, maxBytes)
  let value: unknown = {}
  if (raw && raw.trim()) {
    try {
      value = JSON.parse(raw)
    } catch {
      fail(400, 'Request body is not valid JSON')
    }
  }
  const nul = nulPlace(value)
  if (nul) fail(400, nulMessage(nul, value))
  const parsed = schema.safeParse(value)
  if (!parsed.success) fail(400, describeZodError(parsed.error, value))
  return parsed.data
}

/** A positive integer route parameter, or 400. */
export function intParam(event: H3Event, name: string): number {
  const raw = event.context.params?.[name]
  const n = Number(raw)
  if (!raw || !Number.isSafeInteger(n) || n <= 0) fail(400, `This address is not valid: "${raw ?? ''}" should be a positive whole number`)
  return n
}
