// `npm run migrate`: apply every pending migration (also run by `npm start` and tests).
import { appDatabaseUrl } from './lib/postgres.mjs'
import { migrationSource } from '../migrations/index'
import { useDb, closeDb } from '../server/utils/db/connection'

process.env.DATABASE_URL = await appDatabaseUrl()
const db = useDb()
try {
  const [batch, names] = await db.migrate.latest({ migrationSource })
  console.log(names.length ? `migrations applied (batch ${batch}): ${names.join(', ')}` : 'migrations: up to date')
} finally {
  await closeDb()
}
