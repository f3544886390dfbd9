// The project-local PostgreSQL that `npm start` and `npm test` use when DATABASE_URL is unset:
// Debian's server (installed when missing), one durable cluster per checkout (fsync,
// full_page_writes and synchronous_commit on), its folder and port chosen and printed by
// scripts/lib/pgPlace.mjs. DATABASE_URL, when set, replaces all of this.
import { LocalCluster, PG_USER, PG_PASSWORD } from './pgCluster.mjs'

export { PG_USER, PG_PASSWORD, LocalCluster }

export const mainCluster = new LocalCluster('main', 'durable')

/** URL of a database of the project-local cluster. */
export function localUrl(database) {
  return mainCluster.url(database)
}

/** Ensure the local cluster runs and the given databases exist. */
export async function ensureLocalPostgres(databases) {
  await mainCluster.ensure(databases)
}

/**
 * Drop and re-create a database of the local cluster. Tests pass `throwaway: true`: that
 * database alone commits without waiting for the disk (see LocalCluster.recreateDatabase).
 */
export async function recreateLocalDatabase(db, options = {}) {
  await mainCluster.recreateDatabase(db, options)
}

/** Stop the local cluster (`npm run db:down`). */
export function stopLocalPostgres() {
  mainCluster.stop()
}

/** DATABASE_URL when set, else the local cluster's `scalewright` database (started if need be). */
export async function appDatabaseUrl() {
  if (process.env.DATABASE_URL) return process.env.DATABASE_URL
  await ensureLocalPostgres(['scalewright'])
  return localUrl('scalewright')
}
