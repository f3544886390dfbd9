// `npm run db:up`: start the project-local PostgreSQL (no-op when DATABASE_URL is set).
import { ensureLocalPostgres, localUrl } from './lib/postgres.mjs'

if (process.env.DATABASE_URL) {
  console.log('DATABASE_URL is set: using it, no local cluster started')
} else {
  await ensureLocalPostgres(['scalewright'])
  console.log(`PostgreSQL ready: ${localUrl('scalewright').replace(/:[^:@/]+@/, ':***@')}`)
}
