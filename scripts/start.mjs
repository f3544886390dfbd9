// `npm start`: local PostgreSQL (unless DATABASE_URL), migrations, build when stale, then the
// app (port 3000, or the next free one; printed) with the demo group seeded into an empty
// database, and one supervised queue worker beside it.
import { appDatabaseUrl } from './lib/postgres.mjs'
import { buildIfStale } from './lib/build.mjs'
import { sessionSecret } from './lib/secret.mjs'
import { freePortFrom, portIsFree } from './lib/pgPlace.mjs'
import { runMigrations, startServer, startWorker, waitForHealth } from './lib/run.mjs'
import { supervise } from './lib/supervise.mjs'
import { DEMO_ADMIN, DEMO_MEMBERS, DEMO_PASSWORD } from '../seeds/demoPeople.ts'

const host = process.env.HOST || '127.0.0.1'
const port = await appPort()
const env = {
  ...process.env,
  DATABASE_URL: await appDatabaseUrl(),
  NUXT_SESSION_PASSWORD: sessionSecret(),
  NUXT_PUBLIC_APP_URL: process.env.NUXT_PUBLIC_APP_URL || `http://${host}:${port}`,
  SCALEWRIGHT_DEMO: process.env.SCALEWRIGHT_DEMO ?? '1',
  HOST: host,
  PORT: String(port),
  NODE_ENV: 'production',
}
runMigrations(env)
buildIfStale()
const server = startServer(env)
// One queue worker beside the server, restarted whenever it dies; `npm run worker` on any
// machine that reaches the database adds more.
const worker = supervise('worker', () => startWorker(env))
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, () => {
    server.kill(signal)
    void worker.stop(signal)
  })
}
server.on('exit', (code) => {
  void worker.stop().then(() => process.exit(code ?? 0))
})
await waitForHealth(env.NUXT_PUBLIC_APP_URL, { demo: env.SCALEWRIGHT_DEMO === '1' })
console.log(`\nScalewright is running at ${env.NUXT_PUBLIC_APP_URL}`)
console.log(`Demo accounts (password "${DEMO_PASSWORD}"): ${[DEMO_ADMIN, ...DEMO_MEMBERS].map((u) => u.email).join(', ')}\n`)

/** PORT when set (it must be free), else 3000 or the next free port after it. */
async function appPort() {
  if (process.env.PORT) {
    const asked = Number(process.env.PORT)
    if (!(await portIsFree(asked, host))) throw new Error(`PORT ${asked} is in use on ${host}: stop what listens there or choose another PORT`)
    return asked
  }
  const chosen = await freePortFrom(3000, 100, 3000)
  if (chosen !== 3000) console.log(`[start] port 3000 is in use; the app takes ${chosen}`)
  return chosen
}
