import { spawn, type ChildProcess } from 'node:child_process'
import { mkdirSync, writeFileSync } from 'node:fs'
import { join, resolve } from 'node:path'
import knexFactory, { type Knex } from 'knex'
import { LocalCluster } from '../../../scripts/lib/pgCluster.mjs'
import { freePortFrom } from '../../../scripts/lib/pgPlace.mjs'
import { ApiClient, uniqueEmail, TEST_PASSWORD } from '../../support/client'
import { SMALL_THEORY } from '../../support/fixtures'

const root = resolve(import.meta.dirname, '..', '..', '..')

/**
 * The fault suite's own cluster, never the one of `npm start` or the other tests: it is
 * killed and stopped on purpose. Durable settings (as `npm start` has them) unless
 * FAULTS_PG_SETTINGS=fast asks for the old, unsafe ones to show what they lose.
 */
export function faultsCluster() {
  return new LocalCluster('faults', process.env.FAULTS_PG_SETTINGS === 'fast' ? 'fast' : 'durable')
}

export interface Stack {
  cluster: LocalCluster
  db: Knex
  baseUrl: string
  databaseUrl: string
  app: ChildProcess
  /** Everything `npm start` printed so far. */
  log: () => string
  stop: () => Promise<void>
}

/**
 * `npm start` itself (scripts/start.mjs: migrations, the built server, one supervised worker)
 * against a fresh database `scalewright_faults_<name>` of the fault cluster, on a free port.
 */
export async function startStack(name: string): Promise<Stack> {
  const cluster = faultsCluster()
  const database = `scalewright_faults_${name}`
  await cluster.recreateDatabase(database)
  cluster.lastPort = cluster.port() // restarts after a crash come back on the same port
  const databaseUrl = cluster.url(database)
  const port = await freePortFrom(3301, 100, 3301)
  const baseUrl = `http://127.0.0.1:${port}`
  let output = ''
  const app = spawn(process.execPath, ['--import', 'tsx', 'scripts/start.mjs'], {
    cwd: root,
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: { ...process.env, DATABASE_URL: databaseUrl, PORT: String(port), HOST: '127.0.0.1', SCALEWRIGHT_DEMO: '0', SMTP_URL: '', NUXT_PUBLIC_APP_URL: baseUrl },
  })
  app.stdout!.on('data', (b) => {
    output += b
  })
  app.stderr!.on('data', (b) => {
    output += b
  })
  await waitUntil(
    async () => (await fetch(`${baseUrl}/api/health`).catch(() => null))?.ok === true,
    120_000,
    () => `npm start did not serve: ${output.slice(-2000)}`,
  )
  const db = knexFactory({ client: 'pg', connection: databaseUrl, pool: { min: 0, max: 2 } })
  return {
    cluster,
    db,
    baseUrl,
    databaseUrl,
    app,
    log: () => output,
    async stop() {
      // What npm start printed, for reading after a failure.
      mkdirSync(join(root, 'test-results'), { recursive: true })
      writeFileSync(join(root, 'test-results', `faults-${name}.log`), output)
      await db.destroy()
      if (app.exitCode === null) {
        const exited = new Promise((r) => app.once('exit', r))
        process.kill(-app.pid!, 'SIGTERM')
        await Promise.race([exited, new Promise((r) => setTimeout(r, 10_000))])
        if (app.exitCode === null) process.kill(-app.pid!, 'SIGKILL')
      }
    },
  }
}

export async function waitUntil(check: () => Promise<boolean> | boolean, timeoutMs: number, describe: () => string) {
  const end = Date.now() + timeoutMs
  while (Date.now() < end) {
    if (await check()) return
    await new Promise((r) => setTimeout(r, 200))
  }
  throw new Error(describe())
}

/** A signed-up owner (through the mailed link, read from the stack's outbox) of a new group with one small theory. */
export async function groupWithTheory(stack: Pick<Stack, 'baseUrl' | 'db'>) {
  const owner = new ApiClient(stack.baseUrl)
  const email = uniqueEmail('faults')
  const signup = await owner.post('/api/auth/signup', { email, password: TEST_PASSWORD, displayName: 'Fault tester' })
  if (signup.status !== 202) throw new Error(`signup failed ${JSON.stringify(signup.body)}`)
  const mail = await stack.db('outbox').where({ to_address: email }).andWhere('text_body', 'like', '%/welcome/%').first('text_body')
  const token = /\/welcome\/([A-Za-z0-9_-]{40,})/.exec(mail?.text_body ?? '')?.[1]
  if (!token) throw new Error(`no sign-up link mailed to ${email}`)
  if ((await owner.post('/api/auth/signup-confirm', { token })).status !== 201) throw new Error('signup confirmation failed')
  const slug = `faults-${Date.now().toString(36)}`
  if ((await owner.post('/api/groups', { slug, name: `Group ${slug}` })).status !== 201) throw new Error('group create failed')
  const t = await owner.post(`/api/groups/${slug}/theories`, { definition: { ...SMALL_THEORY, name: `T-${slug}` } })
  if (t.status !== 201) throw new Error(`theory create failed ${JSON.stringify(t.body)}`)
  return { owner, slug, theoryId: t.body.theory.id as number }
}
