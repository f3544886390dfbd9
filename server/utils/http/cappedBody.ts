import { readRawBody, type H3Event } from 'h3'
import { fail } from './apiHandler'

/**
 * The request body as text, counted while it arrives: past `maxBytes` reading stops at once and
 * the answer is 413 (the connection is cut a little after it), so neither a chunked body without
 * Content-Length nor a false one is ever held in memory beyond the cap.
 */
export async function readCappedText(event: H3Event, maxBytes: number): Promise<string> {
  const declared = Number(event.node.req.headers['content-length'] || 0)
  if (declared > maxBytes) tooLarge(event, maxBytes, declared)
  const req = event.node.req
  // A request made by the server's own page rendering (Nitro's local fetch) carries its body in
  // memory, not as a stream: it is already held, so read it as h3 does and check its size.
  if (bodyInMemory(event)) {
    const raw = (await readRawBody(event, 'utf8')) ?? ''
    if (Buffer.byteLength(raw) > maxBytes) tooLarge(event, maxBytes)
    return raw
  }
  if (req.readableEnded) return ''
  const chunks: Buffer[] = []
  let total = 0
  await new Promise<void>((resolve, reject) => {
    const onData = (chunk: Buffer) => {
      total += chunk.length
      if (total <= maxBytes) return void chunks.push(chunk)
      cleanup()
      req.pause() // a flowing stream without listeners would keep reading (and dropping)
      chunks.length = 0
      reject(new Error('over the cap'))
    }
    const onEnd = () => {
      cleanup()
      resolve()
    }
    const onError = (error: Error) => {
      cleanup()
      reject(error)
    }
    const cleanup = () => {
      req.off('data', onData)
      req.off('end', onEnd)
      req.off('error', onError)
    }
    req.on('data', onData).on('end', onEnd).on('error', onError)
  }).catch(() => tooLarge(event, maxBytes))
  return Buffer.concat(chunks).toString('utf8')
}

/** True when h3 would find the body already in memory (see readRawBody) rather than on a socket. */
function bodyInMemory(event: H3Event): boolean {
  const req = event.node.req as unknown as { body?: unknown; rawBody?: unknown }
  return Boolean((event as unknown as { _requestBody?: unknown })._requestBody || event.web?.request?.body || req.rawBody || req.body)
}

/** How long the rest of a refused body is read and thrown away before the connection is cut. */
const DRAIN_MS = 2000

function tooLarge(event: H3Event, maxBytes: number, declared?: number): never {
  const req = event.node.req
  // Nothing more is read until the 413 is sent, so the server holds at most the cap. Then the
  // rest is read and dropped for DRAIN_MS before the connection is cut: closing at once (as
  // "Connection: close" makes Node do) with the client still sending resets the connection,
  // and a reset can wipe the 413 from the client's buffer before it is read.
  event.node.res.once('finish', () => {
    req.resume()
    setTimeout(() => req.destroy(), DRAIN_MS).unref()
  })
  return fail(413, `Request body too large${declared ? `: ${declared} bytes` : ''}; the limit is ${maxBytes.toLocaleString('en')} bytes`)
}
