// Debian's pg_dump and pg_restore (package postgresql-client, installed with the server), and
// the database named in a connection URL.
import { existsSync } from 'node:fs'
import { join } from 'node:path'
import { serverBinDir } from './pgCluster.mjs'

/** The path of a PostgreSQL client program: beside the server binaries, else on PATH. */
export function pgTool(name) {
  const inBin = join(serverBinDir(), name)
  return existsSync(inBin) ? inBin : name
}

/** The URL with another database name (same server, user and password). */
export function withDatabase(url, database) {
  const u = new URL(url)
  u.pathname = `/${database}`
  return u.toString()
}

export function databaseOf(url) {
  return decodeURIComponent(new URL(url).pathname.slice(1))
}

/** A URL for printing: the password hidden. */
export function shown(url) {
  const u = new URL(url)
  if (u.password) u.password = '***'
  return u.toString()
}

export function quoteIdent(name) {
  return `"${name.replaceAll('"', '""')}"`
}

export function timestamp(date = new Date()) {
  return date.toISOString().replace(/[-:]/g, '').replace('T', '-').slice(0, 15)
}
