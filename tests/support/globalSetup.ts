import { spawn, type ChildProcess } from 'node:child_process'
import { randomBytes } from 'node:crypto'
import { existsSync } from 'node:fs'
import { resolve } from 'node:path'
import type { TestProject } from 'vitest/node'
import knexFactory from 'knex'
import { recreateLocalDatabase, localUrl } from '../../scripts/lib/postgres.mjs'
import { freePortFrom } from '../../scripts/lib/pgPlace.mjs'
import { migrationSource } from '../../migrations/index'

// One real server per test project, on its own fresh database (api and e2e never share rows).
// SCALEWRIGHT_TEST_PORT fixes their ports (api, api + 1); unset, each takes a free port, so
// two checkouts can test side by side.
const FIXED_PORT = Number(process.env.SCALEWRIGHT_TEST_PORT || 0)
const OFFSETS: Record<string, number> = { api: 0, e2e: 1 }
const root = resolve(import.meta.dirname, '..', '..')

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string
    databaseUrl: string
  }
}

async function waitHealthy(url: string, server: ChildProcess) {
  const until = Date.now() + 60_000
  while (Date.now() < until) {
    if (server.exitCode !== null) throw new Error(`test server exited with ${server.exitCode}`)
    try {
      if ((await fetch(`${url}/api/health`)).ok) return
    } catch {
      /* not yet listening */
    }
    await new Promise((r) => setTimeout(r, 200))
  }
  throw new Error('test server did not become healthy within 60 s')
}

export default async function setup(project: TestProject) {
  if (!existsSync(resolve(root, '.output/server/index.mjs'))) throw new Error('No built app: run `npm test` (it builds first) or `npx nuxt build`')
  const name = project.name
  const database = `scalewright_test_${name}`
  // Test rows are throwaway: these databases alone skip waiting for the disk at commit.
  if (!process.env.DATABASE_URL) await recreateLocalDatabase(database, { throwaway: true })
  const databaseUrl = process.env.DATABASE_URL ? `${process.env.DATABASE_URL.replace(/\/[^/]*$/, '')}/${database}` : localUrl(database)
  const db = knexFactory({ client: 'pg', connection: databaseUrl })
  await db.migrate.latest({ migrationSource })
  await db.destroy()
  const offset = OFFSETS[name] ?? 2
  const from = 3101 + 50 * offset // api searches 3101–3150, e2e 3151–3200: never the same port
  const port = FIXED_PORT ? FIXED_PORT + offset : await freePortFrom(from, 50, from)
  const baseUrl = `http://127.0.0.1:${port}`
  const server = spawn(process.execPath, ['.output/server/index.mjs'], {
    cwd: root,
    env: {
      ...process.env,
      DATABASE_URL: databaseUrl,
      HOST: '127.0.0.1',
      PORT: String(port),
      NUXT_PUBLIC_APP_URL: baseUrl,
      NUXT_SESSION_PASSWORD: randomBytes(32).toString('hex'),
      SCALEWRIGHT_DEMO: '0',
      SMTP_URL: '',
      NODE_ENV: 'production',
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  })
  await waitHealthy(baseUrl, server)
  const worker = spawn(process.execPath, ['--import', 'tsx', 'scripts/worker.ts'], {
    cwd: root,
    env: { ...process.env, DATABASE_URL: databaseUrl },
    stdio: ['ignore', 'ignore', 'inherit'],
  })
  project.provide('baseUrl', baseUrl)
  project.provide('databaseUrl', databaseUrl)
  return async () => {
    server.kill('SIGTERM')
    worker.kill('SIGTERM')
  }
}
