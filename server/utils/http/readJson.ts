import { readRawBody, getHeader, type H3Event } from 'h3'
import type { ZodType } from 'zod'
import { fail } from './apiHandler'

export const MAX_BODY_BYTES = 512 * 1024

/**
 * Read the JSON body and validate it with a zod schema. Malformed JSON → 400, oversized → 413,
 * schema failure → ZodError (mapped to 400 with the field named). Nothing is written before this.
 */
export async function readJson<T>(event: H3Event, schema: ZodType<T>, maxBytes = MAX_BODY_BYTES): Promise<T> {
  const declared = Number(getHeader(event, 'content-length') || 0)
  if (declared > maxBytes) fail(413, `Request body too large: ${declared} bytes, the limit is ${maxBytes}`)
  const raw = await readRawBody(event, 'utf8')
  if (raw && Buffer.byteLength(raw) > maxBytes) fail(413, `Request body too large: the limit is ${maxBytes} bytes`)
  let value: unknown = {}
  if (raw && raw.trim()) {
    try {
      value = JSON.parse(raw)
    } catch {
      fail(400, 'Request body is not valid JSON')
    }
  }
  return schema.parse(value)
}

/** A positive integer route parameter, or 400. */
export function intParam(event: H3Event, name: string): number {
  const raw = event.context.params?.[name]
  const n = Number(raw)
  if (!raw || !Number.isSafeInteger(n) || n <= 0) fail(400, `${name}: expected a positive integer, got "${raw}"`)
  return n
}
