/**
 * The built app for benchmarks: a fresh database with the durable settings of the local
 * cluster, the server (.output) on a free port, accounts signed in through the API, and the
 * order statistics the benchmarks report.
 */
import { spawn } from 'node:child_process'
import { randomBytes } from 'node:crypto'
import { resolve } from 'node:path'
import knexFactory, { type Knex } from 'knex'
import { recreateLocalDatabase, localUrl } from '../../scripts/lib/postgres.mjs'
import { buildIfStale } from '../../scripts/lib/build.mjs'
import { freePortFrom } from '../../scripts/lib/pgPlace.mjs'
import { migrationSource } from '../../migrations/index'

const root = resolve(import.meta.dirname, '..', '..')

export function median(xs: number[]) {
  const s = [...xs].sort((a, b) => a - b)
  return s.length % 2 ? s[s.length >> 1]! : (s[s.length / 2 - 1]! + s[s.length / 2]!) / 2
}

/** The q-quantile of sorted values (nearest rank). */
export function quantile(sorted: number[], q: number) {
  return sorted[Math.min(sorted.length - 1, Math.ceil(q * sorted.length) - 1)]!
}

export async function waitHealthy(base: string) {
  for (let i = 0; i < 300; i++) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) return
    } catch {
      /* starting */
    }
    await new Promise((r) => setTimeout(r, 200))
  }
  throw new Error('bench server did not start')
}

/** Build when stale, make `database` afresh, migrate it and start the server on it. */
export async function startApp(database: string, env: Record<string, string> = {}) {
  buildIfStale()
  await recreateLocalDatabase(database)
  const url = localUrl(database)
  const db: Knex = knexFactory({ client: 'pg', connection: url })
  await db.migrate.latest({ migrationSource })
  const port = await freePortFrom(3601, 100, 3601)
  const server = spawn(process.execPath, ['.output/server/index.mjs'], {
    cwd: root,
    stdio: ['ignore', 'ignore', 'inherit'],
    env: { ...process.env, DATABASE_URL: url, PORT: String(port), HOST: '127.0.0.1', NUXT_SESSION_PASSWORD: randomBytes(32).toString('hex'), NODE_ENV: 'production', SCALEWRIGHT_DEMO: '0', ...env },
  })
  const base = `http://127.0.0.1:${port}`
  await waitHealthy(base)
  return {
    base,
    db,
    stop: async () => {
      server.kill('SIGTERM')
      await db.destroy()
    },
  }
}

/** A new account's session cookie (sign-up answered at once, or finished through the mailed link). */
export async function benchAccount(base: string, db: Knex, name: string): Promise<{ cookie: string; id: number }> {
  const email = `${name}-${randomBytes(4).toString('hex')}@example.test`
  const json = { 'content-type': 'application/json' }
  let res = await fetch(`${base}/api/auth/signup`, { method: 'POST', headers: json, body: JSON.stringify({ email, password: 'bench password 1', displayName: name }) })
  if (res.status === 202) {
    const mail = await db('outbox').where({ to_address: email }).first('text_body')
    const token = /\/welcome\/([A-Za-z0-9_-]+)/.exec(mail.text_body)![1]!
    res = await fetch(`${base}/api/auth/signup-confirm`, { method: 'POST', headers: json, body: JSON.stringify({ token }) })
  }
  if (res.status !== 201) throw new Error(`bench sign-up failed: ${res.status}`)
  return { cookie: res.headers.getSetCookie()[0]!.split(';')[0]!, id: ((await res.json()) as { user: { id: number } }).user.id }
}
