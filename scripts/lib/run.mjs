// Small process helpers shared by the start and test scripts.
import { spawn, spawnSync } from 'node:child_process'
import { resolve } from 'node:path'

export const root = resolve(import.meta.dirname, '..', '..')

export function runMigrations(env) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/migrate.ts'], { cwd: root, env, stdio: 'inherit' })
  if (r.status !== 0) throw new Error('migrations failed')
}

export function startServer(env) {
  return spawn(process.execPath, ['.output/server/index.mjs'], { cwd: root, env, stdio: ['ignore', 'inherit', 'inherit'] })
}

/** Poll /api/health until the server answers (and, if asked, the demo is seeded). */
export async function waitForHealth(baseUrl, { demo = false, timeoutMs = 60_000 } = {}) {
  const until = Date.now() + timeoutMs
  let last = ''
  while (Date.now() < until) {
    try {
      const res = await fetch(`${baseUrl}/api/health`, { signal: AbortSignal.timeout(2000) })
      if (res.ok) {
        const body = await res.json()
        if (!demo || body.demo === 'ready') return body
        if (body.demo === 'failed') throw new Error('demo seeding failed; see the server log')
        last = `demo ${body.demo}`
      } else last = `HTTP ${res.status}`
    } catch (e) {
      if (String(e).includes('demo seeding failed')) throw e
      last = String(e)
    }
    await new Promise((r) => setTimeout(r, 250))
  }
  throw new Error(`server at ${baseUrl} not healthy within ${timeoutMs / 1000}s (${last})`)
}

/** A queue worker process (`npm run worker`) beside the server. */
export function startWorker(env) {
  return spawn(process.execPath, ['--import', 'tsx', 'scripts/worker.ts'], { cwd: root, env, stdio: ['ignore', 'inherit', 'inherit'] })
}
