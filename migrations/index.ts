import type { Knex } from 'knex'
import * as m001 from './20261202_001_accounts_groups'
import * as m002 from './20261202_002_theories_bases'
import * as m003 from './20261202_003_run_jobs'
import * as m004 from './20261202_004_board'
import * as m005 from './20261202_005_coverage'
import * as m006 from './20261202_006_scales'
import * as m007 from './20261202_007_session_cutoff'
import * as m008 from './20261202_008_sign_in_failures'
import * as m010 from './20261203_010_fingerprint_version'
import * as m020 from './20261203_020_lorentz_kind_words'
import * as m021 from './20261203_021_class_orders'
import * as m030 from './20261203_030_run_error_texts'
import * as m040 from './20261203_040_run_heartbeat'
import * as m050 from './20261203_050_sessions'
import * as m051 from './20261203_051_sign_up_requests'
import * as m090 from './20261203_090_soft_delete'
import * as m091 from './20261203_091_imported_authors'
import * as m092 from './20261203_092_request_keys'

// A static list: knex's folder loader cannot read .ts inside vitest or the Nitro bundle.
// Append new migrations here, named YYYYMMDD_NNN_what.ts, never rename an applied one.
const migrations: Record<string, Knex.Migration> = {
  '20261202_001_accounts_groups': m001,
  '20261202_002_theories_bases': m002,
  '20261202_003_run_jobs': m003,
  '20261202_004_board': m004,
  '20261202_005_coverage': m005,
  '20261202_006_scales': m006,
  '20261202_007_session_cutoff': m007,
  '20261202_008_sign_in_failures': m008,
  '20261203_010_fingerprint_version': m010,
  '20261203_020_lorentz_kind_words': m020,
  '20261203_021_class_orders': m021,
  '20261203_030_run_error_texts': m030,
  '20261203_040_run_heartbeat': m040,
  '20261203_050_sessions': m050,
  '20261203_051_sign_up_requests': m051,
  '20261203_090_soft_delete': m090,
  '20261203_091_imported_authors': m091,
  '20261203_092_request_keys': m092,
}

export const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => Object.keys(migrations),
  getMigrationName: (name) => name,
  getMigration: async (name) => migrations[name]!,
}
