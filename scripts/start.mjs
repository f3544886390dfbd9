// `npm start`: local PostgreSQL (unless DATABASE_URL), migrations, build when stale, then the
// app on http://127.0.0.1:3000 with the demo group seeded into an empty database.
import { ensureLocalPostgres, localUrl } from './lib/postgres.mjs'
import { buildIfStale } from './lib/build.mjs'
import { sessionSecret } from './lib/secret.mjs'
import { runMigrations, startServer, startWorker, waitForHealth } from './lib/run.mjs'
import { DEMO_ADMIN, DEMO_MEMBERS, DEMO_PASSWORD } from '../seeds/demoPeople.ts'

const host = process.env.HOST || '127.0.0.1'
const port = Number(process.env.PORT || 3000)
if (!process.env.DATABASE_URL) await ensureLocalPostgres(['scalewright'])
const env = {
  ...process.env,
  DATABASE_URL: process.env.DATABASE_URL || localUrl('scalewright'),
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
// One queue worker beside the server; run `npm run worker` elsewhere for more capacity.
const worker = startWorker(env)
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => { server.kill(signal); worker.kill(signal) })
server.on('exit', (code) => { worker.kill('SIGTERM'); process.exit(code ?? 0) })
worker.on('exit', (code) => { if (code) console.error(`[start] the worker exited with ${code}; runs wait until one is started (npm run worker)`) })
await waitForHealth(env.NUXT_PUBLIC_APP_URL, { demo: env.SCALEWRIGHT_DEMO === '1' })
console.log(`\nScalewright is running at ${env.NUXT_PUBLIC_APP_URL}`)
console.log(`Demo accounts (password "${DEMO_PASSWORD}"): ${[DEMO_ADMIN, ...DEMO_MEMBERS].map((u) => u.email).join(', ')}\n`)
