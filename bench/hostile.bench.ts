/**
 * Issue 12's hostile work, old path against new, in this process (no database): the event-loop
 * block of the tester's ladder (new path only: the old one is a budget-free engine), threads and memory under 20 parallel quick counts, memory under
 * 10 chunked 50 MB bodies. "before" runs the code the routes used to call (computeLadder on the
 * loop, one thread per count, h3's readRawBody); "after" the compute pool and the streaming cap.
 */
import { readFileSync } from 'node:fs'
import { createServer, request } from 'node:http'
import { createApp, defineEventHandler, readRawBody, toNodeListener } from 'h3'
import { compute } from '../server/utils/compute/computePool'
import { startEngineTask } from '../server/worker/engineTask'
import { readCappedText } from '../server/utils/http/cappedBody'
import { SMALL_THEORY } from '../tests/support/fixtures'
import { hostileLadder } from '../tests/support/hostile'
import { longestStallDuring } from './support/timing'

const threads = () => Number(/Threads:\s+(\d+)/.exec(readFileSync('/proc/self/status', 'utf8'))![1])
const mb = (bytes: number) => Math.round(bytes / 2 ** 20)

/** Peak threads and RSS growth while `work` runs (sampled every 20 ms). */
async function peakOf(work: () => Promise<unknown>) {
  const rss0 = process.memoryUsage().rss
  let peakThreads = threads()
  let peakRss = rss0
  const timer = setInterval(() => {
    peakThreads = Math.max(peakThreads, threads())
    peakRss = Math.max(peakRss, process.memoryUsage().rss)
  }, 20)
  await work()
  clearInterval(timer)
  return { peakThreads, rssGrowthMB: mb(peakRss - rss0) }
}

/** The tester's ladder through the route's path (the compute pool). Before the fix it ran on the loop: 4.6 s per order here, see the report. */
async function ladderBlock() {
  const doc = hostileLadder()
  const after = await longestStallDuring(() => compute('ladder', doc as never, 'bench'))
  const refusal = await compute('ladder', doc as never, 'bench').then(
    () => '',
    (e: Error) => e.message.slice(0, 90),
  )
  return { after_block_ms: after, refusal }
}

async function quickCounts() {
  const theory = (i: number) => ({ ...SMALL_THEORY, name: `bench ${i}` })
  const base = threads()
  // The new path first, so that the old path's 20 ending threads cannot count for it.
  const after = await peakOf(() => Promise.allSettled(Array.from({ length: 20 }, (_, i) => compute('quickCount', { theory: theory(i), maxDim: 7 }, `user-${i}`))))
  await new Promise((r) => setTimeout(r, 2000))
  const before = await peakOf(() => Promise.all(Array.from({ length: 20 }, (_, i) => startEngineTask({ kind: 'count', theory: theory(i), maxDim: 7 }, () => {}).result)))
  return { threads_at_rest: base, before, after }
}

async function chunkedBodies(read: (event: never) => Promise<unknown>) {
  const app = createApp().use(
    '/',
    defineEventHandler(async (event) => {
      await read(event as never).catch(() => undefined)
      return 'done'
    }),
  )
  const server = createServer(toNodeListener(app)).listen(0)
  const port = (server.address() as { port: number }).port
  const one = () =>
    new Promise<void>((resolve) => {
      const chunk = Buffer.alloc(64 * 1024, 0x20)
      let sent = 0
      let done = false
      const req = request({ port, method: 'POST', headers: { 'transfer-encoding': 'chunked' } }, (res) => {
        done = true
        res.resume()
        req.destroy()
        resolve()
      })
      req.on('error', () => {
        done = true
        resolve()
      })
      const pump = () => {
        while (!done && sent < 50 * 2 ** 20) {
          sent += chunk.length
          if (!req.write(chunk)) return void req.once('drain', pump)
        }
        if (!done) req.end()
      }
      pump()
    })
  const figures = await peakOf(() => Promise.all(Array.from({ length: 10 }, one)))
  server.close()
  return figures
}

export default async function () {
  return {
    ladder_event_loop_block: await ladderBlock(),
    quick_counts_20_parallel: await quickCounts(),
    chunked_10x50MB_after: await chunkedBodies((e) => readCappedText(e, 512 * 1024)),
    chunked_10x50MB_before: await chunkedBodies((e) => readRawBody(e, 'utf8')),
  }
}
