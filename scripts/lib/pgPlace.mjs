// Where a local PostgreSQL cluster of this checkout lives and which port it takes. The data
// directory must be owned by the OS user that runs the server (`postgres` when we are root)
// and every folder above it must be traversable by that user: a checkout in /root cannot hold
// it, so the cluster then goes under /var/lib/scalewright/<checkout id>/.
import { createHash } from 'node:crypto'
import { spawnSync } from 'node:child_process'
import { chmodSync, existsSync, mkdirSync, readFileSync, realpathSync, writeFileSync } from 'node:fs'
import { createServer } from 'node:net'
import { join, resolve } from 'node:path'

export const root = resolve(import.meta.dirname, '..', '..')
export const isRoot = process.getuid?.() === 0
const SHARED_BASE = '/var/lib/scalewright'
// Derived ports fall in 54400–55399, away from PostgreSQL's 5432 and the old fixed 54329.
const PORT_BASE = 54400
const PORT_SPAN = 1000

/** A short stable id of this checkout (its real path), used for ports and shared folders. */
export function checkoutId() {
  return createHash('sha256').update(realpathSync(root)).digest('hex').slice(0, 12)
}

/** True when the `postgres` OS user can reach `dir` (every parent folder traversable). */
function serverUserCanEnter(dir) {
  if (!isRoot) return true
  return spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-x', dir]).status === 0
}

/**
 * The data directory of the cluster `name` ('main' for `npm start` and tests, 'faults' for the
 * fault suite). SCALEWRIGHT_PG_DATA overrides the main one.
 */
export function dataDirFor(name) {
  if (name === 'main' && process.env.SCALEWRIGHT_PG_DATA) return resolve(process.env.SCALEWRIGHT_PG_DATA)
  const inCheckout = join(root, name === 'main' ? '.pgdata' : `.pgdata-${name}`)
  if (serverUserCanEnter(root)) return inCheckout
  const base = join(SHARED_BASE, checkoutId())
  mkdirSync(base, { recursive: true })
  // Traversable by the postgres user whatever the umask (the cluster folder itself is 0700).
  for (const dir of [SHARED_BASE, base]) chmodSync(dir, 0o755)
  // Say whose folder this is, for whoever looks at /var/lib/scalewright later.
  const note = join(base, 'CHECKOUT')
  if (!existsSync(note)) writeFileSync(note, `${realpathSync(root)}\n`)
  return join(base, name)
}

/** The port of a running cluster, from its postmaster.pid (line 4), or null. */
export function runningPort(dataDir) {
  const pidFile = join(dataDir, 'postmaster.pid')
  if (!existsSync(pidFile)) return null
  const port = Number(readFileSync(pidFile, 'utf8').split('\n')[3])
  return Number.isInteger(port) && port > 0 ? port : null
}

/** The postmaster's process id from postmaster.pid, or null. */
export function postmasterPid(dataDir) {
  const pidFile = join(dataDir, 'postmaster.pid')
  if (!existsSync(pidFile)) return null
  const pid = Number(readFileSync(pidFile, 'utf8').split('\n')[0])
  return Number.isInteger(pid) && pid > 0 ? pid : null
}

export function portIsFree(port, host = '127.0.0.1') {
  return new Promise((resolvePromise) => {
    const server = createServer()
    server.once('error', () => resolvePromise(false))
    server.listen({ port, host, exclusive: true }, () => server.close(() => resolvePromise(true)))
  })
}

/** The first free port from `start` on (wrapping within `span`). */
export async function freePortFrom(start, span = PORT_SPAN, base = PORT_BASE) {
  for (let i = 0; i < span; i++) {
    const port = base + ((start - base + i) % span)
    if (await portIsFree(port)) return port
  }
  throw new Error(`no free port in ${base}–${base + span - 1}`)
}

/** The port this checkout's cluster `name` prefers: derived from the checkout path. */
export function derivedPort(name) {
  const h = createHash('sha256')
    .update(`${realpathSync(root)}\0${name}`)
    .digest()
  return PORT_BASE + (h.readUInt32BE(0) % PORT_SPAN)
}

/**
 * The port to start the cluster on: SCALEWRIGHT_PG_PORT for the main cluster when set (other
 * checkouts and helpers rely on it), else the derived port or the next free one after it.
 */
export async function portToStart(name) {
  if (name === 'main' && process.env.SCALEWRIGHT_PG_PORT) return Number(process.env.SCALEWRIGHT_PG_PORT)
  return freePortFrom(derivedPort(name))
}
