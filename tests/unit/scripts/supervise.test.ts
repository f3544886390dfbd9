import { describe, it, expect } from 'vitest'
import { spawn } from 'node:child_process'
import { supervise, describeExit } from '../../../scripts/lib/supervise.mjs'

// npm start's supervisor (scripts/lib/supervise.mjs) with real child processes.
const node = (code: string) => () => spawn(process.execPath, ['-e', code], { stdio: 'ignore' })
const until = async (check: () => boolean, ms = 10_000) => {
  const end = Date.now() + ms
  while (!check()) {
    if (Date.now() > end) throw new Error('timed out')
    await new Promise((r) => setTimeout(r, 20))
  }
}

describe('the worker supervisor', () => {
  it('restarts a child that keeps dying, saying why, with a doubling delay', async () => {
    const lines: string[] = []
    const s = supervise('worker', node('process.exit(3)'), { log: (l: string) => lines.push(l), firstDelayMs: 50, maxDelayMs: 200 })
    await until(() => s.state.restarts >= 4)
    await s.stop()
    expect(lines[0]).toMatch(/^\[supervisor\] the worker \(pid \d+\) stopped: exited with code 3; restarting it in 0\.05 s$/)
    expect(lines.slice(0, 4).map((l) => l.match(/in ([\d.]+) s$/)![1])).toEqual(['0.05', '0.1', '0.2', '0.2'])
    expect(new Set(s.state.pids).size).toBe(s.state.pids.length)
  })

  it('names a kill -9, and stops for good when asked', async () => {
    const lines: string[] = []
    const s = supervise('worker', node('setInterval(() => {}, 1000)'), { log: (l: string) => lines.push(l), firstDelayMs: 50 })
    await until(() => s.pid !== undefined)
    const first = s.pid!
    process.kill(first, 'SIGKILL')
    await until(() => s.state.restarts === 1)
    expect(lines).toEqual([`[supervisor] the worker (pid ${first}) stopped: killed by SIGKILL (kill -9, or the system ran out of memory); restarting it in 0.05 s`])
    await s.stop()
    await new Promise((r) => setTimeout(r, 200))
    expect(s.state.restarts).toBe(1)
    expect(lines).toHaveLength(1)
  })

  it('describes exits in words', () => {
    expect(describeExit(1, null)).toBe('exited with code 1')
    expect(describeExit(null, 'SIGTERM')).toBe('killed by SIGTERM')
  })
})
