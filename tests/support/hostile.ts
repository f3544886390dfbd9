import { request } from 'node:http'

/** The tester's ladder: four parameters "9e9999"/7, powers 40, 8 orders (the 739-byte save). */
export function hostileLadder() {
  const names = ['a', 'b', 'c', 'd']
  const powers = Object.fromEntries(names.map((n) => [n, 40]))
  return {
    scales: [{ name: 'E', value: '1', unit: 'GeV' }],
    parameters: names.map((name) => ({ name, numerator: '9e9999', denominator: '7' })),
    orders: Array.from({ length: 8 }, (_, i) => ({ order: i + 1, powers })),
  }
}

/** The 95th percentile (nearest rank) of some durations. */
export function p95(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b)
  return sorted[Math.min(sorted.length - 1, Math.ceil(0.95 * sorted.length) - 1)]!
}

/** Milliseconds one request takes. */
export async function timed(run: () => Promise<unknown>): Promise<number> {
  const t = performance.now()
  await run()
  return performance.now() - t
}

/**
 * POST a chunked body (no Content-Length) of `totalBytes`, produced only as fast as the server
 * reads it; resolves with the status and how many bytes the server had taken when it answered.
 */
export function chunkedPost(baseUrl: string, path: string, totalBytes: number): Promise<{ status: number; sentBytes: number }> {
  const url = new URL(path, baseUrl)
  const chunk = Buffer.alloc(64 * 1024, 0x20)
  return new Promise((resolve, reject) => {
    let sent = 0
    let answered = false
    const req = request(url, { method: 'POST', headers: { 'content-type': 'application/json', 'transfer-encoding': 'chunked', origin: url.origin } }, (res) => {
      answered = true
      res.resume()
      resolve({ status: res.statusCode ?? 0, sentBytes: sent })
      req.destroy()
    })
    req.on('error', (e) => {
      if (!answered) reject(new Error(`no answer after ${sent} bytes: ${e.message}`))
    })
    const pump = () => {
      while (!answered && sent < totalBytes) {
        sent += chunk.length
        if (!req.write(chunk)) return void req.once('drain', pump)
      }
      if (!answered) req.end()
    }
    req.write('{"x":"')
    pump()
  })
}
