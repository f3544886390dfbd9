import { getRequestHeader, type H3Event } from 'h3'

/** Whether the client takes gzip (RFC 9110 §12.5.3: listed, or via "*", and not with q=0). */
export function acceptsGzip(event: H3Event): boolean {
  const header = getRequestHeader(event, 'accept-encoding')
  if (!header) return false
  let star = false
  for (const part of header.toLowerCase().split(',')) {
    const [coding, ...params] = part
      .trim()
      .split(';')
      .map((s) => s.trim())
    const q = params.find((p) => p.startsWith('q='))
    const refused = q !== undefined && Number(q.slice(2)) === 0
    if (coding === 'gzip' || coding === 'x-gzip') return !refused
    if (coding === '*') star = !refused
  }
  return star
}
